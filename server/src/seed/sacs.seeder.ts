import { addDays, broodStageLabel, label, todayIn, serverWordsFor, type BroodStage } from '@broodsilk/shared';
import { careLogSummary } from '../sacs/care-log.mapper';
import type { User } from '../users/user.entity';
import { ActivityService } from '../activity/activity.service';
import { ProjectMember } from '../projects/project-member.entity';
import type { Project } from '../projects/project.entity';
import { Sac } from '../sacs/sac.entity';
import { SacLogEntry } from '../sacs/sac-log-entry.entity';
import { SacOpening } from '../sacs/sac-opening.entity';
import { BroodCount } from '../sacs/brood-count.entity';
import { findDemoProject } from './projects.seeder';
import type { FeatureSeeder } from './demo-seed';
import { Clock } from '../common/clock';

const HOUR = 3_600_000;

/**
 * The demo's sacs (an invented scenario), all relative to `ctx.today`:
 * - "Vagans autumn pairing": a sac laid 12 days ago, left with the mother (sac laid);
 * - "Hamorii last chance": laid 26 days ago, pulled on day 22; Ines rolls it, the last roll 13 h
 *   ago, so a roll is due on the dashboard; temperatures and humidity logged (in incubator);
 * - "Versicolor shared brood": laid 70 days ago, opened on day 40, counted at first and second
 *   instar with a few losses (brood); the accounts seeder shares out its latest count.
 */
const en = serverWordsFor('en');

export const seedSacs: FeatureSeeder = async (ctx) => {
  const { em, users, today: now } = ctx;
  const mira = users.keeper;
  const ines = users.caretaker;
  const today = todayIn(mira.timeZone, now);
  const activity = new ActivityService(em, new Clock());
  const ago = (hours: number) => new Date(now.getTime() - hours * HOUR);
  const event = (p: Project, actor: User, at: Date, kind: string, sac: Sac, summary: string, data: Record<string, unknown> = {}) =>
    activity.record(em, { projectId: p.id, actorId: actor.id, kind, subjectType: 'sac', subjectId: sac.id, summary, at, data });
  // The same sentence and data the care log writes (care-log.mapper, care-log.service).
  const entry = (p: Project, sac: Sac, author: User, at: Date, kind: SacLogEntry['kind'], values: Partial<SacLogEntry> = {}) => {
    const e = em.create(SacLogEntry, { sac, kind, at, author, createdAt: at, ...values });
    const data = { layDate: sac.layDate, ...(e.temperatureC != null ? { temperatureC: e.temperatureC } : {}), ...(e.stage ? { stage: e.stage } : {}) };
    event(p, author, at, `care.${kind}`, sac, careLogSummary(e, sac.layDate), data);
  };

  // --- sac laid, with the mother ---
  const vagans = await findDemoProject(em, ctx, 'vagansSac');
  const vLaid = addDays(today, -12);
  const vSac = em.create(Sac, {
    project: vagans,
    layDate: vLaid,
    recordedBy: mira,
    notes: 'She sits on it in the burrow; leave her be.',
    createdAt: ago(12 * 24 - 6),
  });
  event(vagans, mira, ago(12 * 24 - 6), 'sac.laid', vSac, `Sac laid on ${vLaid}, left with the mother.`);

  // --- in the incubator, Ines rolls it ---
  const hamorii = await findDemoProject(em, ctx, 'hamoriiIncubator');
  if (!(await em.count(ProjectMember, { project: hamorii, user: ines }))) {
    const joined = ago(5 * 24);
    const m = em.create(ProjectMember, { project: hamorii, user: ines, role: 'caretaker', name: ines.displayName, email: ines.email, createdAt: joined });
    activity.record(em, {
      projectId: hamorii.id,
      actorId: ines.id,
      kind: 'member.joined',
      subjectType: 'member',
      subjectId: m.id,
      summary: `${ines.displayName} joined as caretaker.`,
      at: joined,
    });
  }
  const hLaid = addDays(today, -26);
  const pulledAt = ago(4 * 24 + 2);
  const hSac = em.create(Sac, {
    project: hamorii,
    layDate: hLaid,
    pulledAt,
    pulledOn: todayIn(mira.timeZone, pulledAt),
    pullFromDay: 21,
    pullToDay: 35,
    recordedBy: mira,
    notes: 'Pulled early: she had started to pick at it.',
    createdAt: ago(26 * 24 - 4),
  });
  event(hamorii, mira, ago(26 * 24 - 4), 'sac.laid', hSac, `Sac laid on ${hLaid}, left with the mother.`);
  event(hamorii, mira, pulledAt, 'sac.pulled', hSac, `Sac laid ${hLaid} pulled on ${hSac.pulledOn} and moved to the incubator.`);
  // A roll every ~12 h since the pull; the last one 13 h ago, so one is due now.
  for (let h = 4 * 24 + 1; h >= 13; h -= 12) entry(hamorii, hSac, h % 24 === 1 ? mira : ines, ago(h), 'roll');
  for (const [h, c, rh] of [
    [90, 26.5, 78],
    [66, 26, 80],
    [42, 27, 76],
    [18, 26.5, 79],
  ] as const) {
    entry(hamorii, hSac, ines, ago(h), 'temperature', { temperatureC: c, enteredValue: c, enteredUnit: 'C' });
    entry(hamorii, hSac, ines, ago(h - 0.1), 'humidity', { humidityPercent: rh });
  }
  entry(hamorii, hSac, ines, ago(30), 'note', { text: 'Two eggs look darker than the rest; watching them.' });

  // --- brood: opened, counted at first and second instar ---
  const versicolor = await findDemoProject(em, ctx, 'versicolorBrood');
  const bLaid = addDays(today, -70);
  const day = (n: number, hour = 19) => new Date(`${addDays(bLaid, n)}T${String(hour).padStart(2, '0')}:00:00Z`);
  const bSac = em.create(Sac, {
    project: versicolor,
    layDate: bLaid,
    pulledAt: day(25),
    pulledOn: addDays(bLaid, 25),
    broodStage: 'second-instar',
    recordedBy: mira,
    createdAt: day(0),
  });
  event(versicolor, mira, day(0), 'sac.laid', bSac, `Sac laid on ${bLaid}, left with the mother.`);
  event(versicolor, mira, day(25), 'sac.pulled', bSac, `Sac laid ${bLaid} pulled on ${bSac.pulledOn} and moved to the incubator.`);
  for (let d = 25; d < 38; d += 1) for (const hour of [7, 19]) if (d > 25 || hour === 19) entry(versicolor, bSac, ines, day(d, hour), 'roll');
  const stages: [number, BroodStage][] = [
    [31, 'eggs-with-legs'],
    [45, 'first-instar'],
    [58, 'second-instar'],
  ];
  for (const [d, stage] of stages) entry(versicolor, bSac, d === 45 ? mira : ines, day(d, 8), 'stage', { stage });
  const opening = { healthyEggs: 9, eggsWithLegs: 96, nymphs: 0, darkEggs: 7, spoiledEggs: 2, keptBack: 0 };
  const openedAt = day(40, 9);
  em.create(SacOpening, {
    sac: bSac,
    openedAt,
    ...opening,
    notes: 'Mostly eggs with legs; the dark ones were all at one edge.',
    recordedBy: mira,
    createdAt: openedAt,
  });
  event(versicolor, mira, openedAt, 'sac.opened', bSac, `Sac laid ${bLaid} opened: 105 viable young, 7 dark and 2 spoiled eggs.`);
  em.create(BroodCount, {
    sac: bSac,
    at: openedAt,
    stage: 'eggs-with-legs',
    alive: 105,
    source: 'opening',
    recordedBy: mira,
    note: 'First count, at the opening.',
    createdAt: openedAt,
  });
  const counts: [number, BroodStage, number, number, BroodCount['lossReason'], string?][] = [
    [46, 'first-instar', 101, 4, 'failed-molt'],
    [59, 'second-instar', 98, 3, 'cannibalism', 'Moved into separate vials after this count.'],
    [65, 'second-instar', 97, 1, 'died'],
  ];
  for (const [d, stage, alive, lost, reason, note] of counts) {
    const at = day(d, 10);
    em.create(BroodCount, {
      sac: bSac,
      at,
      stage,
      alive,
      lost,
      lossReason: reason,
      note: note ?? null,
      source: 'count',
      recordedBy: d === 65 ? ines : mira,
      createdAt: at,
    });
    event(
      versicolor,
      d === 65 ? ines : mira,
      at,
      'brood.counted',
      bSac,
      en('text.ofSac', {
        what: en('text.broodCountLost', {
          about: '',
          alive,
          stage: broodStageLabel(en, stage),
          lost,
          reason: reason ? label(en, 'broodLoss', reason).toLowerCase() : '',
        }),
        layDate: bLaid,
      }),
      // The same data the brood-counts service writes, so partner updates read the count from it.
      { stage, alive, lost },
    );
  }
};
