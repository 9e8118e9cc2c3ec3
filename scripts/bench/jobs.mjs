// @ts-check
// Two measurements of the background work: planning the reminders of up to 5 000 open sacs (the
// work a process with workers does at start, through the built server's own planner), and how many
// jobs one pg-boss worker, set up as the app sets up its workers (batch of 20), completes per second.
import { createRequire } from 'node:module';
import path from 'node:path';
import { performance } from 'node:perf_hooks';
import PgBoss from 'pg-boss';

/**
 * Boots the built server as an application context (no HTTP, workers off) and times
 * `ReminderPlanner.replanSacs` over the open sacs, in one transaction as at start.
 * @param {{ root: string, limit: number }} o
 * @returns {Promise<{ sacs: number, ms: number }>}
 */
export async function timeSacPlanning(o) {
  process.env.JOBS_ENABLED = 'false';
  const require = createRequire(path.join(o.root, 'server/package.json'));
  const { NestFactory } = require('@nestjs/core');
  const { AppModule } = require(path.join(o.root, 'server/dist/app.module.js'));
  const { ReminderPlanner } = require(path.join(o.root, 'server/dist/reminders/reminder-planner.service.js'));
  const app = await NestFactory.createApplicationContext(AppModule, { logger: false });
  try {
    const planner = app.get(ReminderPlanner);
    // The planner's own ORM (a private field at compile time only), so the work runs exactly as in the app.
    const orm = planner.orm;
    const rows = await orm.em.getConnection().execute(`select id from sacs where outcome = 'in-progress' order by id limit ?`, [o.limit]);
    const ids = rows.map((/** @type {{ id: string }} */ r) => r.id);
    const t = performance.now();
    await orm.em.fork().transactional((/** @type {any} */ tx) => planner.replanSacs(tx, ids));
    return { sacs: ids.length, ms: performance.now() - t };
  } finally {
    await app.close();
  }
}

/**
 * Queues `jobs` no-op jobs on a queue of its own and lets one worker work them with the given
 * batch size and polling interval (the app's workers: batch of 20, every 2 s, `server/src/jobs/jobs.service.ts`).
 * pg-boss 10 fetches one batch per polling interval, so this shows the queue's ceiling per worker.
 * @param {{ databaseUrl: string, jobs: number, batchSize: number, pollingIntervalSeconds: number }} o
 * @returns {Promise<{ jobs: number, perSecond: number }>}
 */
export async function workerThroughput(o) {
  const boss = new PgBoss({ connectionString: o.databaseUrl, schema: 'pgboss', schedule: false, supervise: false });
  boss.on('error', () => undefined);
  await boss.start();
  const queue = `bench-throughput-${o.batchSize}`;
  await boss.createQueue(queue);
  await boss.insert(Array.from({ length: o.jobs }, (_, i) => ({ name: queue, data: { i } })));
  let done = 0;
  const t = performance.now();
  /** @type {() => void} */
  let finished = () => undefined;
  const all = new Promise((resolve) => (finished = () => resolve(undefined)));
  await boss.work(queue, { batchSize: o.batchSize, pollingIntervalSeconds: o.pollingIntervalSeconds }, async (batch) => {
    done += batch.length;
    if (done >= o.jobs) finished();
  });
  await all;
  const seconds = (performance.now() - t) / 1000;
  await boss.stop({ graceful: true, wait: true, timeout: 5_000 });
  return { jobs: done, perSecond: done / seconds };
}
