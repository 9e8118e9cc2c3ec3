import { wordsFor } from '../i18n/words.js';

/**
 * Counts of young may be estimates (a sac of a thousand eggs is not counted one by one). Every
 * place that shows a count says "about" for an estimate, and shares worked out from an estimate
 * are provisional: cash-outs and "shares settled" wait for an exact count.
 */

/** "about 1500" for an estimate, "1500" for an exact count. */
export const countWords = (n: number, estimated: boolean): string => (estimated ? `about ${n}` : String(n));

/** Said once wherever shares rest on an estimated count. */
export const PROVISIONAL_SHARES = wordsFor('en')('shares.provisional');

/** A sac's count line on a statement or the shares page. */
export function sacCountLine(s: { layDate: string; outcome: string; count: number; estimated: boolean }): string {
  const counted = `Sac laid ${s.layDate} (${s.outcome}): ${countWords(s.count, s.estimated)} young counted`;
  return s.estimated ? `${counted}, an estimate; the shares below are provisional.` : `${counted}.`;
}

/** A party's share line on a statement: "about" and provisional when any sac behind it is estimated. */
export const shareLine = (share: number, provisional: boolean): string =>
  provisional ? `Share: about ${share} young (provisional: a count behind it is an estimate)` : `Share: ${share} young`;
