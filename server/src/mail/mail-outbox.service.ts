import { Injectable, type OnModuleInit } from '@nestjs/common';
import type { EntityManager } from '@mikro-orm/postgresql';
import { JobsService } from '../jobs/jobs.service';
import type { QueueName } from '../jobs/job-queues';
import { MailService, type OutgoingMail } from './mail.service';

export const MAIL_QUEUE = 'mail-out' satisfies QueueName;
/** Mail written by the job itself (see `enqueueComposed`). */
export const COMPOSE_QUEUE = 'mail-compose' satisfies QueueName;

/** What the outbox carries: everything but attachments (a job's data is JSON). */
export type QueuedMail = Omit<OutgoingMail, 'attachments'>;

/** Writes the mail of a composed job, or null when there is nothing to send. */
export type MailComposer = (data: Record<string, string>) => Promise<QueuedMail | null>;

interface ComposeJob {
  kind: string;
  data: Record<string, string>;
}

/**
 * Mail that belongs to a write (a reset link, an invitation, a reminder) is queued in the write's
 * own transaction and sent by a worker after commit: a refused write sends nothing, and a mail
 * server that is down delays the mail (retried with backoff) instead of failing the request.
 */
@Injectable()
export class MailOutbox implements OnModuleInit {
  private readonly composers = new Map<string, MailComposer>();

  constructor(
    private readonly jobs: JobsService,
    private readonly mail: MailService,
  ) {}

  onModuleInit(): void {
    this.jobs.define<QueuedMail>({ queue: MAIL_QUEUE, planned: false, pollingIntervalSeconds: 0.5, handle: (job) => this.mail.send(job.data) });
    this.jobs.define<ComposeJob>({ queue: COMPOSE_QUEUE, planned: false, pollingIntervalSeconds: 0.5, handle: (job) => this.compose(job.data) });
  }

  /** Queues `mail` inside the transaction `tx`; it goes out once `tx` commits. */
  async enqueue(tx: EntityManager, mail: QueuedMail): Promise<void> {
    await this.jobs.send(tx, MAIL_QUEUE, mail);
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
    if (!this.composers.has(kind)) throw new Error(`No mail composer for "${kind}".`);
    await this.jobs.send(tx, COMPOSE_QUEUE, { kind, data } satisfies ComposeJob);
  }

  private async compose(job: ComposeJob): Promise<void> {
    const composer = this.composers.get(job.kind);
    if (!composer) throw new Error(`No mail composer for "${job.kind}".`);
    const mail = await composer(job.data);
    if (mail) await this.mail.send(mail);
  }
}
