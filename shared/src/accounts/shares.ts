import { wordsFor, type Words } from '../i18n/words.js';
import { approxFraction, formatFraction } from './fraction.js';

/** One party of the terms, as the share rule needs it. */
export interface ShareParty {
  partyId: string;
  /** Whole number ≥ 0; the party's part of what is left after fixed counts is weight / sum of weights. */
  weight: number;
  /** Whole number ≥ 0 taken off the top before the split by weight. */
  fixedCount?: number;
  /** 1 = picks first. Serves fixed counts and breaks ties in remainders. Unique per party. */
  pickOrder: number;
}

export interface ShareAllocation {
  partyId: string;
  weight: number;
  pickOrder: number;
  /** The fixed count asked for in the terms. */
  fixedAsked: number;
  /** The fixed count actually served (less when the young ran out). */
  fixed: number;
  /** Young from the split by weight. */
  proportional: number;
  /** fixed + proportional. */
  count: number;
  /** Exact quota of the split by weight, rest × weight / sum of weights, reduced: "35/3", "12", "0". */
  exactQuota: string;
  /** True when the party got one extra young for a largest remainder. */
  roundedUp: boolean;
}

export interface ShareResult {
  total: number;
  fixedTotal: number;
  /** Young left after the fixed counts, split by weight. */
  rest: number;
  weightTotal: number;
  /** In the order the parties were given. */
  parties: ShareAllocation[];
}

function assertWhole(value: number, message: string): void {
  if (!Number.isSafeInteger(value) || value < 0) throw new RangeError(message);
}

function assertInput(total: number, parties: readonly ShareParty[]): void {
  assertWhole(total, `The number of young must be a whole number of 0 or more (got ${total}).`);
  const ids = new Set<string>();
  const picks = new Map<number, string>();
  for (const p of parties) {
    if (ids.has(p.partyId)) throw new RangeError(`Party ${p.partyId} is listed twice in the terms.`);
    ids.add(p.partyId);
    assertWhole(p.weight, `Party ${p.partyId}: the weight must be a whole number of 0 or more (got ${p.weight}).`);
    if (p.fixedCount !== undefined) {
      assertWhole(p.fixedCount, `Party ${p.partyId}: the fixed count must be a whole number of 0 or more (got ${p.fixedCount}).`);
    }
    if (!Number.isSafeInteger(p.pickOrder)) {
      throw new RangeError(`Party ${p.partyId}: the pick order must be a whole number (got ${p.pickOrder}).`);
    }
    const other = picks.get(p.pickOrder);
    if (other !== undefined) {
      throw new RangeError(`Parties ${other} and ${p.partyId} both have pick order ${p.pickOrder}; each party needs its own place.`);
    }
    picks.set(p.pickOrder, p.partyId);
  }
}

/**
 * The share rule. First each party's fixed count comes off the top, served in pick order while
 * young last. The rest is split by weight with the largest-remainder method (Hamilton /
 * Hare–Niemeyer): each party gets the whole part of rest × weight / sum of weights, and the young
 * still left go one each to the largest remainders, a tie going to the earlier pick. All arithmetic
 * is in BigInt, so the counts always add up to `total`.
 */
export function computeShares(total: number, parties: readonly ShareParty[]): ShareResult {
  assertInput(total, parties);
  const byPick = [...parties].sort((a, b) => a.pickOrder - b.pickOrder);

  const fixed = new Map<string, number>();
  let left = total;
  for (const p of byPick) {
    const served = Math.min(p.fixedCount ?? 0, left);
    fixed.set(p.partyId, served);
    left -= served;
  }
  const rest = left;
  const weightTotal = parties.reduce((sum, p) => sum + p.weight, 0);
  if (rest > 0 && weightTotal === 0) {
    throw new RangeError(`${rest} young are left after the fixed counts, but no party has a weight above 0 to share them.`);
  }

  const R = BigInt(rest);
  const W = BigInt(weightTotal);
  const whole = new Map<string, bigint>();
  const remainder = new Map<string, bigint>(); // numerator over W, so remainders compare directly
  for (const p of parties) {
    const numerator = R * BigInt(p.weight);
    whole.set(p.partyId, W === 0n ? 0n : numerator / W);
    remainder.set(p.partyId, W === 0n ? 0n : numerator % W);
  }
  let extra = rest - Number([...whole.values()].reduce((a, b) => a + b, 0n));
  const roundedUp = new Set<string>();
  const ranked = [...byPick].sort((a, b) => {
    const ra = remainder.get(a.partyId)!;
    const rb = remainder.get(b.partyId)!;
    return ra === rb ? a.pickOrder - b.pickOrder : rb > ra ? 1 : -1;
  });
  for (const p of ranked) {
    if (extra === 0) break;
    roundedUp.add(p.partyId);
    extra -= 1;
  }

  const allocations = parties.map((p): ShareAllocation => {
    const proportional = Number(whole.get(p.partyId)!) + (roundedUp.has(p.partyId) ? 1 : 0);
    const f = fixed.get(p.partyId)!;
    return {
      partyId: p.partyId,
      weight: p.weight,
      pickOrder: p.pickOrder,
      fixedAsked: p.fixedCount ?? 0,
      fixed: f,
      proportional,
      count: f + proportional,
      exactQuota: W === 0n ? '0' : formatFraction(R * BigInt(p.weight), W),
      roundedUp: roundedUp.has(p.partyId),
    };
  });
  return { total, fixedTotal: total - rest, rest, weightTotal, parties: allocations };
}

export type PartyNames = Readonly<Record<string, string>> | ((partyId: string) => string);

function namer(names?: PartyNames): (id: string) => string {
  if (!names) return (id) => id;
  if (typeof names === 'function') return names;
  return (id) => names[id] ?? id;
}

/**
 * The share calculation in plain words, one sentence per line, for the account page and the
 * statement, in the words `t` gives (the reader's language; English unless said). From an
 * estimated count the total reads "about N" and a last line says the shares are provisional.
 */
export function explainShares(result: ShareResult, names?: PartyNames, estimated = false, t: Words = wordsFor('en')): string[] {
  const name = namer(names);
  const young = (count: number) => t('shares.young', { count });
  const byPick = [...result.parties].sort((a, b) => a.pickOrder - b.pickOrder);
  const lines = [t(estimated ? 'shares.countsAbout' : 'shares.counts', { young: young(result.total) })];

  const withFixed = byPick.filter((p) => p.fixedAsked > 0);
  if (withFixed.length > 0) {
    const parts = withFixed.map((p) =>
      p.fixed === p.fixedAsked
        ? t('shares.party', { name: name(p.partyId), count: p.fixed })
        : t('shares.fixedPartly', { name: name(p.partyId), fixed: p.fixed, asked: p.fixedAsked }),
    );
    lines.push(t('shares.fixedFirst', { parts: parts.join(', '), rest: young(result.rest) }));
    if (withFixed.some((p) => p.fixed < p.fixedAsked)) lines.push(t('shares.fixedShort'));
  }
  if (result.rest === 0) {
    lines.push(t('shares.nothingLeft'));
  } else {
    const W = BigInt(result.weightTotal);
    const R = BigInt(result.rest);
    const quotas = byPick
      .filter((p) => p.weight > 0)
      .map((p) =>
        t('shares.quota', {
          name: name(p.partyId),
          rest: result.rest,
          weight: p.weight,
          total: result.weightTotal,
          exact: p.exactQuota,
          approx: approxFraction(R * BigInt(p.weight), W).replace('.', t('shares.decimalMark')),
        }),
      );
    lines.push(t('shares.byWeight', { young: young(result.rest), quotas: quotas.join('; ') }));
    const up = byPick.filter((p) => p.roundedUp);
    if (up.length === 0) {
      lines.push(t('shares.noRounding'));
    } else {
      const remainders = new Map(byPick.map((p) => [p.partyId, (R * BigInt(p.weight)) % W]));
      const cut = remainders.get(up[up.length - 1]!.partyId)!;
      const tiedOut = byPick.some((p) => !p.roundedUp && remainders.get(p.partyId) === cut);
      const leftOver = t('shares.leftOver', { count: up.length, names: up.map((p) => name(p.partyId)).join(', ') });
      lines.push(tiedOut ? `${leftOver} ${t('shares.tiedOut')}` : leftOver);
    }
  }
  lines.push(t('shares.inAll', { parts: result.parties.map((p) => t('shares.party', { name: name(p.partyId), count: p.count })).join(', ') }));
  if (estimated) lines.push(t('shares.provisional'));
  return lines;
}

export interface ShareChange {
  partyId: string;
  before: number;
  after: number;
  change: number;
}

export interface ShareDiff {
  totalBefore: number;
  totalAfter: number;
  /** Every party in either result, in the order first seen (before, then after). */
  changes: ShareChange[];
  /** Plain-words lines for the parties whose count changed; empty when nothing did. */
  lines: string[];
}

/** What changed between two share results (a new count of young, or new terms). */
export function diffShares(before: ShareResult, after: ShareResult, names?: PartyNames, t: Words = wordsFor('en')): ShareDiff {
  const name = namer(names);
  const ids = [...new Set([...before.parties, ...after.parties].map((p) => p.partyId))];
  const countOf = (r: ShareResult, id: string) => r.parties.find((p) => p.partyId === id)?.count ?? 0;
  const changes = ids.map((id) => {
    const b = countOf(before, id);
    const a = countOf(after, id);
    return { partyId: id, before: b, after: a, change: a - b };
  });
  const lines: string[] = [];
  if (before.total !== after.total) lines.push(t('shares.countChanged', { before: before.total, after: after.total }));
  for (const c of changes) {
    if (c.change === 0) continue;
    const change = c.change > 0 ? `+${c.change}` : `−${-c.change}`;
    lines.push(t('shares.partyChanged', { name: name(c.partyId), before: c.before, after: c.after, change }));
  }
  return { totalBefore: before.total, totalAfter: after.total, changes, lines };
}
