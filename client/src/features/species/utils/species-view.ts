import type { SpeciesGroup, SpeciesResponse, ValueOrigin, ValueSource } from '@broodsilk/shared';

export const GROUP_LABELS: Record<SpeciesGroup, string> = {
  'nw-terrestrial': 'New World, ground-dwelling',
  'nw-arboreal': 'New World, tree-dwelling',
  'ow-terrestrial': 'Old World, ground-dwelling',
  'ow-arboreal': 'Old World, tree-dwelling',
  fossorial: 'Burrowing',
};

/** A short, plain label for where a value comes from. */
export function sourceLabel(source: ValueSource): string {
  switch (source.kind) {
    case 'published':
      return source.citation;
    case 'common-practice':
      return 'common practice';
    case 'memory':
      return 'from memory';
  }
}

export const ORIGIN_LABELS: Record<ValueOrigin, string> = {
  species: 'this species',
  group: 'group default',
  default: 'Broodsilk default',
};

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
