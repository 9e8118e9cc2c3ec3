// @ts-check
// Drives one endpoint with autocannon, and the hand-written SQL beside it with a pg pool of the
// same size, for the same time. Latencies are collected per response so p95 is exact.
import autocannon from 'autocannon';
import pg from 'pg';
import { performance } from 'node:perf_hooks';

/** @param {number[]} samples */
export function summarise(samples) {
  const s = [...samples].sort((a, b) => a - b);
  const q = (/** @type {number} */ p) => (s.length ? s[Math.min(s.length - 1, Math.floor(p * s.length))] : NaN);
  return { n: s.length, p50: q(0.5), p95: q(0.95), p99: q(0.99) };
}

/**
 * @param {{ url: string, connections: number, seconds: number, headers?: Record<string, string>, method?: string, body?: string }} o
 */
export async function drive(o) {
  /** @type {number[]} */
  const latencies = [];
  let errors = 0;
  const instance = autocannon({
    url: o.url,
    connections: o.connections,
    duration: o.seconds,
    method: /** @type {any} */ (o.method ?? 'GET'),
    headers: { ...(o.headers ?? {}), ...(o.body ? { 'content-type': 'application/json' } : {}) },
    body: o.body,
  });
  instance.on('response', (_client, status, _bytes, ms) => {
    latencies.push(ms);
    if (status >= 400) errors += 1;
  });
  const result = await instance;
  return { ...summarise(latencies), rps: result.requests.average, errors: errors + result.errors + result.timeouts };
}

/**
 * The same work as hand-written SQL: `connections` clients each run `sql` back to back for `seconds`.
 * @param {{ databaseUrl: string, connections: number, seconds: number, sql: string, params: (i: number) => unknown[] }} o
 */
export async function driveSql(o) {
  const pool = new pg.Pool({ connectionString: o.databaseUrl, max: o.connections });
  /** @type {number[]} */
  const latencies = [];
  const until = performance.now() + o.seconds * 1000;
  let i = 0;
  const worker = async () => {
    while (performance.now() < until) {
      const t = performance.now();
      await pool.query(o.sql, o.params(i++));
      latencies.push(performance.now() - t);
    }
  };
  const started = performance.now();
  await Promise.all(Array.from({ length: o.connections }, worker));
  const elapsed = (performance.now() - started) / 1000;
  await pool.end();
  return { ...summarise(latencies), rps: latencies.length / elapsed, errors: 0 };
}
