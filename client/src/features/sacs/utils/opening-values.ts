import { BROOD_COUNT_MAX, TEXT_LIMITS, type OpeningCounts, type OpeningResponse } from '@broodsilk/shared';
import { textRule } from '@/components/fields/text-rule';
import { checkNumber, numberRule, readNumber } from '@/components/fields/typed-number';

/** The opening's counts with their labels, in the order the form and the view show them. */
export const COUNT_FIELDS = [
  ['healthyEggs', 'Healthy eggs'],
  ['eggsWithLegs', 'Eggs with legs'],
  ['nymphs', 'Nymphs'],
  ['darkEggs', 'Dark (non-viable)'],
  ['spoiledEggs', 'Spoiled'],
  ['keptBack', 'Kept back for more incubation'],
] as const;

export type CountKey = (typeof COUNT_FIELDS)[number][0];
export type OpeningValues = Record<CountKey, string> & { estimated: boolean; notes: string };

const COUNT = { min: 0, max: BROOD_COUNT_MAX, decimals: 0, rangeMessage: `A whole number from 0 to ${BROOD_COUNT_MAX}.` };

/** Empty for a first opening; the numbers in force for a correction. */
export function openingValues(o?: OpeningResponse): OpeningValues {
  const counts = Object.fromEntries(COUNT_FIELDS.map(([k]) => [k, String(o?.[k] ?? 0)])) as Record<CountKey, string>;
  return { ...counts, estimated: o?.estimated ?? false, notes: o?.notes ?? '' };
}

/** Each count a whole number in range; no more kept back than the viable ones. */
export const openingRules = {
  ...Object.fromEntries(COUNT_FIELDS.map(([k]) => [k, numberRule(COUNT)])),
  keptBack: (v: string, values: OpeningValues) =>
    checkNumber(v, COUNT) ??
    ((readNumber(v) ?? 0) > (readNumber(values.healthyEggs) ?? 0) + (readNumber(values.eggsWithLegs) ?? 0) + (readNumber(values.nymphs) ?? 0)
      ? 'No more than the viable ones (healthy eggs, eggs with legs, nymphs).'
      : null),
  notes: textRule({ maxLength: TEXT_LIMITS.note }),
};

/** The checked values as the request's counts. */
export function toOpeningCounts(v: OpeningValues): OpeningCounts & { estimated: boolean; notes: string | null } {
  const counts = Object.fromEntries(COUNT_FIELDS.map(([k]) => [k, readNumber(v[k]) ?? 0])) as Record<CountKey, number>;
  return { ...counts, estimated: v.estimated, notes: v.notes.trim() || null };
}
