import { describe, expect, it } from 'vitest';
import { GROUP_LIFESPAN_DEFAULTS } from '../collection/male-clock.js';
import { pairingWarnings, projectWarnings, type PairingWarningFacts } from './pairing-warnings.js';

// Sperm shed with a molt: docs/trade-facts.md §5 (tarantulaspider.net; reptarach.de; brachypelma-smithi.de).
// Pairing to sac up to a year: docs/trade-facts.md §3 (keepingexoticpets.com; spinnen-andre.jimdo.com).
// Lifespan groups: docs/trade-facts.md §5, from memory. First sperm web after 2–4 weeks: common practice.
const lifespan = GROUP_LIFESPAN_DEFAULTS['nw-terrestrial']; // 12–24 months
const base = (over: Partial<PairingWarningFacts> = {}): PairingWarningFacts => ({
  today: '2026-06-01',
  pairings: [],
  femaleMolts: [],
  sacLayDates: [],
  failureClause: 'nothing-owed',
  ...over,
});
const codes = (f: PairingWarningFacts) => pairingWarnings(f).map((w) => w.code);

describe('pairing warnings', () => {
  it('says nothing for a quiet project', () => {
    expect(pairingWarnings(base())).toEqual([]);
    expect(pairingWarnings(base({ pairings: [{ on: '2026-04-01', outcome: 'connected' }], male: { maturedOn: '2025-12-01', lifespan } }))).toEqual([]);
  });

  it('warns that a molt after the last successful pairing and before a sac loses the pairing', () => {
    const f = base({ pairings: [{ on: '2026-03-01', outcome: 'connected' }], femaleMolts: ['2026-05-10'] });
    const [w] = pairingWarnings(f);
    expect(w).toMatchObject({ code: 'female-molted-after-pairing', severity: 'danger' });
    expect(w!.message).toContain('2026-05-10');
    expect(w!.message).toMatch(/sperm is shed/);
    // a later successful pairing, or a sac laid before the molt, clears it
    expect(codes({ ...f, pairings: [...f.pairings, { on: '2026-05-20', outcome: 'connected' }] })).toEqual([]);
    expect(codes({ ...f, sacLayDates: ['2026-04-20'] })).toEqual([]);
    // a pairing that did not connect left nothing to lose
    expect(codes(base({ pairings: [{ on: '2026-03-01', outcome: 'female-refused' }], femaleMolts: ['2026-05-10'] }))).toEqual([]);
  });

  it('says so when no sac came more than a year after the pairing', () => {
    expect(codes(base({ today: '2027-03-01', pairings: [{ on: '2026-03-01', outcome: 'connected' }] }))).toEqual([]); // exactly 365 days
    expect(codes(base({ today: '2027-03-02', pairings: [{ on: '2026-03-01', outcome: 'connected' }] }))).toEqual(['no-sac-after-a-year']);
  });

  it('follows the male clock while no sac is laid', () => {
    expect(codes(base({ male: { maturedOn: '2026-05-20', lifespan } }))).toEqual(['male-fresh']);
    expect(codes(base({ male: { maturedOn: '2026-01-01', lifespan } }))).toEqual([]); // prime
    // late (from 2025-06-01 + 12 months = 2026-06-01), with and without a successful pairing
    expect(codes(base({ male: { maturedOn: '2025-06-01', lifespan } }))).toEqual(['no-pairing-male-late', 'male-clock-late']);
    const late = pairingWarnings(base({ male: { maturedOn: '2025-06-01', lifespan }, pairings: [{ on: '2026-05-01', outcome: 'connected' }] }));
    expect(late.map((w) => w.code)).toEqual(['male-clock-late']);
    expect(late[0]!.message).toContain('2027-06-01'); // the usual lifespan ends on maturedOn + 24 months
    expect(codes(base({ male: { maturedOn: '2024-05-31', lifespan } }))).toEqual(['no-pairing-male-late', 'male-clock-past-typical']);
    expect(codes(base({ male: { maturedOn: '2024-05-31', lifespan }, sacLayDates: ['2026-05-01'] }))).toEqual([]);
  });

  it('warns about a loaned male past his due-back date', () => {
    const male = { maturedOn: '2026-01-01', lifespan, dueBackOn: '2026-05-29' };
    const [w] = pairingWarnings(base({ male }));
    expect(w).toEqual({
      code: 'loan-overdue',
      severity: 'warning',
      params: { named: '', dueBack: '2026-05-29', count: 3 },
      message: 'The loaned male was due back on 2026-05-29, 3 days ago.',
    });
    expect(codes(base({ male: { ...male, dueBackOn: '2026-06-01' } }))).toEqual([]);
    expect(codes(base({ male: { ...male, returnedOn: '2026-05-30' } }))).toEqual([]);
  });

  it("says what the terms' failure clause means when the male dies before a successful pairing", () => {
    const died = { maturedOn: '2025-06-01', lifespan, diedOn: '2026-05-15' };
    const nothing = pairingWarnings(base({ male: died, pairings: [{ on: '2026-05-01', outcome: 'aggression' }] }));
    expect(nothing).toMatchObject([
      {
        code: 'male-died-before-pairing',
        severity: 'danger',
        message: 'The male died on 2026-05-15 before a successful pairing. Under these terms nothing is owed when a project fails.',
      },
    ]);
    expect(pairingWarnings(base({ male: died, failureClause: 'carries-over' }))[0]!.message).toMatch(/carries over to the next sac or pairing/);
    const after = pairingWarnings(base({ male: died, pairings: [{ on: '2026-05-01', outcome: 'connected' }] }));
    expect(after.map((w) => [w.code, w.severity])).toEqual([['male-died-after-pairing', 'info']]);
  });

  it('names the male when the project has more than one (a backup male)', () => {
    const male = { label: 'Backup', maturedOn: '2026-01-01', lifespan, dueBackOn: '2026-05-29' };
    expect(pairingWarnings(base({ male }))[0]!.message).toBe('The loaned male Backup was due back on 2026-05-29, 3 days ago.');
    expect(pairingWarnings(base({ male: { label: 'First', maturedOn: '2025-06-01', lifespan, diedOn: '2026-05-15' } }))[0]!.message).toMatch(
      /^The male First died on 2026-05-15 before a successful pairing\./,
    );
  });

  it('gives each male of a project his own clock and loan warnings, and drops a dead male once a backup lives', () => {
    const facts = base({ pairings: [{ on: '2026-03-01', outcome: 'connected' }], femaleMolts: ['2026-05-10'] });
    const first = { label: 'First', maturedOn: '2025-06-01', lifespan, diedOn: '2026-04-01' };
    const backup = { label: 'Backup', maturedOn: '2026-05-20', lifespan, dueBackOn: '2026-05-30' };
    const both = projectWarnings({ ...facts, males: [first, backup] });
    expect(both.map((w) => w.code)).toEqual(['female-molted-after-pairing', 'loan-overdue', 'male-fresh']);
    expect(both.filter((w) => w.code !== 'female-molted-after-pairing').every((w) => w.message.includes('Backup'))).toBe(true);
    // the first male alone, dead: his death is said, unnamed, and her warning only once
    const alone = projectWarnings({ ...facts, males: [first] });
    expect(alone.map((w) => w.code)).toEqual(['female-molted-after-pairing', 'male-died-after-pairing']);
    expect(alone[1]!.message).toMatch(/^The male died on 2026-04-01/);
    // both dead: both deaths are said, each named
    const dead = projectWarnings({ ...facts, males: [first, { ...backup, diedOn: '2026-05-31' }] });
    expect(dead.filter((w) => w.code.startsWith('male-died')).map((w) => w.message.slice(0, 20))).toEqual(['The male First died ', 'The male Backup died']);
  });

  it('lists the most severe first', () => {
    const f = base({
      pairings: [{ on: '2026-03-01', outcome: 'connected' }],
      femaleMolts: ['2026-05-10'],
      male: { maturedOn: '2025-06-01', lifespan, dueBackOn: '2026-05-01' },
    });
    expect(pairingWarnings(f).map((w) => w.severity)).toEqual(['danger', 'warning', 'warning']);
  });
});
