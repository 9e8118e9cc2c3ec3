import { Inject, Injectable, Logger, type OnApplicationBootstrap, type OnApplicationShutdown } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { databaseConfig } from '../config/database.config';
import type { EntityManager } from '@mikro-orm/postgresql';
import PgBoss from 'pg-boss';
import { inTransaction } from './transaction-db';
import { workersEnabled } from './jobs-enabled';
import { JOBS_SCHEMA, type QueueName } from './job-queues';

export { JOBS_SCHEMA } from './job-queues';

/** Jobs fetched at once per queue and process; handled one after another. */
const JOB_BATCH_SIZE = 20;

/** One kind of job: its queue, how pg-boss keeps it, and who works it. */
export interface JobKind<T> {
  /** One of `JOB_QUEUES`, which holds its settings (policy, retries, retention). */
  queue: QueueName;
  /** Planned ahead from facts (reminders): its worker stays off under vitest unless JOBS_ENABLED=true. */
  planned: boolean;
  pollingIntervalSeconds?: number;
  handle(job: PgBoss.Job<T>): Promise<void>;
}

export interface PendingJob {
  id: string;
  plannedFor: string;
  singletonKey: string | null;
  running: boolean;
}

export interface SendJob {
  startAfter?: Date;
  /** With a `short` queue policy: one waiting job per key; a second send with the key is dropped (null). */
  singletonKey?: string;
}

/**
 * The one pg-boss instance of the app: feature modules declare their job kinds (in
 * `onModuleInit`), this starts pg-boss with the app, creates their queues, starts their workers
 * and stops them on shutdown. Jobs sent with a transaction are queued only if it commits.
 */
@Injectable()
export class JobsService implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly logger = new Logger(JobsService.name);
  private readonly kinds = new Map<string, JobKind<never>>();
  private boss: PgBoss | null = null;
  private markRunning!: () => void;
  /** Settles once pg-boss runs: work started at bootstrap by other providers waits on it. */
  private readonly runningSignal = new Promise<void>((resolve) => (this.markRunning = resolve));

  constructor(@Inject(databaseConfig.KEY) private readonly db: ConfigType<typeof databaseConfig>) {}

  /** Declares a job kind; call before the app has started (from a provider's `onModuleInit`). */
  define<T>(kind: JobKind<T>): void {
    if (this.boss) throw new Error(`The job kind ${kind.queue} is declared after the jobs started.`);
    if (this.kinds.has(kind.queue)) throw new Error(`The job kind ${kind.queue} is declared twice.`);
    this.kinds.set(kind.queue, kind as unknown as JobKind<never>);
  }

  get running(): boolean {
    return this.boss !== null;
  }

  /** The queues whose workers run in this process. */
  readonly working = new Set<string>();

  /** True when this process works the planned queues (so it may also catch up on planning at start). */
  get plannedWorkersOn(): boolean {
    return workersEnabled(true);
  }

  async onApplicationBootstrap(): Promise<void> {
    // The schema and the queues are the owner's work (`npm run migrate`): the app's role may not create tables.
    const boss = new PgBoss({ connectionString: this.db.url, schema: JOBS_SCHEMA, schedule: false, migrate: false });
    boss.on('error', (e) => this.logger.error(`pg-boss: ${e.message}`));
    await boss.start().catch((e: Error) => {
      throw new Error(`The job queue is not ready (${e.message}): run "npm run migrate -w server" as the database owner first.`);
    });
    for (const kind of this.kinds.values()) {
      if (!(await boss.getQueue(kind.queue))) {
        await boss.stop({ graceful: false });
        throw new Error(`The job queue "${kind.queue}" does not exist: run "npm run migrate -w server" as the database owner first.`);
      }
      if (!workersEnabled(kind.planned)) continue;
      // A batch per fetch (pg-boss fetches once per polling interval, so a batch of 1 managed about
      // half a job a second); each job still fails and retries on its own: a failed one is marked
      // failed here, and pg-boss completes only the jobs that are still active.
      await boss.work<never>(kind.queue, { pollingIntervalSeconds: kind.pollingIntervalSeconds ?? 2, batchSize: JOB_BATCH_SIZE }, async (jobs) => {
        for (const job of jobs) {
          await kind.handle(job).catch(async (e: Error) => {
            this.logger.warn(`job ${kind.queue} ${job.id} failed: ${e.message}`);
            await boss.fail(kind.queue, job.id, { message: e.message });
          });
        }
      });
      this.working.add(kind.queue);
    }
    this.boss = boss;
    this.markRunning();
  }

  /** Resolves once the queue runs (Nest may bootstrap another module's providers first). */
  whenRunning(): Promise<void> {
    return this.runningSignal;
  }

  async onApplicationShutdown(): Promise<void> {
    const boss = this.boss;
    this.boss = null;
    this.working.clear();
    if (boss) await boss.stop({ graceful: true, wait: true, timeout: 5_000 });
  }

  private started(): PgBoss {
    if (!this.boss) throw new Error('The job queue is not running yet.');
    return this.boss;
  }

  /** Queues a job inside `tx` (it exists once `tx` commits); null when a waiting job has the same singleton key. */
  async send<T extends object>(tx: EntityManager, queue: string, data: T, options: SendJob = {}): Promise<string | null> {
    return this.started().send(queue, data, { ...options, db: inTransaction(tx) });
  }

  /** Cancels waiting jobs inside `tx`. */
  async cancel(tx: EntityManager, queue: string, ids: string[]): Promise<void> {
    if (ids.length) await this.started().cancel(queue, ids, { db: inTransaction(tx) });
  }

  /** Queues many jobs inside `tx` in one statement; one whose singleton key is already waiting is dropped. */
  async sendMany<T extends object>(tx: EntityManager, queue: string, jobs: (SendJob & { data: T })[]): Promise<void> {
    if (!jobs.length) return;
    const rows = jobs.map((j) => ({ name: queue, data: j.data, startAfter: j.startAfter?.toISOString(), singletonKey: j.singletonKey }));
    await this.started().insert(rows, { db: inTransaction(tx) });
  }

  /**
   * Jobs of a queue not yet done (waiting, retrying or running) whose data's `plannedFor` is one
   * of `subjects`, read inside `tx` (through the partial index `job_planned_for`).
   */
  async pendingFor(tx: EntityManager, queue: string, subjects: string[]): Promise<PendingJob[]> {
    if (!subjects.length) return [];
    return tx.getConnection().execute<PendingJob[]>(
      `select id, data->>'plannedFor' as "plannedFor", singleton_key as "singletonKey", state = 'active' as running from ${JOBS_SCHEMA}.job
        where name = ? and state in ('created', 'retry', 'active') and data->>'plannedFor' in (${subjects.map(() => '?').join(', ')})`,
      [queue, ...subjects],
      'all',
      tx.getTransactionContext(),
    );
  }
}
