import { useCallback } from 'react';
import { restsOnFew, valueSourceLabel, type NumberRange, type Sourced, type SpeciesResponse, type ValueSource, type Words } from '@broodsilk/shared';
import { useWords } from '@/lib/i18n';

/** A short, plain label for where a value comes from, in the reader's language. */
export const sourceLabel = valueSourceLabel;

/** `sourceLabel` with the reader's words. */
export function useSourceLabel(): (source: ValueSource) => string {
  const t = useWords();
  return useCallback((source: ValueSource) => sourceLabel(t, source), [t]);
}

function normalise(s: string): string {
  return s.trim().toLowerCase().replace(/\s+/g, ' ');
}

/** Matches the server's search: the query starts a word of the name. */
function nameMatches(name: string, query: string): boolean {
  return ` ${normalise(name)}`.includes(` ${query}`);
}

/**
 * The former name a search hit came through, when the current name itself does not match:
 * a keeper who types "Brachypelma vagans" is told the species is now "Tliltocatl vagans".
 */
export function matchedFormerName(species: Pick<SpeciesResponse, 'scientificName' | 'formerNames'>, query: string): string | null {
  const q = normalise(query);
  if (!q || nameMatches(species.scientificName, q)) return null;
  return species.formerNames.find((n) => nameMatches(n, q)) ?? null;
}

export function formatRange(min: number, max: number): string {
  return min === max ? String(min) : `${min}–${max}`;
}

/**
 * A range in words; a figure resting on few observations says so instead of passing for a range:
 * "about 200, n = 2 sacs" (docs/trade-facts.md §6).
 */
export function sampledRange(t: Words, { value, source }: Sourced<NumberRange>): string {
  const text = formatRange(value.min, value.max);
  if (!restsOnFew(source) || !source.sampleSize) return text;
  const { count, unit } = source.sampleSize;
  return t('page.species.value.aboutSample', { value: text, count, unit: t(`page.species.value.sampleUnit.${unit}`, { count }) });
}
