import PgBoss from 'pg-boss';

/** pg-boss keeps its tables in a schema of its own, away from the migrations' `public`. */
export const JOBS_SCHEMA = 'pgboss';

/**
 * Every queue of the app and how pg-boss keeps it. A queue is a partition table, so it is made by
 * the database's owner when migrating (`installJobQueues`), never by the running app, whose role
 * may not create tables. A feature declares its job kind with one of these names.
 */
export const JOB_QUEUES = {
  'mail-out': { retryLimit: 8, retryDelay: 30, retryBackoff: true },
  'mail-compose': { retryLimit: 8, retryDelay: 30, retryBackoff: true },
  // `short`: one waiting job per singleton key, so planning the same reminder twice queues it once.
  reminder: { policy: 'short', retryLimit: 5, retryDelay: 60, retryBackoff: true },
} as const satisfies Record<string, Omit<PgBoss.Queue, 'name'>>;

export type QueueName = keyof typeof JOB_QUEUES;

/**
 * As the owner: creates or upgrades pg-boss's schema and creates each queue (an existing queue
 * gets its settings updated). Part of `npm run migrate`; the app starts pg-boss with `migrate: false`.
 */
export async function installJobQueues(ownerUrl: string): Promise<void> {
  const boss = new PgBoss({ connectionString: ownerUrl, schema: JOBS_SCHEMA, migrate: true, supervise: false, schedule: false, max: 1 });
  const failures: Error[] = [];
  boss.on('error', (e) => failures.push(e));
  await boss.start();
  try {
    for (const [name, settings] of Object.entries(JOB_QUEUES)) {
      await boss.createQueue(name, { name, ...settings });
      await boss.updateQueue(name, { name, ...settings });
    }
    // The planner looks up a subject's pending reminders by `plannedFor` (JobsService.pendingFor).
    await boss
      .getDb()
      .executeSql(
        `create index if not exists job_planned_for on ${JOBS_SCHEMA}.job (name, (data->>'plannedFor')) where state in ('created', 'retry', 'active')`,
        [],
      );
  } finally {
    await boss.stop({ graceful: false, wait: true });
  }
  if (failures.length) throw failures[0]!;
}
