import { Injectable, Logger } from '@nestjs/common';
import { CreateRequestContext, EntityManager, MikroORM } from '@mikro-orm/postgresql';
import { todayIn, type NotificationResponse } from '@broodsilk/shared';
import { MailService } from '../mail/mail.service';
import { User } from '../users/user.entity';
import { ProjectMember } from '../projects/project-member.entity';
import { Animal } from '../animals/animal.entity';
import { maleClockOf } from '../animals/animals.mapper';
import { Sac } from '../sacs/sac.entity';
import { SAC_POPULATE, SacViewsService } from '../sacs/sac-views.service';
import { Clock } from '../common/clock';
import { Notification } from './notification.entity';
import { sacCandidates, type Candidate } from './reminder-candidates';

export interface ReminderRun {
  sent: number;
  skipped: number;
}

const CLOCK_WORDS = { prime: 'is now in his prime', late: 'is now late in his time', 'past-typical': 'is now past the typical lifespan' } as const;

@Injectable()
export class RemindersService {
  private readonly logger = new Logger(RemindersService.name);

  constructor(
    // @CreateRequestContext finds `orm` and gives `em` a context of its own for each run.
    private readonly orm: MikroORM,
    private readonly em: EntityManager,
    private readonly views: SacViewsService,
    private readonly mail: MailService,
    private readonly clock: Clock,
  ) {}

  /**
   * The periodic job: finds what is due for everyone and sends each reminder once per thing per
   * person per day (by mail and in-app). Runs in its own request context, never the global one.
   */
  @CreateRequestContext()
  async runOnce(now: Date = this.clock.now()): Promise<ReminderRun> {
    const candidates = [...(await this.sacReminders(now)), ...(await this.maleReminders(now))];
    let sent = 0;
    for (const c of candidates) if (await this.deliver(c)) sent += 1;
    return { sent, skipped: candidates.length - sent };
  }

  private async sacReminders(now: Date): Promise<Candidate[]> {
    const sacs = await this.em.find(Sac, { outcome: 'in-progress', project: { endedOn: null, closedOn: null } }, { populate: SAC_POPULATE });
    if (!sacs.length) return [];
    const members = await this.em.find(
      ProjectMember,
      { project: { $in: [...new Set(sacs.map((s) => s.project.id))] }, role: { $in: ['owner', 'caretaker'] }, user: { $ne: null } },
      { populate: ['user'] },
    );
    const out: Candidate[] = [];
    for (const m of members) {
      const own = sacs.filter((s) => s.project.id === m.project.id);
      const views = await this.views.build(this.em, own, m.user!.timeZone, now);
      own.forEach((s, i) => out.push(...sacCandidates({ id: m.user!.id, email: m.user!.email }, s.project.id, s.project.title, views[i])));
    }
    return out;
  }

  /** Males whose clock moves to its next state today, for the keeper who records them (the rule of the collection's males list). */
  private async maleReminders(now: Date): Promise<Candidate[]> {
    const males = await this.em.find(
      Animal,
      { sex: 'male', maturity: 'mature', maturedOn: { $ne: null }, status: { $in: ['active', 'on-loan'] } },
      { populate: ['species', 'recordedBy'] },
    );
    const out: Candidate[] = [];
    for (const a of males) {
      const u = a.recordedBy;
      const today = todayIn(u.timeZone, now);
      const clock = maleClockOf(a, today);
      const change = clock?.changes.find((c) => c.from === today);
      if (!clock || !change || change.state === 'fresh') continue;
      out.push({
        key: `male-clock:${a.id}:${change.state}:${u.id}:${today}`,
        userId: u.id,
        email: u.email,
        kind: 'male-clock',
        title: `Male clock: ${a.label}`,
        body: `${a.label} ${CLOCK_WORDS[change.state]} (day ${clock.daysSinceMaturing} since his maturing molt).`,
        subject: { type: 'animal', id: a.id },
        projectId: null,
      });
    }
    return out;
  }

  /** Claims the key, stores the notification and sends the mail in one transaction: a failed mail rolls back and is retried next run. */
  private async deliver(c: Candidate): Promise<boolean> {
    try {
      return await this.em.transactional(async (tx) => {
        const claimed = await tx
          .getConnection()
          .execute<{ key: string }[]>(
            `insert into reminder_sent (id, created_at, updated_at, key) values (gen_random_uuid(), now(), now(), ?) on conflict (key) do nothing returning key`,
            [c.key],
            'all',
            tx.getTransactionContext(),
          );
        if (!claimed.length) return false;
        tx.create(Notification, {
          user: tx.getReference(User, c.userId),
          kind: c.kind,
          title: c.title,
          body: c.body,
          subjectType: c.subject.type,
          subjectId: c.subject.id,
          projectId: c.projectId,
        });
        await tx.flush();
        await this.mail.send({
          to: c.email,
          subject: `Broodsilk: ${c.title}`,
          text: `${c.body}\n\nYou get this reminder once a day per sac or animal while it is due.`,
        });
        return true;
      });
    } catch (e) {
      this.logger.error(`reminder ${c.key} not sent: ${(e as Error).message}`);
      return false;
    }
  }
}

export function toNotificationResponse(n: Notification): NotificationResponse {
  return {
    id: n.id,
    kind: n.kind,
    title: n.title,
    body: n.body,
    subject: { type: n.subjectType, id: n.subjectId },
    projectId: n.projectId ?? null,
    createdAt: n.createdAt.toISOString(),
    readAt: n.readAt?.toISOString() ?? null,
  };
}
