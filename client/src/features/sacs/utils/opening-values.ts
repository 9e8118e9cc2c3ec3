import { TEXT_LIMITS, broodStageLabel, type OpeningCounts, type OpeningResponse, type Words } from '@broodsilk/shared';
import { currentNumbering, words } from '@/lib/i18n';
import { textRule } from '@/components/fields/text-rule';
import { checkNumber, numberRule, readNumber } from '@/components/fields/typed-number';
import { countRule } from './sac-view';

/** The opening's counts, in the order the form and the view show them. */
const COUNT_KEYS = ['healthyEggs', 'eggsWithLegs', 'nymphs', 'darkEggs', 'spoiledEggs', 'keptBack'] as const;

export type CountKey = (typeof COUNT_KEYS)[number];

/**
 * A count's label in the reader's language. The young are named by the stage words the stages use
 * ("Eggs with legs", "1st instar" or "N1 (1st nymph)" in the reader's numbering), never a word of their own.
 */
export function countLabel(key: CountKey): string {
  if (key === 'eggsWithLegs') return broodStageLabel(words, 'eggs-with-legs', currentNumbering());
  if (key === 'nymphs') return broodStageLabel(words, 'first-instar', currentNumbering());
  return words(`openingCount.${key}`);
}

/** The counts with their labels, in order; built on render, so the labels follow the reader's language. */
export const countFields = (): [CountKey, string][] => COUNT_KEYS.map((k) => [k, countLabel(k)]);
export type OpeningValues = Record<CountKey, string> & { estimated: boolean; notes: string };

/** Empty for a first opening; the numbers in force for a correction. */
export function openingValues(o?: OpeningResponse): OpeningValues {
  const counts = Object.fromEntries(COUNT_KEYS.map((k) => [k, String(o?.[k] ?? 0)])) as Record<CountKey, string>;
  return { ...counts, estimated: o?.estimated ?? false, notes: o?.notes ?? '' };
}

/** Each count a whole number in range; no more kept back than the viable ones. Refusals in the reader's words. */
export function openingRules(t: Words) {
  const count = countRule(t);
  return {
    ...Object.fromEntries(COUNT_KEYS.map((k) => [k, numberRule(count)])),
    keptBack: (v: string, values: OpeningValues) =>
      checkNumber(v, count) ??
      ((readNumber(v) ?? 0) > (readNumber(values.healthyEggs) ?? 0) + (readNumber(values.eggsWithLegs) ?? 0) + (readNumber(values.nymphs) ?? 0)
        ? t('page.sacs.opening.tooManyKeptBack', { viable: [countLabel('healthyEggs'), countLabel('eggsWithLegs'), countLabel('nymphs')].join(', ') })
        : null),
    notes: textRule({ maxLength: TEXT_LIMITS.note }),
  };
}

/** The checked values as the request's counts. */
export function toOpeningCounts(v: OpeningValues): OpeningCounts & { estimated: boolean; notes: string | null } {
  const counts = Object.fromEntries(COUNT_KEYS.map((k) => [k, readNumber(v[k]) ?? 0])) as Record<CountKey, number>;
  return { ...counts, estimated: v.estimated, notes: v.notes.trim() || null };
}
