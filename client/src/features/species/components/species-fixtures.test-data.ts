import type { SpeciesResponse } from '@broodsilk/shared';

const common = { kind: 'common-practice' } as const;

/** A catalogue entry as the server sends it, with overrides for the case at hand. */
export function speciesResponse(over: Partial<SpeciesResponse> & Pick<SpeciesResponse, 'id' | 'scientificName'>): SpeciesResponse {
  return {
    genus: over.scientificName.split(' ')[0],
    authority: '(Author, 1900)',
    formerNames: [],
    commonNames: [],
    group: 'nw-terrestrial',
    nameSource: { kind: 'published', citation: 'World Spider Catalog' },
    cautions: {
      urticatingHairs: { value: false, source: common },
      venom: { value: 'no-cases-known', source: common },
      cautionText: 'Group note.',
    },
    tradeListing: { value: null, source: common },
    breeding: {},
    effective: {
      pullWindow: { value: { fromDay: 21, toDay: 45 }, source: common, from: 'default' },
      pairingToSacDays: { value: { min: 30, max: 90 }, source: common, from: 'group' },
      eggsPerSac: { value: { min: 100, max: 600 }, source: common, from: 'group' },
      matureMaleLifespanMonths: { value: { min: 12, max: 24 }, source: { kind: 'memory' }, from: 'group' },
    },
    updatedAt: '2026-01-01T00:00:00.000Z',
    ...over,
  };
}
