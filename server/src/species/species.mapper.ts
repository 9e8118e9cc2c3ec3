import { groupCaution, serverWordsFor, type SpeciesBreedingValues, type SpeciesResponse, type Sourced, type ValueSource } from '@broodsilk/shared';
import type { Species, SpeciesSourceKey } from './species.entity';
import { effectiveBreeding } from './effective-breeding';

const UNSOURCED: ValueSource = { kind: 'memory', note: 'no source recorded' };

function src(s: Species, key: SpeciesSourceKey): ValueSource {
  return s.sources[key] ?? UNSOURCED;
}

function range(
  s: Species,
  min: number | null | undefined,
  max: number | null | undefined,
  key: SpeciesSourceKey,
): Sourced<{ min: number; max: number }> | undefined {
  return min != null && max != null ? { value: { min, max }, source: src(s, key) } : undefined;
}

/** The species' own breeding values, each with its source; missing ones are left out. */
export function ownBreeding(s: Species): SpeciesBreedingValues {
  const out: SpeciesBreedingValues = {};
  if (s.pullFromDay != null && s.pullToDay != null) out.pullWindow = { value: { fromDay: s.pullFromDay, toDay: s.pullToDay }, source: src(s, 'pullWindow') };
  const pairing = range(s, s.pairingToSacMinDays, s.pairingToSacMaxDays, 'pairingToSac');
  if (pairing) out.pairingToSacDays = pairing;
  const eggs = range(s, s.eggsMin, s.eggsMax, 'eggs');
  if (eggs) out.eggsPerSac = eggs;
  const life = range(s, s.lifespanMinMonths, s.lifespanMaxMonths, 'lifespan');
  if (life) out.matureMaleLifespanMonths = life;
  return out;
}

export function toSpeciesResponse(s: Species): SpeciesResponse {
  const breeding = ownBreeding(s);
  return {
    id: s.id,
    scientificName: s.scientificName,
    genus: s.genus,
    authority: s.authority,
    formerNames: s.formerNames,
    commonNames: s.commonNames,
    group: s.group,
    nameSource: src(s, 'name'),
    cautions: {
      urticatingHairs: { value: s.urticatingHairs, source: src(s, 'urticatingHairs') },
      venom: { value: s.venom, source: src(s, 'venom') },
      cautionText: groupCaution(serverWordsFor('en'), s.group),
    },
    tradeListing: { value: s.tradeListing, source: src(s, 'tradeListing') },
    breeding,
    effective: effectiveBreeding(s.group, breeding),
    updatedAt: s.updatedAt.toISOString(),
  };
}
