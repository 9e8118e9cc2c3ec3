import { Inject, Injectable, Logger, type OnModuleInit } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import { CreateRequestContext, EntityManager, MikroORM } from '@mikro-orm/postgresql';
import { channelSendsEmail, channelSendsInApp } from '@broodsilk/shared';
import { appConfig } from '../config/app.config';
import { JobsService } from '../jobs/jobs.service';
import { MailOutbox } from '../mail/mail-outbox.service';
import { renderNoticeMail, unsubscribeHeaders } from '../mail/templates/notice-mail';
import { Clock } from '../common/clock';
import { User } from '../users/user.entity';
import { Notification } from './notification.entity';
import { REMINDER_QUEUE, ReminderPlanner, type ReminderJob } from './reminder-planner.service';
import { currentPlan } from './current-plan';
import { claimSent } from './claim-sent';
import { reminderMailWords, reminderWords } from './reminder-words';
import { unsubscribeToken } from './unsubscribe-token';
import type { PlannedReminder, Recipient } from './planning/reminder-plan.types';

/** A job may run a little before its instant (clocks of two hosts); later than this and its plan moved on. */
const EARLY_MS = 60_000;

export type DeliveryOutcome = 'sent' | 'no-longer-true' | 'moved' | 'already-sent';

/**
 * Works the reminder jobs: re-checks that the reminder is still in its subject's plan, claims its
 * key in `reminder_sent` (unique: once, whatever the number of workers), stores the in-app
 * notification and queues the e-mail in the same transaction.
 */
@Injectable()
export class ReminderDelivery implements OnModuleInit {
  private readonly logger = new Logger(ReminderDelivery.name);

  constructor(
    // @CreateRequestContext finds `orm` and gives `em` a context of its own for each job.
    private readonly orm: MikroORM,
    private readonly em: EntityManager,
    private readonly jobs: JobsService,
    private readonly planner: ReminderPlanner,
    private readonly outbox: MailOutbox,
    private readonly clock: Clock,
    @Inject(appConfig.KEY) private readonly app: ConfigType<typeof appConfig>,
  ) {}

  onModuleInit(): void {
    this.jobs.define<ReminderJob>({
      queue: REMINDER_QUEUE, // a `short` queue (JOB_QUEUES): planning the same reminder twice queues it once
      planned: true,
      handle: async (job) => {
        const outcome = await this.deliver(job.data);
        this.logger.log(`reminder ${job.data.key}: ${outcome}`);
      },
    });
  }

  @CreateRequestContext()
  async deliver(job: ReminderJob): Promise<DeliveryOutcome> {
    const now = this.clock.now();
    return this.em.transactional(async (tx) => {
      const { plan, recipients, about } = await currentPlan(tx, job.plannedFor, now);
      const r = plan.find((x) => x.key === job.key);
      if (!r) return 'no-longer-true';
      if (r.sendAt.getTime() > now.getTime() + EARLY_MS) return 'moved';
      if (!(await claimSent(tx, r.key))) return 'already-sent';
      const to = recipients.get(r.userId)!;
      const words = reminderWords(r.kind, r.details, { reader: to, ...about });
      if (channelSendsInApp(r.channel)) {
        tx.create(Notification, {
          user: tx.getReference(User, r.userId),
          kind: r.kind,
          title: words.title,
          body: words.body,
          subjectType: r.subject?.type ?? null,
          subjectId: r.subject?.id ?? null,
          projectId: r.projectId,
        });
        await tx.flush();
      }
      if (channelSendsEmail(r.channel)) await this.mail(tx, r, to, words);
      if (r.kind === 'daily-digest') await this.planner.replanDigests(tx, [r.userId]);
      return 'sent';
    });
  }

  private async mail(tx: EntityManager, r: PlannedReminder, to: Recipient, words: { title: string; body: string }): Promise<void> {
    const base = this.app.publicUrl.replace(/\/$/, '');
    const unsubscribeUrl = `${base}/api/unsubscribe/${unsubscribeToken(this.app.jwtSecret, r.userId, r.kind)}`;
    const path = r.subject ? `/${r.subject.type === 'sac' ? 'sacs' : 'collection'}/${r.subject.id}` : '/';
    const frame = reminderMailWords(to.language, r.kind);
    const { html, text } = renderNoticeMail({
      lang: to.language,
      title: words.title,
      paragraphs: words.body.split('\n').filter(Boolean),
      link: { url: `${base}${path}`, label: frame.open },
      why: frame.why,
      unsubscribe: { url: unsubscribeUrl, label: frame.unsubscribe },
    });
    await this.outbox.enqueue(tx, {
      to: to.email,
      subject: frame.subject(words.title),
      html,
      text,
      headers: unsubscribeHeaders(unsubscribeUrl),
    });
  }
}
