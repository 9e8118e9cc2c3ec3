import type { MikroORM } from '@mikro-orm/postgresql';

/**
 * Rows per table of the public schema (pg-boss keeps its own schema): a refused request must leave
 * these equal. Left out: the migrations log, and the sign-in rate-limit counters, which a refused
 * attempt must write (that is how the limit counts it).
 */
export async function rowCounts(orm: MikroORM): Promise<Record<string, number>> {
  const conn = orm.em.getConnection();
  const tables = await conn.execute<{ tablename: string }[]>(
    "select tablename from pg_tables where schemaname = 'public' and tablename not in ('mikro_orm_migrations', 'rate_limits') order by tablename",
  );
  if (tables.length === 0) return {};
  const union = tables.map((r) => `select '${r.tablename}' as t, count(*)::int as n from "${r.tablename}"`).join(' union all ');
  const rows = await conn.execute<{ t: string; n: number }[]>(union);
  return Object.fromEntries(rows.map((r) => [r.t, r.n]));
}
