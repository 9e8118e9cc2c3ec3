import type { EntityManager } from '@mikro-orm/postgresql';
import type { SacOutcomeState } from '@broodsilk/shared';
import { Sac } from '../sacs/sac.entity';
import { NOT_STRUCK } from '../sacs/sac-queries';

export interface SacCountFact {
  sacId: string;
  layDate: string;
  outcome: SacOutcomeState;
  /** Alive at the sac's latest brood count (0 before the opening), and when that count was taken. */
  aliveAtCount: number;
  countedAt: Date | null;
  /** That count is an estimate: its shares are provisional. */
  estimated: boolean;
}

/**
 * A project's sacs with their latest brood count. The alive figure is the sacs module's
 * `currentCount` (latest brood_counts row not struck by a correction); the instant is read with it so the account can tell
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
  const rows = await em.execute<{ sac_id: string; alive: number; at: Date; estimated: boolean }[]>(
    `select distinct on (c.sac_id) c.sac_id, c.alive, c.at, c.estimated from brood_counts c
      where c.sac_id = any(?::uuid[]) and ${NOT_STRUCK} order by c.sac_id, c.at desc, c.created_at desc`,
    [`{${sacs.map((s) => s.id).join(',')}}`], // a PostgreSQL array literal: knex would spread a JS array
  );
  const latest = new Map(rows.map((r) => [r.sac_id, r]));
  for (const s of sacs) {
    const c = latest.get(s.id);
    out.get(s.project.id)!.push({
      sacId: s.id,
      layDate: s.layDate,
      outcome: s.outcome,
      aliveAtCount: c ? Number(c.alive) : 0,
      countedAt: c ? new Date(c.at) : null,
      estimated: c?.estimated ?? false,
    });
  }
  return out;
}
