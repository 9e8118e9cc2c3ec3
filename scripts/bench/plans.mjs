// @ts-check
// EXPLAIN (ANALYZE, BUFFERS) of the main reads on the seeded dataset, one text file per read in
// .bench/plans/ (git-ignored): the hand-written SQL of each read, and the keyset page queries
// the API sends for the care log and the ledger, so a sequential scan or a sort shows up by name.
import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import pg from 'pg';

/** The API's own keyset queries (as `server/src/sacs/care-log.service.ts` builds them), a page deep in the log. */
const API_QUERIES = [
  {
    name: 'API care log page after a cursor',
    sql: `select e.*, a.id as author_id_, a.display_name from sac_log_entries e left join users a on a.id = e.author_id
      where e.sac_id = $1 and (e.at, e.created_at, e.id) < (select l.at, l.created_at, l.id from sac_log_entries l where l.id = $2)
      order by e.at desc, e.created_at desc, e.id desc limit 101`,
    params: (/** @type {Record<string, string>} */ ids) => [ids.sac, ids.deepEntry],
  },
  {
    name: 'API ledger of a project (whole account, in seq order)',
    sql: `select le.* from ledger_entries le where le.project_id = $1 order by le.seq asc`,
    params: (/** @type {Record<string, string>} */ ids) => [ids.project],
  },
];

const slug = (/** @type {string} */ s) =>
  s
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '');

/**
 * @param {{ databaseUrl: string, dir: string, ids: Record<string, string>, reads: { name: string, sql: string, params: (ids: any, i: number) => unknown[] }[] }} o
 * @returns {Promise<string[]>} the files written
 */
export async function writePlans(o) {
  mkdirSync(o.dir, { recursive: true });
  const db = new pg.Client({ connectionString: o.databaseUrl });
  await db.connect();
  await db.query('analyze');
  o.ids.deepEntry = (
    await db.query('select id from sac_log_entries where sac_id = $1 order by at desc, created_at desc, id desc offset 100 limit 1', [o.ids.sac])
  ).rows[0]?.id;
  /** @type {string[]} */
  const files = [];
  for (const q of [...o.reads.map((r) => ({ name: `SQL ${r.name}`, sql: r.sql, params: (/** @type {any} */ ids) => r.params(ids, 0) })), ...API_QUERIES]) {
    const params = q.params(o.ids);
    if (params.some((p) => p === undefined)) continue;
    const plan = (await db.query(`explain (analyze, buffers) ${q.sql}`, params)).rows.map((r) => r['QUERY PLAN']).join('\n');
    const file = path.join(o.dir, `${slug(q.name)}.txt`);
    writeFileSync(file, `-- ${q.name}\n-- params: ${JSON.stringify(params)}\n${q.sql}\n\n${plan}\n`);
    files.push(file);
  }
  await db.end();
  return files;
}
