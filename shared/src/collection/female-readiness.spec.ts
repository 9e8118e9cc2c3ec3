import { describe, expect, it } from 'vitest';
import { femaleReadiness } from './female-readiness.js';

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
});
