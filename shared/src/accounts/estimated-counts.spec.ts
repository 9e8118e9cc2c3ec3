import { describe, expect, it } from 'vitest';
import { computeShares, explainShares } from './shares.js';
import { PROVISIONAL_SHARES, countWords, sacCountLine, shareLine } from './estimated-counts.js';

// An estimate is said as "about N" and the shares from it are provisional: docs/product.md,
// "Shares and balances" (estimated counts). Keepers estimate large broods by counting a
// measured part and multiplying (common practice); the share rule itself does not change.
describe('estimated counts in the share rule', () => {
  const parties = [
    { partyId: 'keeper', weight: 1, pickOrder: 1 },
    { partyId: 'partner', weight: 1, pickOrder: 2 },
  ];
  const names = { keeper: 'Keeper', partner: 'Partner' };

  it('splits an estimate exactly as an exact count: the number is the same, only its standing differs', () => {
    // 301 between two equal weights: 150.5 each, the odd young to the first pick (largest remainder, tie to the earlier pick).
    const r = computeShares(301, parties);
    expect(r.parties.map((p) => p.count)).toEqual([151, 150]);
    expect(explainShares(r, names, true).slice(1, -1)).toEqual(explainShares(r, names, false).slice(1));
  });

  it('says "about" in the first line and ends with the provisional note for an estimate only', () => {
    const r = computeShares(301, parties);
    const estimated = explainShares(r, names, true);
    expect(estimated[0]).toBe('The sac counts about 301 young.');
    expect(estimated.at(-1)).toBe(PROVISIONAL_SHARES);
    const exact = explainShares(r, names);
    expect(exact[0]).toBe('The sac counts 301 young.');
    expect(exact).not.toContain(PROVISIONAL_SHARES);
  });
});

describe('what a statement shows for an estimated count', () => {
  it('writes "about N" for an estimate and the bare number for an exact count', () => {
    expect(countWords(1500, true)).toBe('about 1500');
    expect(countWords(1500, false)).toBe('1500');
    expect(countWords(0, true)).toBe('about 0');
  });

  it('marks the sac line of an estimate as provisional and leaves an exact one plain', () => {
    expect(sacCountLine({ layDate: '2026-03-01', outcome: 'developing', count: 420, estimated: true })).toBe(
      'Sac laid 2026-03-01 (developing): about 420 young counted, an estimate; the shares below are provisional.',
    );
    expect(sacCountLine({ layDate: '2026-03-01', outcome: 'developing', count: 420, estimated: false })).toBe(
      'Sac laid 2026-03-01 (developing): 420 young counted.',
    );
  });

  it("marks a party's share as provisional when a count behind it is an estimate", () => {
    expect(shareLine(210, true)).toBe('Share: about 210 young (provisional: a count behind it is an estimate)');
    expect(shareLine(210, false)).toBe('Share: 210 young');
  });
});
