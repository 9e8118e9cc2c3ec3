// The measurements behind `npm run bench`. Request loops are bounded in count and
// only ever talk to the local app on 127.0.0.1.
import { performance } from 'node:perf_hooks';
import pg from 'pg';

const base = process.env.BASE_URL;
const shared = await import('../shared/dist/index.js');

function stats(samples) {
  const s = [...samples].sort((a, b) => a - b);
  const q = (p) => s[Math.min(s.length - 1, Math.floor(p * s.length))];
  return { n: s.length, p50: q(0.5).toFixed(1), p95: q(0.95).toFixed(1), max: s[s.length - 1].toFixed(1) };
}

async function timed(n, fn) {
  const out = [];
  for (let i = 0; i < n; i++) {
    const t = performance.now();
    await fn(i);
    out.push(performance.now() - t);
  }
  return stats(out);
}

const rows = [];
function report(name, target, s) {
  rows.push({ measurement: name, target, ...s });
}

// 1. Pure computations both sides run on every render of an account.
{
  const parties = [
    { partyId: 'a', weight: 2, pickOrder: 1 },
    { partyId: 'b', weight: 1, fixedCount: 10, pickOrder: 2 },
    { partyId: 'c', weight: 1, pickOrder: 3 },
  ];
  const t = performance.now();
  const n = 20000;
  for (let i = 0; i < n; i++) shared.computeShares(50 + (i % 1950), parties);
  const per = ((performance.now() - t) / n) * 1000;
  rows.push({ measurement: 'computeShares, 3 parties, N 50–2000', target: '< 50 µs each', n, p50: `${per.toFixed(1)} µs (mean)`, p95: '', max: '' });
}

// 2. Sign-in (argon2id dominates) and the collection list on a large collection.
const email = `bench.${Date.now()}@example.test`;
const password = 'bench password 1234';
const reg = await fetch(`${base}/api/auth/register`, {
  method: 'POST',
  headers: { 'content-type': 'application/json' },
  body: JSON.stringify({ email, password, displayName: 'Bench' }),
});
const { accessToken, user } = await reg.json();
const auth = { authorization: `Bearer ${accessToken}` };

report(
  'POST /api/auth/login (argon2id verify)',
  'p95 < 250 ms',
  await timed(20, () =>
    fetch(`${base}/api/auth/login`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email, password }) }).then((r) =>
      r.arrayBuffer(),
    ),
  ),
);

const animalCount = Number(process.env.BENCH_ANIMALS ?? 5000);
const client = new pg.Client({ connectionString: process.env.DATABASE_URL });
await client.connect();
const hasAnimals = (await client.query("select to_regclass('public.animals') as t")).rows[0].t;
if (hasAnimals) {
  const species = (await client.query('select id from species limit 40')).rows.map((r) => r.id);
  const t = performance.now();
  await client.query(
    `insert into animals (id, created_at, updated_at, recorded_by_id, species_id, label, sex, maturity, owner_kind, owner_user_id, custody, status)
     select gen_random_uuid(), now() - (g || ' minutes')::interval, now(), $1, ($2::uuid[])[1 + g % array_length($2::uuid[], 1)], 'B-' || lpad(g::text, 6, '0'),
            (array['female','male','unsexed'])[1 + g % 3]::animal_sex, 'immature', 'self', $1, 'with-owner', (array['active','active','active','sold','deceased'])[1 + g % 5]::animal_status
     from generate_series(1, $3) g`,
    [user.id, species, animalCount],
  );
  rows.push({ measurement: `insert ${animalCount} animals (SQL)`, target: '', n: 1, p50: `${(performance.now() - t).toFixed(0)} ms`, p95: '', max: '' });
  await client.query('analyze animals');
  report(
    `GET /api/animals page 1 of ${animalCount}`,
    'p95 < 100 ms',
    await timed(100, () => fetch(`${base}/api/animals?limit=50`, { headers: auth }).then((r) => r.arrayBuffer())),
  );
  report(
    `GET /api/animals filtered + text search, deep page`,
    'p95 < 150 ms',
    await timed(100, (i) =>
      fetch(`${base}/api/animals?limit=50&offset=${(i % 20) * 50}&sex=female&status=active&q=B-00&sort=label`, { headers: auth }).then((r) => r.arrayBuffer()),
    ),
  );
} else {
  rows.push({ measurement: 'animals list', target: '', n: 0, p50: 'skipped: no animals table yet', p95: '', max: '' });
}
await client.end();

report('GET /api/health (one DB round trip)', 'p95 < 20 ms', await timed(200, () => fetch(`${base}/api/health`).then((r) => r.arrayBuffer())));

console.log('\nBroodsilk benchmark (times in ms unless marked; 2-core machine, loopback)\n');
console.table(rows);
