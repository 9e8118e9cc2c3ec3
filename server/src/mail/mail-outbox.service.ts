import { Injectable, Logger, type OnApplicationBootstrap, type OnApplicationShutdown } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { EntityManager } from '@mikro-orm/postgresql';
import PgBoss from 'pg-boss';
import { MailService, type OutgoingMail } from './mail.service';

export const MAIL_QUEUE = 'mail-out';
/** Mail written by the job itself (see `enqueueComposed`). */
export const COMPOSE_QUEUE = 'mail-compose';
/** pg-boss keeps its tables in a schema of its own, away from the migrations' `public`. */
export const MAIL_JOBS_SCHEMA = 'pgboss_mail';

/** Writes the mail of a composed job, or null when there is nothing to send. */
export type MailComposer = (data: Record<string, string>) => Promise<Omit<OutgoingMail, 'attachments'> | null>;

interface ComposeJob {
  kind: string;
  data: Record<string, string>;
}

/** pg-boss writes `$1`-style SQL; a MikroORM transaction runs knex's `?` style. Each `$n` becomes a `?` with its value. */
function inTransaction(tx: EntityManager): PgBoss.Db {
  return {
    executeSql: async (text, values) => {
      const ordered: unknown[] = [];
      const sql = text.replace(/\$(\d+)/g, (_, n: string) => {
        ordered.push(values[Number(n) - 1]);
        return '?';
      });
      const rows = await tx.getConnection().execute(sql, ordered, 'all', tx.getTransactionContext());
      return { rows: rows as unknown[] };
    },
  };
}

/**
 * Mail that belongs to a write (a reset link, an invitation) is queued in the write's own
 * transaction and sent by a pg-boss worker after commit: a refused write sends nothing, and a
 * mail server that is down delays the mail (retried with backoff) instead of failing the request.
 * The worker runs unless JOBS_ENABLED=false.
 */
@Injectable()
export class MailOutbox implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly logger = new Logger(MailOutbox.name);
  private boss: PgBoss | null = null;
  private readonly composers = new Map<string, MailComposer>();

  constructor(
    private readonly config: ConfigService,
    private readonly mail: MailService,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    const boss = new PgBoss({ connectionString: this.config.getOrThrow<string>('database.url'), schema: MAIL_JOBS_SCHEMA, schedule: false });
    boss.on('error', (e) => this.logger.error(`pg-boss: ${e.message}`));
    await boss.start();
    await boss.createQueue(MAIL_QUEUE, { name: MAIL_QUEUE, retryLimit: 8, retryDelay: 30, retryBackoff: true });
    await boss.createQueue(COMPOSE_QUEUE, { name: COMPOSE_QUEUE, retryLimit: 8, retryDelay: 30, retryBackoff: true });
    if (process.env.JOBS_ENABLED !== 'false') {
      await boss.work<OutgoingMail>(MAIL_QUEUE, { pollingIntervalSeconds: 0.5 }, async ([job]) => this.mail.send(job.data));
      await boss.work<ComposeJob>(COMPOSE_QUEUE, { pollingIntervalSeconds: 0.5 }, async ([job]) => this.compose(job.data));
    }
    this.boss = boss;
  }

  async onApplicationShutdown(): Promise<void> {
    const boss = this.boss;
    this.boss = null;
    if (boss) await boss.stop({ graceful: true, wait: true, timeout: 5_000 });
  }

  /** Queues `mail` inside the transaction `tx`; it goes out once `tx` commits. */
  async enqueue(tx: EntityManager, mail: Omit<OutgoingMail, 'attachments'>): Promise<void> {
    if (!this.boss) throw new Error('The mail queue is not running yet.');
    await this.boss.send(MAIL_QUEUE, mail, { db: inTransaction(tx) });
  }

  /** Says how mail of `kind` is written; a feature calls this from its constructor. */
  defineComposer(kind: string, composer: MailComposer): void {
    this.composers.set(kind, composer);
  }

  /**
   * Queues a job that decides and writes the mail itself when it runs (after `tx` commits). The
   * request then does the same work whatever the mail turns out to be, or whether there is one:
   * what to send may depend on records the request must not reveal (an account's existence).
   */
  async enqueueComposed(tx: EntityManager, kind: string, data: Record<string, string>): Promise<void> {
    if (!this.boss) throw new Error('The mail queue is not running yet.');
    if (!this.composers.has(kind)) throw new Error(`No mail composer for "${kind}".`);
    await this.boss.send(COMPOSE_QUEUE, { kind, data } satisfies ComposeJob, { db: inTransaction(tx) });
  }

  private async compose(job: ComposeJob): Promise<void> {
    const composer = this.composers.get(job.kind);
    if (!composer) throw new Error(`No mail composer for "${job.kind}".`);
    const mail = await composer(job.data);
    if (mail) await this.mail.send(mail);
  }
}
