import { Injectable, type OnModuleInit } from '@nestjs/common';
import type { EntityManager } from '@mikro-orm/postgresql';
import { JobsService } from '../jobs/jobs.service';
import { MailService, type OutgoingMail } from './mail.service';

export const MAIL_QUEUE = 'mail-out';

/** What the outbox carries: everything but attachments (a job's data is JSON). */
export type QueuedMail = Omit<OutgoingMail, 'attachments'>;

/**
 * Mail that belongs to a write (a reset link, an invitation, a reminder) is queued in the write's
 * own transaction and sent by a worker after commit: a refused write sends nothing, and a mail
 * server that is down delays the mail (retried with backoff) instead of failing the request.
 */
@Injectable()
export class MailOutbox implements OnModuleInit {
  constructor(
    private readonly jobs: JobsService,
    private readonly mail: MailService,
  ) {}

  onModuleInit(): void {
    this.jobs.define<QueuedMail>({
      queue: MAIL_QUEUE,
      settings: { retryLimit: 8, retryDelay: 30, retryBackoff: true },
      planned: false,
      pollingIntervalSeconds: 0.5,
      handle: (job) => this.mail.send(job.data),
    });
  }

  /** Queues `mail` inside the transaction `tx`; it goes out once `tx` commits. */
  async enqueue(tx: EntityManager, mail: QueuedMail): Promise<void> {
    await this.jobs.send(tx, MAIL_QUEUE, mail);
  }
}
