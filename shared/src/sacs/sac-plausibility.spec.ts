import { describe, expect, it } from 'vitest';
import { pairingBeforeMaturingWarnings, sacLayWarnings } from './sac-plausibility.js';

const codes = (w: { code: string }[]) => w.map((x) => x.code);

describe('sacLayWarnings', () => {
  const pairings = [
    { on: '2026-01-10', outcome: 'connected' as const },
    { on: '2026-02-01', outcome: 'female-refused' as const },
  ];
  it('warns when no successful pairing is recorded before the sac (a refused one does not count)', () => {
    expect(codes(sacLayWarnings({ layDate: '2026-01-09', pairings, minDays: 120 }))).toEqual(['sac-without-pairing']);
    expect(codes(sacLayWarnings({ layDate: '2026-06-01', pairings: [pairings[1]!], minDays: 120 }))).toEqual(['sac-without-pairing']);
  });
  // New World terrestrials: about 4 months from pairing to sac (from memory, the group's minimum of 120 days).
  it('warns below the species minimum, counting calendar days', () => {
    const w = sacLayWarnings({ layDate: '2026-05-09', pairings, minDays: 120 });
    expect(w).toEqual([
      {
        code: 'sac-soon-after-pairing',
        key: 'rule.warning.sac-soon-after-pairing',
        values: { count: 119, paired: '2026-01-10', minDays: 120 },
        message: expect.stringContaining('laid 119 days after the last successful pairing (2026-01-10)'),
      },
    ]);
    expect(sacLayWarnings({ layDate: '2026-05-10', pairings, minDays: 120 })).toEqual([]);
  });
  // TRADE-FACTS §3: a sac rarely follows more than a year after the pairing.
  it('warns more than 365 days after the last pairing', () => {
    expect(sacLayWarnings({ layDate: '2027-01-10', pairings, minDays: 120 })).toEqual([]);
    expect(codes(sacLayWarnings({ layDate: '2027-01-11', pairings, minDays: 120 }))).toEqual(['sac-long-after-pairing']);
  });
});

describe('pairingBeforeMaturingWarnings', () => {
  it('warns for a pairing before the maturing molt, not on or after it, nor without a date', () => {
    expect(codes(pairingBeforeMaturingWarnings('2026-03-01', '2026-03-02'))).toEqual(['pairing-before-male-matured']);
    expect(pairingBeforeMaturingWarnings('2026-03-02', '2026-03-02')).toEqual([]);
    expect(pairingBeforeMaturingWarnings('2026-03-01', null)).toEqual([]);
  });
});
