import {
  restsOnFew,
  type EffectiveBreedingValues,
  type NumberRange,
  type SpeciesBreedingValues,
  type SpeciesGroup,
  type Sourced,
  type ValueOrigin,
} from '@broodsilk/shared';
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

/**
 * The eggs-per-sac range a count is checked against: the value in force, except that a species
 * figure resting on few observations (T. vagans: 200 from two sacs) is a hint, not a range, so the
 * check spans it and the group's range together (docs/trade-facts.md §6).
 */
export function eggsRangeForCheck(group: SpeciesGroup, own: SpeciesBreedingValues): NumberRange {
  const eggs = effectiveBreeding(group, own).eggsPerSac;
  if (eggs.from !== 'species' || !restsOnFew(eggs.source)) return eggs.value;
  const g = GROUP_PROFILES[group].eggsPerSac.value;
  return { min: Math.min(eggs.value.min, g.min), max: Math.max(eggs.value.max, g.max) };
}
