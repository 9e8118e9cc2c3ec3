import type { EntityManager } from '@mikro-orm/postgresql';
import { BROOD_STAGES, isBroodStageAtLeast } from '@broodsilk/shared';
import { Sac } from '../sacs/sac.entity';

const HATCHED_STAGES = BROOD_STAGES.filter((s) => isBroodStageAtLeast(s, 'first-instar'));

/**
 * The projects among `projectIds` with a brood: a sac still developing at first instar or later.
 * Only such a project can reach "shares settled" (`deriveProjectStage` asks for the fact in no
 * other case), so the others' accounts need not be loaded for their stage.
 */
export async function projectsWithBrood(em: EntityManager, projectIds: string[]): Promise<Set<string>> {
  if (!projectIds.length) return new Set();
  const sacs = await em.find(Sac, { project: { $in: projectIds }, outcome: { $ne: 'failed' }, broodStage: { $in: HATCHED_STAGES } }, { fields: ['project'] });
  return new Set(sacs.map((s) => s.project.id));
}
