import type { EntityManager } from '@mikro-orm/postgresql';
import { openingCountWarnings } from '@broodsilk/shared';
import { acceptWarnings } from '../plausibility/plausibility';
import { eggsRangeForCheck } from '../species/effective-breeding';
import { ownBreeding } from '../species/species.mapper';
import type { OpeningDto } from './dto/opening.dto';
import { viableOf } from './brood.mapper';
import type { Sac } from './sac.entity';

/**
 * Every egg and young spider of the opening against the species' usual eggs per sac (its group's when it
 * has none, or both where its own rests on few sacs; docs/trade-facts.md check value 8): outside
 * it, 422 until acknowledged with a reason.
 * Returns the acknowledged reason (null when the count is usual).
 */
export async function checkOpeningAgainstSpecies(tx: EntityManager, sac: Sac, dto: OpeningDto): Promise<string | null> {
  await tx.populate(sac, ['project.female.species']);
  const species = sac.project.female.species;
  const usual = eggsRangeForCheck(species.group, ownBreeding(species));
  const total = viableOf(dto) + dto.darkEggs + dto.spoiledEggs;
  return acceptWarnings(openingCountWarnings(total, usual, dto.estimated ?? false), dto);
}
