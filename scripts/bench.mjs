// @ts-check
// The measurements behind `npm run bench` (see docs/performance.md for the targets). Seeds the
// dataset, then drives every read and the care-log write at 1, 10 and 50 connections beside the
// same work as bare SQL, and measures the first page's JavaScript and the Today page's paint.
// It asserts nothing; it prints a table and writes the figures as JSON to .bench/.
import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { performance } from 'node:perf_hooks';
import os from 'node:os';
import pg from 'pg';
import cliProgress from 'cli-progress';
import { datasetSizes, seedDataset } from './bench/dataset.mjs';
import { drive, driveSql } from './bench/load.mjs';
import { CARE_LOG_WRITE, READS } from './bench/reads.mjs';
import { firstPageScripts, todayLargestPaint } from './bench/client.mjs';
import { writePlans } from './bench/plans.mjs';
import { timeSacPlanning, workerThroughput } from './bench/jobs.mjs';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const base = /** @type {string} */ (process.env.BASE_URL);
const databaseUrl = /** @type {string} */ (process.env.DATABASE_URL);
const scale = Number(process.env.BENCH_SCALE ?? 1);
const seconds = Number(process.env.BENCH_SECONDS ?? 5);
const connectionSteps = (process.env.BENCH_CONNECTIONS ?? '1,10,50').split(',').map(Number);
const bases = (process.env.BASE_URLS ?? base).split(',');
const shared = await import('../shared/dist/index.js');

/** @type {Record<string, unknown>[]} */
const rows = [];
const ms = (/** @type {number} */ x) => (Number.isFinite(x) ? x.toFixed(1) : '');

// 1. A pure computation both sides run on every render of an account.
{
  const parties = [
    { partyId: 'a', weight: 2, pickOrder: 1 },
    { partyId: 'b', weight: 1, fixedCount: 10, pickOrder: 2 },
    { partyId: 'c', weight: 1, pickOrder: 3 },
  ];
  const t = performance.now();
  const n = 20000;
  for (let i = 0; i < n; i++) shared.computeShares(50 + (i % 1950), parties);
  rows.push({
    measurement: 'computeShares, 3 parties, N 50–2000',
    conns: '',
    'req/s': '',
    p50: `${(((performance.now() - t) / n) * 1000).toFixed(1)} µs`,
    p95: '',
  });
}

// 2. Two keepers through the API (their password hashes are real), the rest of the dataset in SQL.
const password = 'bench password 1234 long enough';
const db = new pg.Client({ connectionString: databaseUrl });
await db.connect();
/** @param {string} path @param {object} body */
async function post(path, body) {
  const res = await fetch(`${base}/api/auth/${path}`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) });
  if (!res.ok) throw new Error(`${path} ${JSON.stringify(body)}: ${res.status} ${await res.text()}`);
  return res.json();
}
/** Registers, marks the address confirmed in SQL (no mail round trip in a benchmark) and signs in. */
async function register(/** @type {string} */ email, /** @type {string} */ displayName) {
  await post('register', { email, password, displayName });
  await db.query('update users set email_confirmed_at = now() where email = $1', [email]);
  return /** @type {{ accessToken: string, user: { id: string } }} */ (await post('login', { email, password }));
}
const big = await register('bench.big@example.test', 'Big keeper');
const partner = await register('bench.partner@example.test', 'Bench partner');
const auth = { authorization: `Bearer ${big.accessToken}` };
const passwordHash = (await db.query('select password_hash from users where id = $1', [big.user.id])).rows[0].password_hash;
const sizes = datasetSizes(scale);
const bar = new cliProgress.SingleBar({ format: 'seeding [{bar}] {value}/{total} {label}' }, cliProgress.Presets.shades_classic);
bar.start(8, 0, { label: '' });
const seeded = performance.now();
await seedDataset(db, { bigKeeperId: big.user.id, partnerId: partner.user.id, passwordHash, scale, step: (label) => bar.increment({ label }) });
bar.stop();
rows.push({
  measurement: `seed dataset (${JSON.stringify(sizes)})`,
  conns: '',
  'req/s': '',
  p50: `${((performance.now() - seeded) / 1000).toFixed(1)} s`,
  p95: '',
});

const ids = {
  keeper: big.user.id,
  project: (await db.query('select id from projects where owner_id = $1 order by created_at desc, id limit 1', [big.user.id])).rows[0].id,
  sac: '',
  partnerMember: '',
};
ids.sac = (await db.query('select id from sacs where project_id = $1 order by lay_date limit 1', [ids.project])).rows[0].id;
ids.partnerMember = (await db.query(`select id from project_members where project_id = $1 and role = 'partner'`, [ids.project])).rows[0].id;
await db.end();

// 3a. The query plans of the main reads on this dataset, for docs/performance.md.
const plansDir = path.join(root, '.bench/plans');
const plans = await writePlans({ databaseUrl, dir: plansDir, ids, reads: READS });
console.log(`${plans.length} query plans (EXPLAIN ANALYZE, BUFFERS) written to ${path.relative(root, plansDir)}/`);

// 3. Reads beside bare SQL, then the write beside a bare insert.
/** @param {string} name @param {number} c @param {{ rps: number, p50: number, p95: number, p99: number, errors: number }} api @param {{ rps: number, p50: number, p95: number }} sql */
function pairRow(name, c, api, sql) {
  rows.push({
    measurement: name,
    conns: c,
    'req/s': api.rps.toFixed(0),
    p50: ms(api.p50),
    p95: ms(api.p95),
    p99: ms(api.p99),
    errors: api.errors,
    'SQL req/s': sql.rps.toFixed(0),
    'SQL p95': ms(sql.p95),
    'p50 ratio': (api.p50 / sql.p50).toFixed(1),
  });
}
for (const read of READS) {
  for (const c of connectionSteps) {
    const api = await drive({ url: base + read.path(ids), connections: c, seconds, headers: auth });
    const sql = await driveSql({ databaseUrl, connections: c, seconds, sql: read.sql, params: (i) => read.params(ids, i) });
    pairRow(`GET ${read.name}`, c, api, sql);
  }
}
for (const c of connectionSteps) {
  const api = await drive({ url: base + CARE_LOG_WRITE.path(ids), connections: c, seconds, headers: auth, method: 'POST', body: CARE_LOG_WRITE.body });
  const sql = await driveSql({ databaseUrl, connections: c, seconds, sql: CARE_LOG_WRITE.sql, params: () => CARE_LOG_WRITE.params(ids) });
  pairRow(CARE_LOG_WRITE.name, c, api, sql);
}
// 3b. With several API instances on the one database: the same reads driven across all of them.
if (bases.length > 1) {
  for (const read of READS.filter((r) => r.name === 'dashboard' || r.name.startsWith('projects list'))) {
    for (const c of connectionSteps.filter((n) => n >= bases.length)) {
      const parts = await Promise.all(
        bases.map((b, i) =>
          drive({ url: b + read.path(ids), connections: Math.floor(c / bases.length) + (i < c % bases.length ? 1 : 0), seconds, headers: auth }),
        ),
      );
      const p = (/** @type {'p50' | 'p95' | 'p99'} */ k) => Math.max(...parts.map((x) => x[k]));
      rows.push({
        measurement: `GET ${read.name}, across ${bases.length} instances (slowest instance's percentiles)`,
        conns: c,
        'req/s': parts.reduce((n, x) => n + x.rps, 0).toFixed(0),
        p50: ms(p('p50')),
        p95: ms(p('p95')),
        p99: ms(p('p99')),
        errors: parts.reduce((n, x) => n + x.errors, 0),
      });
    }
  }
}

// 3c. Background work: reminder planning of up to 5 000 open sacs, and one worker's throughput.
{
  const planning = await timeSacPlanning({ root, limit: 5000 });
  rows.push({
    measurement: `plan reminders of ${planning.sacs} open sacs (one transaction)`,
    conns: '',
    'req/s': '',
    p50: `${(planning.ms / 1000).toFixed(2)} s`,
    p95: '',
  });
  for (const w of [
    { batchSize: 1, pollingIntervalSeconds: 2, jobs: 10 },
    { batchSize: 20, pollingIntervalSeconds: 2, jobs: 200 },
    { batchSize: 100, pollingIntervalSeconds: 2, jobs: Math.max(200, Math.round(2000 * Math.min(1, scale * 10))) },
  ]) {
    const jobs = await workerThroughput({ databaseUrl, ...w });
    rows.push({
      measurement: `one pg-boss worker, batch of ${w.batchSize} every ${w.pollingIntervalSeconds} s${w.batchSize === 20 ? ' (as the app)' : ''}, ${jobs.jobs} no-op jobs`,
      conns: '',
      'req/s': `${jobs.perSecond.toFixed(1)} jobs/s`,
      p50: '',
      p95: '',
    });
  }
}

{
  const login = await drive({
    url: `${base}/api/auth/login`,
    connections: 1,
    seconds,
    method: 'POST',
    body: JSON.stringify({ email: 'bench.big@example.test', password }),
  });
  rows.push({
    measurement: 'POST sign-in (argon2id verify)',
    conns: 1,
    'req/s': login.rps.toFixed(0),
    p50: ms(login.p50),
    p95: ms(login.p95),
    p99: ms(login.p99),
    errors: login.errors,
  });
}

// 4. The client: first page's JavaScript (gzip) and the Today page's largest contentful paint.
const scripts = firstPageScripts(path.join(root, 'client/dist'));
rows.push({
  measurement: `first page JavaScript, gzip (${scripts.files.length} files)`,
  conns: '',
  'req/s': '',
  p50: `${(scripts.gzipBytes / 1024).toFixed(0)} KB`,
  p95: '',
});
const lcp = await todayLargestPaint(base, 'bench.big@example.test', password);
rows.push({
  measurement: 'Today page largest contentful paint (Chromium)',
  conns: '',
  'req/s': '',
  p50: lcp === null ? 'skipped: no Chromium' : `${lcp.toFixed(0)} ms`,
  p95: '',
});

console.log(`\nBroodsilk benchmark, ${new Date().toISOString().slice(0, 10)}, ${os.cpus().length} cores, scale ${scale}, ${seconds} s per run (times in ms)\n`);
console.table(rows);
const out = path.join(root, '.bench');
mkdirSync(out, { recursive: true });
const file = path.join(out, `bench-${new Date().toISOString().replace(/[:.]/g, '-')}.json`);
writeFileSync(file, JSON.stringify({ date: new Date().toISOString(), cores: os.cpus().length, scale, seconds, sizes, rows }, null, 2));
console.log(`figures written to ${path.relative(root, file)}`);
