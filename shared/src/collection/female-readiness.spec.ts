import { describe, expect, it } from 'vitest';
import { femaleReadiness, premoltStands } from './female-readiness.js';

// Hardening period of 21 days: common practice. Sperm lost with a molt: docs/trade-facts.md §5
// (tarantulaspider.net; reptarach.de).
describe('female readiness', () => {
  it('says when no molt is recorded', () => {
    expect(femaleReadiness(null, '2026-06-01')).toMatchObject({ daysSinceMolt: null, state: 'no-molt-recorded' });
  });

  it('counts days since the last molt across a leap day', () => {
    const r = femaleReadiness('2024-02-20', '2024-03-01');
    expect(r).toMatchObject({ daysSinceMolt: 10, state: 'hardening' });
    expect(r.note).toContain('10 days ago');
    expect(r.note).toContain('11 more days');
  });

  it('is ready from day 21 and warns that a molt before laying loses the pairing', () => {
    expect(femaleReadiness('2026-05-01', '2026-05-21').state).toBe('hardening');
    const r = femaleReadiness('2026-05-01', '2026-05-22');
    expect(r).toMatchObject({ daysSinceMolt: 21, state: 'ready' });
    expect(r.note).toMatch(/sperm is shed/);
  });

  it('rejects a molt date after today', () => {
    expect(() => femaleReadiness('2026-06-02', '2026-06-01')).toThrow(/after today/);
  });

  // Premolt: a molt after pairing sheds the stored sperm, TRADE-FACTS §5 (tarantulaspider.net;
  // reptarach.de), so a flagged premolt means "not now" even when the last molt is long past.
  it('turns "ready" into "not now, premolt" while the flag stands', () => {
    const r = femaleReadiness('2026-01-10', '2026-06-01', '2026-05-20');
    expect(r).toMatchObject({ state: 'premolt', daysSinceMolt: 142 });
    expect(r.note).toMatch(/^Not now: in premolt since 2026-05-20\./);
    expect(femaleReadiness(null, '2026-06-01', '2026-05-20').state).toBe('premolt');
  });

  it('a molt on or after the flag ends the premolt; she is hardening again', () => {
    expect(premoltStands('2026-05-20', '2026-05-19')).toBe(true);
    expect(premoltStands('2026-05-20', '2026-05-20')).toBe(false);
    expect(premoltStands(null, '2026-05-19')).toBe(false);
    expect(femaleReadiness('2026-05-28', '2026-06-01', '2026-05-20')).toMatchObject({ state: 'hardening', daysSinceMolt: 4 });
  });
});
