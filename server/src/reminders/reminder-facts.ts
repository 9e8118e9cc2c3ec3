import type { EntityManager } from '@mikro-orm/postgresql';
import { maleClock, todayIn, type ReminderPreferences } from '@broodsilk/shared';
import { User } from '../users/user.entity';
import { ProjectMember } from '../projects/project-member.entity';
import { Pairing } from '../projects/pairing.entity';
import { Project } from '../projects/project.entity';
import { Animal } from '../animals/animal.entity';
import { effectiveBreeding } from '../species/effective-breeding';
import { ownBreeding } from '../species/species.mapper';
import { Sac } from '../sacs/sac.entity';
import { SAC_POPULATE, windowOf } from '../sacs/sac-views.service';
import { latestCareOf, type LatestCare } from '../sacs/sac-queries';
import { bandOf } from '../sacs/sac-band';
import { ReminderSettings } from './reminder-settings.entity';
import type { AnimalFacts, Recipient, SacFacts } from './planning/reminder-plan.types';

/** Loads what the planner needs from the database (a few queries for many subjects). */

export function recipientOf(u: User, s: ReminderSettings | undefined): Recipient {
  return {
    userId: u.id,
    email: u.email,
    timeZone: u.timeZone,
    language: u.language,
    temperatureUnit: u.temperatureUnit,
    channels: s?.channels ?? {},
    quietHours: s?.quietFrom != null && s.quietTo != null ? { from: s.quietFrom, to: s.quietTo } : null,
    overdueBreaksQuiet: s?.overdueBreaksQuiet ?? false,
    digestHour: s?.digestHour ?? null,
  };
}

export function preferencesOf(u: User, s: ReminderSettings | null): Omit<ReminderPreferences, 'channels'> & { channels: Recipient['channels'] } {
  const r = recipientOf(u, s ?? undefined);
  return { channels: r.channels, quietHours: r.quietHours, overdueBreaksQuiet: r.overdueBreaksQuiet, digestHour: r.digestHour, timeZone: r.timeZone };
}

export async function recipientsOf(em: EntityManager, users: User[]): Promise<Map<string, Recipient>> {
  const settings = users.length ? await em.find(ReminderSettings, { user: { $in: users.map((u) => u.id) } }) : [];
  const byUser = new Map(settings.map((s) => [s.user.id, s]));
  return new Map(users.map((u) => [u.id, recipientOf(u, byUser.get(u.id))]));
}

export async function sacFactsOf(em: EntityManager, sacIds: string[]): Promise<SacFacts[]> {
  if (!sacIds.length) return [];
  const sacs = await em.find(Sac, { id: { $in: sacIds } }, { populate: SAC_POPULATE });
  if (!sacs.length) return [];
  const projectIds = [...new Set(sacs.map((s) => s.project.id))];
  const [members, rolls] = await Promise.all([
    em.find(ProjectMember, { project: { $in: projectIds }, role: { $in: ['owner', 'caretaker'] }, user: { $ne: null } }, { populate: ['user'] }),
    latestCareOf(
      em,
      sacs.map((s) => s.id),
    ),
  ]);
  const recipients = await recipientsOf(em, [...new Map(members.map((m) => [m.user!.id, m.user!])).values()]);
  return sacs.map((s) => ({
    id: s.id,
    projectId: s.project.id,
    projectTitle: s.project.title,
    active: s.outcome === 'in-progress' && !s.project.endedOn && !s.project.closedOn,
    layDate: s.layDate,
    pullWindow: windowOf(s),
    pulledAt: s.pulledAt ?? null,
    rollIntervalHours: s.rollIntervalHours,
    rollingOff: s.rollingOff,
    rollPastLegs: s.rollPastLegs,
    leftWithMother: s.leftWithMother,
    stage: s.broodStage,
    lastRollAt: rolls.get(s.id)?.lastRollAt ?? null,
    latestReading: latestReadingOf(s.id, rolls.get(s.id)),
    band: (({ temperatureC, humidityPercent }) => ({ temperatureC, humidityPercent }))(bandOf(s)),
    recipients: members.filter((m) => m.project.id === s.project.id).map((m) => recipients.get(m.user!.id)!),
  }));
}

/** The newest temperature or humidity reading; its sac and instant name the reminder, so each reading is told once. */
function latestReadingOf(sacId: string, care: LatestCare | undefined): SacFacts['latestReading'] {
  const t = care?.temperature;
  const h = care?.humidity;
  const newest =
    t && (!h || t.at >= h.at)
      ? { at: t.at, temperatureC: t.value, humidityPercent: null }
      : h
        ? { at: h.at, temperatureC: null, humidityPercent: h.value }
        : null;
  return newest ? { id: `${sacId}@${newest.at.toISOString()}`, ...newest } : null;
}

export async function animalFactsOf(em: EntityManager, animalIds: string[], now: Date): Promise<AnimalFacts[]> {
  if (!animalIds.length) return [];
  const animals = await em.find(Animal, { id: { $in: animalIds }, status: { $in: ['active', 'on-loan'] } }, { populate: ['species', 'recordedBy'] });
  const recipients = await recipientsOf(em, [...new Map(animals.map((a) => [a.recordedBy.id, a.recordedBy])).values()]);
  const females = animals.filter((a) => a.sex === 'female' && a.lastMoltOn).map((a) => a.id);
  const pairings = females.length
    ? await em.find(Pairing, { project: { female: { $in: females } } }, { populate: ['project'], orderBy: { startedOn: 'desc' } })
    : [];
  // A corrected pairing stays as a row, struck by its correction: only the others count.
  const struck = new Set(pairings.map((p) => p.corrects?.id).filter(Boolean));
  return animals.map((a) => {
    const keeper = recipients.get(a.recordedBy.id)!;
    const pairedOn = pairings.find((p) => !struck.has(p.id) && (p.project as Project).female.id === a.id)?.startedOn ?? null;
    return {
      id: a.id,
      label: a.label,
      keeper,
      maleClockChanges: maleClockChangesOf(a, todayIn(keeper.timeZone, now)),
      dueBackOn: a.status === 'on-loan' ? (a.dueBackOn ?? null) : null,
      moltAfterPairing: pairedOn && a.lastMoltOn && a.lastMoltOn > pairedOn ? { moltedOn: a.lastMoltOn, pairedOn } : null,
    };
  });
}

function maleClockChangesOf(a: Animal, today: string): AnimalFacts['maleClockChanges'] {
  if (a.sex !== 'male' || a.maturity !== 'mature' || !a.maturedOn || a.maturedOn > today) return [];
  const life = effectiveBreeding(a.species.group, ownBreeding(a.species)).matureMaleLifespanMonths;
  const clock = maleClock(a.maturedOn, today, { minMonths: life.value.min, maxMonths: life.value.max });
  return clock.changes.filter((c): c is AnimalFacts['maleClockChanges'][number] => c.state !== 'fresh');
}

/** Users who asked for a digest. */
export async function digestRecipients(em: EntityManager, userIds: string[]): Promise<Recipient[]> {
  const users = await em.find(User, { id: { $in: userIds } });
  return [...(await recipientsOf(em, users)).values()];
}
