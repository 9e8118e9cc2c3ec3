import type { EntityManager } from '@mikro-orm/postgresql';

/** `(?, ?, …)` for a list of ids (knex expands an array parameter into a comma list, not a PostgreSQL array). */
const marks = (ids: string[]) => `(${ids.map(() => '?').join(', ')})`;

/**
 * Set-based reads several views need for many sacs at once (lists, the dashboard, reminders).
 * Raw SQL because "latest row per sac" is one DISTINCT ON in PostgreSQL.
 */

/** The last roll per sac that still counts: not struck, and not before the pull. */
export async function lastRollsOf(em: EntityManager, sacIds: string[]): Promise<Map<string, Date>> {
  if (!sacIds.length) return new Map();
  const rows = await em.getConnection().execute<{ sac_id: string; at: Date }[]>(
    `select distinct on (e.sac_id) e.sac_id, e.at
       from sac_log_entries e join sacs s on s.id = e.sac_id
      where e.sac_id in ${marks(sacIds)} and e.kind = 'roll' and s.pulled_at is not null and e.at >= s.pulled_at
        and not exists (select 1 from sac_log_entries k where k.strikes_id = e.id)
      order by e.sac_id, e.at desc, e.created_at desc`,
    sacIds,
    'all',
    em.getTransactionContext(), // inside a transaction, see its own writes (the reminder planner re-plans before commit)
  );
  return new Map(rows.map((r) => [r.sac_id, new Date(r.at)]));
}

/** SQL condition: the brood count `c` was not corrected by a later one. */
export const NOT_STRUCK = 'not exists (select 1 from brood_counts k where k.corrects_id = c.id)';

/** The latest count per sac not struck (by instant, then by when it was written): alive, and when it was taken. */
export async function latestCountsOf(em: EntityManager, sacIds: string[]): Promise<Map<string, { alive: number; at: Date; estimated: boolean }>> {
  if (!sacIds.length) return new Map();
  const rows = await em.getConnection().execute<{ sac_id: string; alive: number; at: Date; estimated: boolean }[]>(
    `select distinct on (c.sac_id) c.sac_id, c.alive, c.at, c.estimated from brood_counts c
      where c.sac_id in ${marks(sacIds)} and ${NOT_STRUCK}
      order by c.sac_id, c.at desc, c.created_at desc`,
    sacIds,
  );
  return new Map(rows.map((r) => [r.sac_id, { alive: Number(r.alive), at: new Date(r.at), estimated: r.estimated }]));
}

export async function currentCountsOf(em: EntityManager, sacIds: string[]): Promise<Map<string, number>> {
  return new Map([...(await latestCountsOf(em, sacIds))].map(([id, c]) => [id, c.alive]));
}

export async function openedSacsOf(em: EntityManager, sacIds: string[]): Promise<Set<string>> {
  if (!sacIds.length) return new Set();
  const rows = await em.getConnection().execute<{ sac_id: string }[]>(`select sac_id from sac_openings where sac_id in ${marks(sacIds)}`, sacIds);
  return new Set(rows.map((r) => r.sac_id));
}
