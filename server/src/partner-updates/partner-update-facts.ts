import type { EntityManager } from '@mikro-orm/postgresql';
import type { ActivityEvent } from '../activity/activity-event.entity';
import { Animal } from '../animals/animal.entity';
import { Sac } from '../sacs/sac.entity';
import { SacOpening } from '../sacs/sac-opening.entity';
import { BroodCount } from '../sacs/brood-count.entity';
import { viableOf } from '../sacs/brood.mapper';
import { termsInForce } from '../accounts/terms-in-force';
import type { Project } from '../projects/project.entity';
import { User } from '../users/user.entity';
import { isBadNews, type BadNewsFacts, type UpdateFacts } from './partner-update-words';

/** The counts of a sac (its opening unless corrected, its latest count unless struck), the terms, the keeper's words. */
export async function badNewsFacts(em: EntityManager, projectId: string, sacId: string | null, message: string | null): Promise<BadNewsFacts> {
  let opening: BadNewsFacts['opening'] = null;
  let latestCount: BadNewsFacts['latestCount'] = null;
  if (sacId) {
    const openings = await em.find(SacOpening, { sac: sacId }, { orderBy: { createdAt: 'desc' } });
    const corrected = new Set(openings.map((o) => o.corrects?.id).filter(Boolean));
    const o = openings.find((x) => !corrected.has(x.id));
    if (o) opening = { viable: viableOf(o), dark: o.darkEggs, spoiled: o.spoiledEggs };
    const counts = await em.find(BroodCount, { sac: sacId }, { orderBy: { at: 'desc', createdAt: 'desc' } });
    const struck = new Set(counts.map((c) => c.corrects?.id).filter(Boolean));
    const c = counts.find((x) => !struck.has(x.id) && x.source !== 'opening');
    if (c) latestCount = { alive: c.alive, stage: c.stage };
  }
  const v = await termsInForce(em, projectId);
  const terms = v
    ? {
        number: v.number,
        clause: v.failureClause,
        lines: [...v.lines].sort((a, b) => a.pickOrder - b.pickOrder).map((l) => ({ name: l.member.user?.displayName ?? l.member.name, weight: l.weight })),
      }
    : null;
  return { opening, latestCount, aboutSac: !!sacId, terms, message };
}

/** Reads what the words of `e` need (its sac, its animal, the project's names, the bad news). */
export async function updateFactsOf(em: EntityManager, e: ActivityEvent, project: Project): Promise<UpdateFacts> {
  const sacId = e.subjectType === 'sac' ? (e.subjectId ?? null) : null;
  const sac = sacId ? await em.findOne(Sac, sacId, { fields: ['layDate'] }) : null;
  const animal = e.subjectType === 'animal' && e.subjectId ? await em.findOne(Animal, e.subjectId, { fields: ['label'] }) : null;
  const owner = await em.findOneOrFail(User, project.owner.id, { fields: ['displayName'] });
  const actor = e.actor ? await em.findOne(User, e.actor.id, { fields: ['displayName'] }) : null;
  const message = typeof e.data.partnerMessage === 'string' && e.data.partnerMessage.trim() ? e.data.partnerMessage : null;
  return {
    kind: e.kind,
    data: e.data,
    summary: e.summary,
    projectTitle: project.title,
    actorName: actor?.displayName ?? null,
    ownerName: owner.displayName,
    sac: sac ? { layDate: sac.layDate } : null,
    animalLabel: animal?.label ?? null,
    badNews: isBadNews(e.kind) ? await badNewsFacts(em, project.id, sacId, message) : null,
  };
}
