import fc from 'fast-check';
import hareNiemeyer from 'hare-niemeyer';
import { describe, expect, it } from 'vitest';
import { approxFraction, formatFraction } from './fraction.js';
import { computeShares, diffShares, explainShares, type ShareParty } from './shares.js';
import { wordsFor } from '../i18n/words.js';

// Reference implementation: the npm package hare-niemeyer 3.0.0 (largest remainder / Hamilton),
// called with draw = false so that parties tied for the last young keep their raw quota instead
// of a random draw. It works in floats rounded to 12 places, so the random cases stay small
// enough (weights ≤ 1000, ≤ 8 parties, ≤ 5000 young) for that to be exact.
const counts = (r: ReturnType<typeof computeShares>) => Object.fromEntries(r.parties.map((p) => [p.partyId, p.count]));
const party = (partyId: string, weight: number, pickOrder: number, fixedCount?: number): ShareParty =>
  fixedCount === undefined ? { partyId, weight, pickOrder } : { partyId, weight, pickOrder, fixedCount };

describe('share rule: published worked examples of the largest-remainder method', () => {
  it('Wikipedia "Largest remainder method", Hare quota example (figures from memory; arithmetic re-derived)', () => {
    // 100 000 votes, 10 seats, Hare quota 10 000: quotas 4.70, 1.60, 1.58, 1.20, 0.61, 0.31 → 4,1,1,1,0,0
    // and the 3 seats left go to remainders .70 (Yellows), .61 (Blues), .60 (Whites).
    const votes = { yellows: 47_000, whites: 16_000, reds: 15_800, greens: 12_000, blues: 6_100, pinks: 3_100 };
    const r = computeShares(
      10,
      Object.entries(votes).map(([id, w], i) => party(id, w, i + 1)),
    );
    expect(counts(r)).toEqual({ yellows: 5, whites: 2, reds: 1, greens: 1, blues: 1, pinks: 0 });
    expect(r.parties.find((p) => p.partyId === 'yellows')!.exactQuota).toBe('47/10');
    expect(hareNiemeyer(votes, 10, false)).toEqual(counts(r));
  });

  it('infinitelexicon.com "largest remainder": populations 50, 30, 20 and 7 seats (quotas 3.5, 2.1, 1.4)', () => {
    const r = computeShares(7, [party('a', 50, 1), party('b', 30, 2), party('c', 20, 3)]);
    expect(r.parties.map((p) => p.exactQuota)).toEqual(['7/2', '21/10', '7/5']);
    expect(counts(r)).toEqual({ a: 4, b: 2, c: 1 });
  });

  it('archipel-des-libertes.fr "largest remainders method": 930 voters, 4 seats, 500/300/110/20 → 2, 1, 1, 0', () => {
    const r = computeShares(4, [party('a', 500, 1), party('b', 300, 2), party('c', 110, 3), party('d', 20, 4)]);
    expect(counts(r)).toEqual({ a: 2, b: 1, c: 1, d: 0 });
  });
});

describe('share rule: our terms', () => {
  it('splits 35 young 2 : 1 with exact quotas', () => {
    // 35 × 2/3 = 70/3 = 23.33, 35 × 1/3 = 35/3 = 11.67: whole parts 23 + 11 = 34, the last one to the larger remainder (2/3).
    const r = computeShares(35, [party('female-owner', 2, 1), party('male-owner', 1, 2)]);
    expect(r.parties).toEqual([
      { partyId: 'female-owner', weight: 2, pickOrder: 1, fixedAsked: 0, fixed: 0, proportional: 23, count: 23, exactQuota: '70/3', roundedUp: false },
      { partyId: 'male-owner', weight: 1, pickOrder: 2, fixedAsked: 0, fixed: 0, proportional: 12, count: 12, exactQuota: '35/3', roundedUp: true },
    ]);
  });

  it('takes fixed counts off the top in pick order, then splits the rest', () => {
    const r = computeShares(100, [party('f', 1, 2), party('m', 1, 1, 20)]);
    expect(r).toMatchObject({ total: 100, fixedTotal: 20, rest: 80, weightTotal: 2 });
    expect(counts(r)).toEqual({ f: 40, m: 60 });
  });

  it('serves fixed counts larger than the brood in pick order while young last', () => {
    const r = computeShares(15, [party('a', 1, 3, 10), party('b', 0, 1, 10), party('c', 5, 2, 10)]);
    expect(r.parties.map((p) => [p.partyId, p.fixed, p.proportional])).toEqual([
      ['a', 0, 0],
      ['b', 10, 0],
      ['c', 5, 0],
    ]);
    expect(r.rest).toBe(0);
  });

  it('breaks ties in remainder by pick order', () => {
    // 1 young, three equal weights: the first pick gets it, whatever order the parties are listed in.
    expect(counts(computeShares(1, [party('a', 1, 3), party('b', 1, 1), party('c', 1, 2)]))).toEqual({ a: 0, b: 1, c: 0 });
    // 5 young, 2 : 2 : 1 → 2, 2, 1 exactly; 4 young → quotas 8/5, 8/5, 4/5; remainders 3/5, 3/5, 4/5 → c, then the earlier pick of a/b.
    expect(counts(computeShares(4, [party('a', 2, 2), party('b', 2, 1), party('c', 1, 3)]))).toEqual({ a: 1, b: 2, c: 1 });
    // The reference agrees except for the tied party it leaves undecided (raw quota 1.6).
    expect(hareNiemeyer({ a: 2, b: 2, c: 1 }, 4, false)).toEqual({ a: 1.6, b: 1.6, c: 1 });
  });

  it('gives parties with weight 0 only their fixed count', () => {
    const r = computeShares(30, [party('a', 0, 1, 5), party('b', 3, 2), party('c', 0, 3)]);
    expect(counts(r)).toEqual({ a: 5, b: 25, c: 0 });
    expect(r.parties.map((p) => p.exactQuota)).toEqual(['0', '25', '0']);
  });

  it('handles an empty sac and fixed counts only', () => {
    expect(counts(computeShares(0, [party('a', 1, 1), party('b', 1, 2)]))).toEqual({ a: 0, b: 0 });
    expect(counts(computeShares(10, [party('a', 0, 1, 4), party('b', 0, 2, 6)]))).toEqual({ a: 4, b: 6 });
  });

  it('stays exact where floats would not (large brood, weights with no common factor)', () => {
    const r = computeShares(2_000, [party('a', 1, 1), party('b', 1, 2), party('c', 1, 3)]);
    expect(r.parties.map((p) => p.exactQuota)).toEqual(['2000/3', '2000/3', '2000/3']);
    expect(counts(r)).toEqual({ a: 667, b: 667, c: 666 });
  });

  it('rejects bad input with readable messages', () => {
    expect(() => computeShares(-1, [party('a', 1, 1)])).toThrow(/whole number of 0 or more/);
    expect(() => computeShares(2.5, [party('a', 1, 1)])).toThrow(/number of young/);
    expect(() => computeShares(5, [party('a', -1, 1)])).toThrow(/Party a: the weight/);
    expect(() => computeShares(5, [party('a', 1, 1, 1.5)])).toThrow(/fixed count/);
    expect(() => computeShares(5, [party('a', 1, 1), party('a', 1, 2)])).toThrow(/listed twice/);
    expect(() => computeShares(5, [party('a', 1, 1), party('b', 1, 1)])).toThrow(/both have pick order 1/);
    expect(() => computeShares(5, [party('a', 0, 1, 2)])).toThrow(/3 young are left .* no party has a weight/);
    expect(() => computeShares(5, [])).toThrow(/no party has a weight/);
  });
});

const arbParties = fc
  .array(fc.record({ weight: fc.integer({ min: 0, max: 1000 }), fixed: fc.option(fc.integer({ min: 0, max: 60 }), { nil: undefined }) }), {
    minLength: 1,
    maxLength: 8,
  })
  .chain((rows) =>
    fc
      .shuffledSubarray(
        rows.map((_, i) => i + 1),
        { minLength: rows.length, maxLength: rows.length },
      )
      .map((picks) => rows.map((r, i) => party(`p${i}`, r.weight, picks[i]!, r.fixed))),
  );

describe('share rule: property checks against hare-niemeyer', () => {
  it('matches the reference wherever no tie decides the last young, and breaks ties by pick order', () => {
    let compared = 0;
    fc.assert(
      fc.property(arbParties, fc.integer({ min: 0, max: 5000 }), (parties, total) => {
        fc.pre(parties.some((p) => p.weight > 0));
        const r = computeShares(total, parties);
        expect(r.parties.reduce((s, p) => s + p.count, 0)).toBe(total);
        if (r.rest === 0) return;
        // Exact remainders, numerators over the sum of weights.
        const rem = (p: { weight: number }) => (BigInt(r.rest) * BigInt(p.weight)) % BigInt(r.weightTotal);
        const up = r.parties.filter((p) => p.roundedUp);
        const down = r.parties.filter((p) => !p.roundedUp);
        const lowestUp = up.length ? up.map(rem).reduce((a, b) => (a < b ? a : b)) : null;
        const highestDown = down.length ? down.map(rem).reduce((a, b) => (a > b ? a : b)) : null;
        if (lowestUp !== null && highestDown !== null) expect(lowestUp >= highestDown).toBe(true);
        const ref = hareNiemeyer(Object.fromEntries(parties.map((p) => [p.partyId, p.weight])), r.rest, false);
        if (lowestUp === null || highestDown === null || lowestUp > highestDown) {
          compared += 1;
          for (const p of r.parties) expect(p.proportional).toBe(ref[p.partyId]);
          return;
        }
        // A tie decides the last young: the reference may leave it undecided (raw quota) or, through
        // float rounding, decide it arbitrarily; we give it to the earlier picks.
        for (const p of r.parties) expect(Math.abs(p.proportional - ref[p.partyId]!)).toBeLessThan(1 + 1e-9);
        const tied = r.parties.filter((p) => rem(p) === lowestUp);
        const upPicks = tied.filter((p) => p.roundedUp).map((p) => p.pickOrder);
        const downPicks = tied.filter((p) => !p.roundedUp).map((p) => p.pickOrder);
        expect(Math.max(...upPicks)).toBeLessThan(Math.min(...downPicks));
      }),
      { numRuns: 3000 },
    );
    expect(compared).toBeGreaterThan(1000);
  });

  it('decides an exact three-way tie by pick order where the float reference drifts', () => {
    // Rest 3759 over weights 367/96/919/229 (sum 1611): three remainders are exactly 537/1611 = 1/3,
    // but in floats p2's quota comes out as 2144.3333333333335 and hare-niemeyer gives it the young.
    const weights = { p0: 367, p1: 96, p2: 919, p3: 229 };
    const parties = [party('p0', 367, 2), party('p1', 96, 3), party('p2', 919, 4), party('p3', 229, 1)];
    expect(hareNiemeyer(weights, 3759, false)).toEqual({ p0: 856, p1: 224, p2: 2145, p3: 534 });
    expect(counts(computeShares(3759, parties))).toEqual({ p0: 856, p1: 224, p2: 2144, p3: 535 });
  });

  it('always sums to N, keeps each party within one of its exact quota and never serves more fixed than agreed', () => {
    fc.assert(
      fc.property(arbParties, fc.integer({ min: 0, max: 100_000 }), (parties, total) => {
        fc.pre(parties.some((p) => p.weight > 0));
        const r = computeShares(total, parties);
        expect(r.parties.reduce((s, p) => s + p.count, 0)).toBe(total);
        expect(r.fixedTotal + r.rest).toBe(total);
        for (const p of r.parties) {
          expect(p.fixed).toBeLessThanOrEqual(p.fixedAsked);
          // quota rule: floor(q) ≤ proportional ≤ floor(q) + 1, checked with integers: proportional × W vs rest × w
          const num = BigInt(r.rest) * BigInt(p.weight);
          const W = BigInt(r.weightTotal);
          expect(BigInt(p.proportional) * W <= num + W - 1n).toBe(true);
          expect(BigInt(p.proportional) * W + W > num).toBe(true);
        }
        // Fixed counts are served strictly in pick order: a party short of its fixed count leaves nothing for later picks.
        const byPick = [...r.parties].sort((a, b) => a.pickOrder - b.pickOrder);
        const shortAt = byPick.findIndex((p) => p.fixed < p.fixedAsked);
        if (shortAt >= 0) for (const p of byPick.slice(shortAt + 1)) expect(p.fixed).toBe(0);
      }),
      { numRuns: 2000 },
    );
  });

  it('ignores the order the parties are listed in', () => {
    fc.assert(
      fc.property(arbParties, fc.integer({ min: 0, max: 3000 }), (parties, total) => {
        fc.pre(parties.some((p) => p.weight > 0));
        const a = counts(computeShares(total, parties));
        const b = counts(computeShares(total, [...parties].reverse()));
        expect(b).toEqual(a);
      }),
      { numRuns: 500 },
    );
  });
});

describe('share explanation and changes', () => {
  const names = { f: 'Ana (female)', m: 'Ben (male)' };
  it('explains fixed counts, quotas, the remainder and the totals in plain words', () => {
    const r = computeShares(47, [party('f', 2, 1), party('m', 1, 2, 12)]);
    // 47 − 12 = 35; 35 × 2/3 = 70/3 ≈ 23.33 → 23; 35 × 1/3 = 35/3 ≈ 11.67 → 12 (larger remainder).
    expect(explainShares(r, names)).toEqual([
      'The sac counts 47 young.',
      'Fixed counts come first, in pick order: Ben (male) 12. 35 young remain.',
      'The remaining 35 young are split by weight: Ana (female) 35 × 2/3 = 70/3 ≈ 23.33; Ben (male) 35 × 1/3 = 35/3 ≈ 11.67.',
      'Each party first gets the whole part of its quota; the 1 young still left goes to the largest remainder: Ben (male).',
      'In all: Ana (female) 23, Ben (male) 24.',
    ]);
  });

  it('says when a fixed count could not be served and when a tie went to the earlier pick', () => {
    const short = explainShares(computeShares(8, [party('f', 1, 2, 5), party('m', 1, 1, 5)]), names);
    expect(short[1]).toBe('Fixed counts come first, in pick order: Ben (male) 5, Ana (female) 3 of the 5 agreed. 0 young remain.');
    expect(short).toContain('Nothing is left to split by weight.');
    const tie = explainShares(computeShares(3, [party('f', 1, 2), party('m', 1, 1)]), names);
    expect(tie[2]).toBe(
      'Each party first gets the whole part of its quota; the 1 young still left goes to the largest remainder: Ben (male). Equal remainders went to the earlier pick.',
    );
    const two = explainShares(computeShares(5, [party('a', 1, 1), party('b', 1, 2), party('c', 1, 3)]));
    expect(two[2]).toBe(
      'Each party first gets the whole part of its quota; the 2 young still left go one each to the largest remainders: a, b. Equal remainders went to the earlier pick.',
    );
  });

  it('lists what changed between two results', () => {
    const before = computeShares(47, [party('f', 2, 1), party('m', 1, 2, 12)]);
    const after = computeShares(44, [party('f', 2, 1), party('m', 1, 2, 12)]);
    // 44 − 12 = 32; 64/3 → 21 + 1 (remainder 1/3 vs 2/3: m gets it) … exact: f 21, m 12 + 11 = 23.
    const d = diffShares(before, after, names);
    expect(d.changes).toEqual([
      { partyId: 'f', before: 23, after: 21, change: -2 },
      { partyId: 'm', before: 24, after: 23, change: -1 },
    ]);
    expect(d.lines).toEqual(['The count of young changed from 47 to 44.', 'Ana (female): 23 → 21 (−2).', 'Ben (male): 24 → 23 (−1).']);
    expect(diffShares(before, before).lines).toEqual([]);
  });

  // The same worked example in the German words of the catalogue (shared/src/i18n/shares.ts): plural by
  // CLDR (1 Jungtier, 35 Jungtiere) and the German decimal comma (DIN 1333: "23,33").
  it('says the same in German when given the German words', () => {
    const de = wordsFor('de');
    const r = computeShares(47, [party('f', 2, 1), party('m', 1, 2, 12)]);
    expect(explainShares(r, names, false, de)).toEqual([
      'Gezählt im Kokon: 47 Jungtiere.',
      'Feste Anzahlen kommen zuerst, in der Reihenfolge der Auswahl: Ben (male) 12. Für die Aufteilung nach Gewicht bleiben: 35 Jungtiere.',
      'Nach Gewicht aufgeteilt (35 Jungtiere): Ana (female) 35 × 2/3 = 70/3 ≈ 23,33; Ben (male) 35 × 1/3 = 35/3 ≈ 11,67.',
      'Jeder Beteiligte bekommt zuerst den ganzzahligen Teil seiner Quote; das letzte übrige Jungtier geht an den größten Rest: Ben (male).',
      'Insgesamt: Ana (female) 23, Ben (male) 24.',
    ]);
    const estimated = explainShares(computeShares(1, [party('f', 1, 1)]), names, true, de);
    expect(estimated[0]).toBe('Gezählt im Kokon: etwa 1 Jungtier.');
    expect(estimated.at(-1)).toMatch(/^Die Zahl ist geschätzt, deshalb sind diese Anteile vorläufig/);
    const two = explainShares(computeShares(5, [party('a', 1, 1), party('b', 1, 2), party('c', 1, 3)]), undefined, false, de);
    expect(two[2]).toBe(
      'Jeder Beteiligte bekommt zuerst den ganzzahligen Teil seiner Quote; die 2 noch übrigen Jungtiere gehen einzeln an die größten Reste: a, b. Bei gleichem Rest hatte die frühere Stelle in der Reihenfolge Vorrang.',
    );
    const d = diffShares(r, computeShares(44, [party('f', 2, 1), party('m', 1, 2, 12)]), names, de);
    expect(d.lines).toEqual(['Die Zahl der Jungtiere hat sich von 47 auf 44 geändert.', 'Ana (female): 23 → 21 (−2).', 'Ben (male): 24 → 23 (−1).']);
    for (const line of [...explainShares(r, names, true, de), ...d.lines]) expect(line).not.toMatch(/\{\{|shares\./);
  });

  it('formats exact fractions and display decimals with integers only', () => {
    expect(formatFraction(70n, 6n)).toBe('35/3');
    expect(formatFraction(0n, 7n)).toBe('0');
    expect(approxFraction(35n, 3n)).toBe('11.67');
    expect(approxFraction(1n, 8n)).toBe('0.13'); // 0.125 rounds half up
    expect(approxFraction(2n, 3n, 0)).toBe('1');
  });
});
