import type { EntityManager } from '@mikro-orm/postgresql';
import { Sac } from '../sacs/sac.entity';
import { Animal } from '../animals/animal.entity';
import { ProjectMember } from '../projects/project-member.entity';
import { Notification } from './notification.entity';
import { animalFactsOf, digestRecipients, sacFactsOf } from './reminder-facts';
import { planAnimalReminders, planDigest, planSacReminders } from './planning/plan-reminders';
import type { PlannedReminder, Recipient } from './planning/reminder-plan.types';
import { digestBody, reminderWords } from './reminder-words';

export interface CurrentPlan {
  plan: PlannedReminder[];
  recipients: Map<string, Recipient>;
  /** What the words name: the project (and lay date) of a sac, the label of an animal. */
  about: { about: string; layDate?: string };
}

const NONE: CurrentPlan = { plan: [], recipients: new Map(), about: { about: '' } };
const DAY_MS = 24 * 3_600_000;

/** The plan of one subject (`sac:<id>`, `animal:<id>`, `digest:<userId>`) as the facts stand now. */
export async function currentPlan(tx: EntityManager, plannedFor: string, now: Date): Promise<CurrentPlan> {
  const [type, id] = plannedFor.split(':');
  if (type === 'sac') {
    const [f] = await sacFactsOf(tx, [id]);
    if (!f) return NONE;
    return {
      plan: planSacReminders(f, now),
      recipients: new Map(f.recipients.map((r) => [r.userId, r])),
      about: { about: f.projectTitle, layDate: f.layDate },
    };
  }
  if (type === 'animal') {
    const [f] = await animalFactsOf(tx, [id], now);
    if (!f) return NONE;
    return { plan: planAnimalReminders(f, now), recipients: new Map([[f.keeper.userId, f.keeper]]), about: { about: f.label } };
  }
  const [r] = await digestRecipients(tx, [id]);
  // The digest of the last 24 h (a job may run a little early or, after an outage, late).
  const digest = r && planDigest(r, new Date(now.getTime() - DAY_MS + 60_000));
  if (!r || !digest) return NONE;
  return {
    plan: [{ ...digest, details: { ...digest.details, summary: await digestSummary(tx, r, now) } }],
    recipients: new Map([[r.userId, r]]),
    about: { about: '' },
  };
}

/** The digest's body: what is planned for the person in the next 24 hours, in their zone and language, and their unread count. */
async function digestSummary(tx: EntityManager, r: Recipient, now: Date): Promise<string> {
  const memberships = await tx.find(ProjectMember, { user: r.userId, role: { $in: ['owner', 'caretaker'] } }, { fields: ['project'] });
  const sacIds = (await tx.find(Sac, { outcome: 'in-progress', project: { $in: memberships.map((m) => m.project.id) } }, { fields: ['id'] })).map((s) => s.id);
  const animalIds = (await tx.find(Animal, { recordedBy: r.userId, status: { $in: ['active', 'on-loan'] } }, { fields: ['id'] })).map((a) => a.id);
  const planned: { at: Date; title: string }[] = [];
  for (const f of await sacFactsOf(tx, sacIds)) {
    for (const p of planSacReminders(f, now)) {
      if (p.userId === r.userId && p.factAt >= now && p.factAt.getTime() < now.getTime() + DAY_MS) {
        planned.push({ at: p.factAt, title: reminderWords(p.kind, p.details, { reader: r, about: f.projectTitle, layDate: f.layDate }).title });
      }
    }
  }
  for (const f of await animalFactsOf(tx, animalIds, now)) {
    for (const p of planAnimalReminders(f, now)) {
      if (p.factAt >= now && p.factAt.getTime() < now.getTime() + DAY_MS)
        planned.push({ at: p.factAt, title: reminderWords(p.kind, p.details, { reader: r, about: f.label }).title });
    }
  }
  return digestBody(r, planned, await tx.count(Notification, { user: r.userId, readAt: null }));
}
