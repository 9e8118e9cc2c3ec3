import type { EntityManager } from '@mikro-orm/postgresql';

/** `(?, ?, …)` for a list of ids (knex expands an array parameter into a comma list, not a PostgreSQL array). */
const marks = (ids: string[]) => `(${ids.map(() => '?').join(', ')})`;

/**
 * Set-based reads several views need for many sacs at once (lists, the dashboard, reminders).
 * Raw SQL because "latest row per sac" is one DISTINCT ON in PostgreSQL.
 */

export interface LatestCare {
  /** The last roll that still counts: not struck, and not before the pull. */
  lastRollAt?: Date;
  /** The latest readings not struck. */
  temperature?: { value: number; at: Date };
  humidity?: { value: number; at: Date };
}

/** The latest roll, temperature and humidity entry per sac, in one statement (the dashboard counts them). */
export async function latestCareOf(em: EntityManager, sacIds: string[]): Promise<Map<string, LatestCare>> {
  if (!sacIds.length) return new Map();
  const rows = await em.getConnection().execute<{ sac_id: string; kind: string; at: Date; temperature_c: number | null; humidity_percent: number | null }[]>(
    `select distinct on (e.sac_id, e.kind) e.sac_id, e.kind, e.at, e.temperature_c, e.humidity_percent
       from sac_log_entries e join sacs s on s.id = e.sac_id
      where e.sac_id in ${marks(sacIds)} and e.kind in ('roll', 'temperature', 'humidity')
        and (e.kind <> 'roll' or (s.pulled_at is not null and e.at >= s.pulled_at))
        and not exists (select 1 from sac_log_entries k where k.strikes_id = e.id)
      order by e.sac_id, e.kind, e.at desc, e.created_at desc`,
    sacIds,
    'all',
    em.getTransactionContext(), // inside a transaction, see its own writes (the reminder planner re-plans before commit)
  );
  const out = new Map<string, LatestCare>();
  for (const r of rows) {
    const care = out.get(r.sac_id) ?? {};
    const at = new Date(r.at);
    if (r.kind === 'roll') care.lastRollAt = at;
    if (r.kind === 'temperature' && r.temperature_c != null) care.temperature = { value: Number(r.temperature_c), at };
    if (r.kind === 'humidity' && r.humidity_percent != null) care.humidity = { value: Number(r.humidity_percent), at };
    out.set(r.sac_id, care);
  }
  return out;
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
    'all',
    em.getTransactionContext(),
  );
  return new Map(rows.map((r) => [r.sac_id, { alive: Number(r.alive), at: new Date(r.at), estimated: r.estimated }]));
}

export async function currentCountsOf(em: EntityManager, sacIds: string[]): Promise<Map<string, number>> {
  return new Map([...(await latestCountsOf(em, sacIds))].map(([id, c]) => [id, c.alive]));
}

export async function openedSacsOf(em: EntityManager, sacIds: string[]): Promise<Set<string>> {
  if (!sacIds.length) return new Set();
  const rows = await em
    .getConnection()
    .execute<{ sac_id: string }[]>(`select sac_id from sac_openings where sac_id in ${marks(sacIds)}`, sacIds, 'all', em.getTransactionContext());
  return new Set(rows.map((r) => r.sac_id));
}
