import type { EntityManager } from '@mikro-orm/postgresql';
import type { SacOutcomeState } from '@broodsilk/shared';
import { Sac } from '../sacs/sac.entity';

export interface SacCountFact {
  sacId: string;
  layDate: string;
  outcome: SacOutcomeState;
  /** Alive at the sac's latest brood count (0 before the opening), and when that count was taken. */
  aliveAtCount: number;
  countedAt: Date | null;
}

/**
 * A project's sacs with their latest brood count. The alive figure is the sacs module's
 * `currentCount` (latest brood_counts row); the instant is read with it so the account can tell
 * young handed over before the count (no longer in it) from those handed over after (still in it).
 */
export async function sacCountsOf(em: EntityManager, projectId: string): Promise<SacCountFact[]> {
  return (await sacCountsByProject(em, [projectId])).get(projectId) ?? [];
}

/** The same for many projects in two queries, each project's sacs in lay order. */
export async function sacCountsByProject(em: EntityManager, projectIds: string[]): Promise<Map<string, SacCountFact[]>> {
  const out = new Map<string, SacCountFact[]>(projectIds.map((id) => [id, []]));
  const sacs = await em.find(Sac, { project: { $in: projectIds } }, { orderBy: { layDate: 'asc', createdAt: 'asc' } });
  if (!sacs.length) return out;
  const rows = await em.execute<{ sac_id: string; alive: number; at: Date }[]>(
    `select distinct on (sac_id) sac_id, alive, at from brood_counts
      where sac_id = any(?::uuid[]) order by sac_id, at desc, created_at desc`,
    [`{${sacs.map((s) => s.id).join(',')}}`], // a PostgreSQL array literal: knex would spread a JS array
  );
  const latest = new Map(rows.map((r) => [r.sac_id, r]));
  for (const s of sacs) {
    const c = latest.get(s.id);
    out
      .get(s.project.id)!
      .push({ sacId: s.id, layDate: s.layDate, outcome: s.outcome, aliveAtCount: c ? Number(c.alive) : 0, countedAt: c ? new Date(c.at) : null });
  }
  return out;
}
