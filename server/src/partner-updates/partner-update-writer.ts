import type { EntityManager } from '@mikro-orm/postgresql';
import { channelSendsEmail, channelSendsInApp, DEFAULT_REMINDER_CHANNEL, type Language, type NotificationSubjectType } from '@broodsilk/shared';
import { ActivityEvent } from '../activity/activity-event.entity';
import { ProjectMember } from '../projects/project-member.entity';
import { Project } from '../projects/project.entity';
import { User } from '../users/user.entity';
import { readerFrom } from '../users/reader-words';
import { Notification } from '../reminders/notification.entity';
import { ReminderSettings } from '../reminders/reminder-settings.entity';
import { isBadNews, isPartnerUpdateKind, partnerUpdateWords } from './partner-update-words';
import { updateFactsOf } from './partner-update-facts';

/** Events dated further back than this when they are written (old records typed in late) tell nobody. */
export const UPDATE_MAX_AGE_DAYS = 30;

export interface UpdateLink {
  type: NotificationSubjectType;
  id: string;
}

export interface UpdateWords {
  title: string;
  paragraphs: string[];
}

/** How the e-mails of an update leave (the outbox, inside the same transaction); none in the demo seed. */
export interface UpdateMailer {
  toMember(tx: EntityManager, to: { userId: string; email: string; lng: Language; projectTitle: string }, words: UpdateWords, link: UpdateLink): Promise<void>;
  toOutsideParty(
    tx: EntityManager,
    to: { member: ProjectMember; lng: Language; projectTitle: string; ownerName: string },
    words: UpdateWords,
    link: UpdateLink,
    actorId: string | null,
  ): Promise<void>;
}

export interface WriteOptions {
  now: Date;
  mailer: UpdateMailer | null;
  /** Writes updates for events of any age (the demo seed tells its partner about its recent past). */
  anyAge?: boolean;
}

/**
 * Claims one update for one recipient (`reminder_sent`, unique key): false when it was written
 * already, so an event handled twice (a retry, the seed and the live path) tells nobody twice.
 */
async function claim(tx: EntityManager, key: string): Promise<boolean> {
  const rows = await tx
    .getConnection()
    .execute<{ key: string }[]>(
      `insert into reminder_sent (id, created_at, updated_at, key) values (gen_random_uuid(), now(), now(), ?) on conflict (key) do nothing returning key`,
      [key],
      'all',
      tx.getTransactionContext(),
    );
  return rows.length > 0;
}

/** Where an update leads: its sac, else its project. */
const linkOf = (e: ActivityEvent, projectId: string): UpdateLink =>
  e.subjectType === 'sac' && e.subjectId ? { type: 'sac', id: e.subjectId } : { type: 'project', id: projectId };

/**
 * Tells the partners of each event's project what happened, on the caller's transaction: every
 * partner with an account except the one who did it gets the update in-app and by e-mail as they
 * chose; with bad news, partners without an account who have an e-mail address get it by e-mail.
 * Returns how many updates were written.
 */
export async function writePartnerUpdates(tx: EntityManager, eventIds: string[], o: WriteOptions): Promise<number> {
  if (!eventIds.length) return 0;
  const events = await tx.find(ActivityEvent, { id: { $in: eventIds } }, { orderBy: { at: 'asc', createdAt: 'asc' } });
  let written = 0;
  for (const e of events) {
    if (!isPartnerUpdateKind(e.kind)) continue;
    if (!o.anyAge && o.now.getTime() - e.at.getTime() > UPDATE_MAX_AGE_DAYS * 86_400_000) continue;
    const project = await tx.findOneOrFail(Project, e.project.id);
    const partners = await tx.find(ProjectMember, { project: project.id, role: 'partner' }, { populate: ['user'] });
    const members = partners.filter((m) => m.user && m.user.id !== e.actor?.id);
    const outside = isBadNews(e.kind) && o.mailer ? partners.filter((m) => !m.user && m.email) : [];
    if (!members.length && !outside.length) continue;
    const facts = await updateFactsOf(tx, e, project);
    const link = linkOf(e, project.id);
    const userIds = members.map((m) => m.user!.id);
    const settings = new Map((await tx.find(ReminderSettings, { user: { $in: userIds } })).map((s) => [s.user.id, s]));
    for (const m of members) {
      const user = m.user as User;
      if (!(await claim(tx, `partner-update:${e.id}:${user.id}`))) continue;
      const channel = settings.get(user.id)?.channels['partner-update'] ?? DEFAULT_REMINDER_CHANNEL;
      const words = partnerUpdateWords(readerFrom(user), facts);
      if (channelSendsInApp(channel)) {
        tx.create(Notification, {
          user,
          kind: 'partner-update',
          title: words.title,
          body: words.paragraphs.join('\n\n'),
          subjectType: link.type,
          subjectId: link.id,
          projectId: project.id,
        });
      }
      if (channelSendsEmail(channel) && o.mailer)
        await o.mailer.toMember(tx, { userId: user.id, email: user.email, lng: user.language, projectTitle: project.title }, words, link);
      written++;
    }
    if (outside.length) {
      // Outside parties have no settings: they read the keeper's language.
      const owner = await tx.findOneOrFail(User, project.owner.id);
      const words = partnerUpdateWords(readerFrom(owner), facts);
      for (const m of outside) {
        if (!(await claim(tx, `partner-update:${e.id}:member:${m.id}`))) continue;
        await o.mailer!.toOutsideParty(
          tx,
          { member: m, lng: owner.language, projectTitle: project.title, ownerName: owner.displayName },
          words,
          link,
          e.actor?.id ?? null,
        );
        written++;
      }
    }
  }
  await tx.flush();
  return written;
}
