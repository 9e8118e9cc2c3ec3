import type { DayRange, ExpectedStageDays, SpeciesGroup, Sourced, ValueOrigin } from '@broodsilk/shared';
import { GROUP_PROFILES } from './data/species-groups.data';
import { SPECIES_DATA } from './data/species.data';

const BY_KEY = new Map(SPECIES_DATA.map((r) => [r.key, r]));

const pick = (own: Sourced<DayRange> | undefined, group: Sourced<DayRange>): Sourced<DayRange> & { from: ValueOrigin } =>
  own ? { ...own, from: 'species' } : { ...group, from: 'group' };

/**
 * When a species' sac stages are expected (days after laying): the checked-in dataset's figure for
 * the species, else its group's (docs/trade-facts.md §1, §2). A species an admin added without a
 * dataset row gets its group's figures.
 */
export function expectedStageDays(species: { key: string; group: SpeciesGroup }): ExpectedStageDays {
  const row = BY_KEY.get(species.key);
  const g = GROUP_PROFILES[species.group];
  return { eggsWithLegs: pick(row?.eggsWithLegsDays, g.eggsWithLegsDays), freeLiving: pick(row?.freeLivingDays, g.freeLivingDays) };
}
