import type { EffectiveBreedingValues, NumberRange, SpeciesBreedingValues, SpeciesGroup, Sourced, ValueOrigin } from '@broodsilk/shared';
import { DEFAULT_PULL_WINDOW, GROUP_PROFILES } from './data/species-groups.data';

type WithOrigin<T> = Sourced<T> & { from: ValueOrigin };

function pick<T>(own: Sourced<T> | undefined, fallback: Sourced<T>, origin: ValueOrigin): WithOrigin<T> {
  return own ? { ...own, from: 'species' } : { ...fallback, from: origin };
}

/**
 * The breeding values in force for a species: its own value where it has one; else, for the
 * pull window, the product default (day 21–45, common practice), and for the rest its group's.
 */
export function effectiveBreeding(group: SpeciesGroup, own: SpeciesBreedingValues): EffectiveBreedingValues {
  const g = GROUP_PROFILES[group];
  return {
    pullWindow: pick(own.pullWindow, DEFAULT_PULL_WINDOW, 'default'),
    pairingToSacDays: pick<NumberRange>(own.pairingToSacDays, g.pairingToSacDays, 'group'),
    eggsPerSac: pick<NumberRange>(own.eggsPerSac, g.eggsPerSac, 'group'),
    matureMaleLifespanMonths: pick<NumberRange>(own.matureMaleLifespanMonths, g.matureMaleLifespanMonths, 'group'),
  };
}
