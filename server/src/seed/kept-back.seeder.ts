import { addDays, todayIn } from '@broodsilk/shared';
import type { User } from '../users/user.entity';
import { ActivityService } from '../activity/activity.service';
import { Animal } from '../animals/animal.entity';
import { Pairing } from '../projects/pairing.entity';
import { Project } from '../projects/project.entity';
import { ProjectMember } from '../projects/project-member.entity';
import { Sac } from '../sacs/sac.entity';
import { SacLogEntry } from '../sacs/sac-log-entry.entity';
import { SacOpening } from '../sacs/sac-opening.entity';
import { BroodCount } from '../sacs/brood-count.entity';
import { KeptBackBatch } from '../sacs/kept-back-batch.entity';
import { KeptBackLogEntry } from '../sacs/kept-back-log-entry.entity';
import type { FeatureSeeder } from './demo-seed';
import { Clock } from '../common/clock';

export const KEPT_BACK_PROJECT = 'Murinus: the dud sac';

/**
 * An unhappy opening of the invented scenario: Mira's murinus pair (MO-009 × MO-014, Tomasz a
 * partner, Ines rolling). The sac, laid 44 days ago and pulled on day 24, is opened on day 32:
 * mostly dark and spoiled eggs, six doubtful ones kept back. Ines rolls the six twice a day;
 * four days later they have collapsed and Mira writes them off. The sac is recorded as failed
 * (infertile). Tomasz reads all of it on the sac page.
 */
export const seedKeptBack: FeatureSeeder = async (ctx) => {
  const { em, users, today: now } = ctx;
  const mira = users.keeper;
  const ines = users.caretaker;
  const tomasz = users.partner;
  const today = todayIn(mira.timeZone, now);
  const activity = new ActivityService(em, new Clock());
  const animals = new Map((await em.find(Animal, { recordedBy: mira, label: { $in: ['MO-009', 'MO-014'] } })).map((a) => [a.label, a]));
  const laid = addDays(today, -44);
  const at = (day: number, hour: number) => new Date(`${addDays(laid, day)}T${String(hour).padStart(2, '0')}:00:00Z`);
  const start = at(-30, 18);

  const project = em.create(Project, {
    owner: mira,
    female: animals.get('MO-009')!,
    male: animals.get('MO-014')!,
    title: KEPT_BACK_PROJECT,
    notes: 'Her first sac. Tomasz takes a third of whatever hatches.',
    createdAt: start,
  });
  const event = (actor: User, when: Date, kind: string, summary: string, subjectType = 'sac', subjectId?: string) =>
    activity.record(em, { projectId: project.id, actorId: actor.id, kind, subjectType, subjectId: subjectId ?? project.id, summary, at: when });
  event(mira, start, 'project.created', `${mira.displayName} started the project "${project.title}" with MO-009 and MO-014.`, 'project');
  for (const [user, role] of [
    [mira, 'owner'],
    [tomasz, 'partner'],
    [ines, 'caretaker'],
  ] as const) {
    em.create(ProjectMember, { project, user, role, name: user.displayName, email: user.email, createdAt: start });
  }
  const pairedOn = addDays(laid, -28);
  em.create(Pairing, {
    project,
    startedAt: at(-28, 19),
    startedOn: pairedOn,
    durationMinutes: 20,
    outcome: 'connected',
    recordedBy: mira,
    createdAt: at(-28, 19),
  });
  event(mira, at(-28, 19), 'pairing.recorded', `Pairing on ${pairedOn} (20 min): connected.`, 'project');

  const sac = em.create(Sac, {
    project,
    layDate: laid,
    pulledAt: at(24, 18),
    pulledOn: addDays(laid, 24),
    outcome: 'failed',
    failureReason: 'infertile',
    recordedBy: mira,
    notes: 'Small and flat from the start.',
    createdAt: at(0, 18),
  });
  event(mira, at(0, 18), 'sac.laid', `Sac laid on ${laid}, left with the mother.`, 'sac', sac.id);
  event(mira, at(24, 18), 'sac.pulled', `Sac laid ${laid} pulled on ${sac.pulledOn} and moved to the incubator.`, 'sac', sac.id);
  for (let d = 25; d < 32; d += 1) em.create(SacLogEntry, { sac, kind: 'roll', at: at(d, 8), author: ines, createdAt: at(d, 8) });

  const openedAt = at(32, 9);
  const opening = { healthyEggs: 6, eggsWithLegs: 0, nymphs: 0, darkEggs: 88, spoiledEggs: 31, keptBack: 6 };
  em.create(SacOpening, {
    sac,
    openedAt,
    ...opening,
    notes: 'Most eggs dark or mouldy. Six still pale and firm: kept back in a separate dish.',
    recordedBy: mira,
    createdAt: openedAt,
  });
  em.create(BroodCount, {
    sac,
    at: openedAt,
    stage: 'eggs',
    alive: 0,
    source: 'opening',
    recordedBy: mira,
    note: 'First count, at the opening.',
    createdAt: openedAt,
  });
  event(
    mira,
    openedAt,
    'sac.opened',
    `Sac laid ${laid} opened: 0 viable young and 6 kept back for more incubation, 88 dark and 31 spoiled eggs.`,
    'sac',
    sac.id,
  );

  const batch = em.create(KeptBackBatch, { sac, createdAt: openedAt });
  for (let d = 32; d < 36; d += 1) {
    for (const hour of [8, 20]) {
      if (d === 32 && hour === 8) continue;
      em.create(KeptBackLogEntry, { batch, kind: 'roll', at: at(d, hour), recordedBy: ines, createdAt: at(d, hour) });
    }
  }
  const checks: [number, string][] = [
    [33, 'Two of the six show a grey patch.'],
    [35, 'Four dark now, two dented.'],
  ];
  for (const [d, note] of checks) {
    em.create(KeptBackLogEntry, { batch, kind: 'check', at: at(d, 20), note, recordedBy: ines, createdAt: at(d, 20) });
    event(ines, at(d, 20), 'kept-back.check', `Kept-back eggs of the sac laid ${laid} checked: ${note}`, 'sac', sac.id);
  }
  const endedAt = at(36, 9);
  Object.assign(batch, { state: 'written-off', endedAt, reason: 'All six collapsed and turned dark; no embryo seen.', endedBy: mira });
  event(mira, endedAt, 'kept-back.written-off', `The 6 eggs kept back from the sac laid ${laid} were written off (${batch.reason}).`, 'sac', sac.id);
  event(mira, endedAt, 'sac.failed', `Sac laid ${laid} recorded as failed: infertile.`, 'sac', sac.id);
};
