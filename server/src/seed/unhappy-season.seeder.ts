import { addDays, maleDepartureSummary, MALE_DEPARTURE_KINDS, todayIn } from '@broodsilk/shared';
import { Animal } from '../animals/animal.entity';
import { Species } from '../species/species.entity';
import { ActivityService } from '../activity/activity.service';
import { Pairing } from '../projects/pairing.entity';
import { Project } from '../projects/project.entity';
import { ProjectMember } from '../projects/project-member.entity';
import { Sac } from '../sacs/sac.entity';
import { Clock } from '../common/clock';
import type { FeatureSeeder } from './demo-seed';

/** The unhappy season's project, for specs and the tour. */
export const UNHAPPY_SEASON_TITLE = 'Pulchripes: second try with a backup male';

/** Days before "today" of each step (an invented scenario). */
// Pairing to sac: at least 120 days for this species (species-groups data); both sacs keep to it.
const DAYS = { started: 420, firstPairing: 400, firstSac: 250, sacEaten: 246, firstMaleDied: 200, backupPairing: 140, secondSac: 8 } as const;

/**
 * An unhappy season of Mira's (invented): her first sac is eaten by the mother, the first male dies
 * before a retry, a backup male is paired after him and a second sac is laid, left with the mother.
 * The project was never ended: it shows the second sac, both males and the whole story on its timeline.
 */
export const seedUnhappySeason: FeatureSeeder = async (ctx) => {
  const { em, users, today: now } = ctx;
  const mira = users.keeper;
  const today = todayIn(mira.timeZone, now);
  const on = (days: number) => addDays(today, -days);
  const evening = (days: number) => new Date(`${on(days)}T18:30:00Z`);
  const activity = new ActivityService(em, new Clock());
  const species = await em.findOneOrFail(Species, { scientificName: 'Grammostola pulchripes' });
  const animal = (label: string, sex: 'female' | 'male', extra: Partial<Animal>) =>
    em.create(Animal, { recordedBy: mira, ownerUser: mira, species, label, sex, maturity: 'mature', enclosure: null, ...extra });

  const female = animal('MO-041', 'female', { acquiredOn: on(900), notes: 'First season as a mother.' });
  const first = animal('MO-042', 'male', { maturedOn: on(460), status: 'deceased', statusOn: on(DAYS.firstMaleDied), notes: 'Died after a bad molt attempt.' });
  const backup = animal('MO-043', 'male', { maturedOn: on(220), acquiredOn: on(180), acquiredFrom: 'A club swap', notes: 'Bought as a backup male.' });

  const p = em.create(Project, {
    owner: mira,
    female,
    male: first,
    title: UNHAPPY_SEASON_TITLE,
    notes: 'Her first sac; the first male died before the retry.',
    createdAt: evening(DAYS.started),
  });
  em.create(ProjectMember, { project: p, user: mira, role: 'owner', name: mira.displayName, email: mira.email, createdAt: evening(DAYS.started) });
  const log = (days: number, kind: string, summary: string, subject: { type: string; id: string }, data: Record<string, unknown> = {}) =>
    activity.record(em, { projectId: p.id, actorId: mira.id, kind, subjectType: subject.type, subjectId: subject.id, summary, data, at: evening(days) });
  const pairing = (male: Animal, days: number, minutes: number, notes: string) => {
    const row = em.create(Pairing, {
      project: p,
      male,
      startedAt: evening(days),
      startedOn: on(days),
      durationMinutes: minutes,
      outcome: 'connected',
      notes,
      recordedBy: mira,
      createdAt: evening(days),
    });
    const data = { on: on(days), maleId: male.id, outcome: 'connected', durationMinutes: minutes };
    log(days, 'pairing.recorded', `Pairing on ${on(days)} with ${male.label} (${minutes} min): connected.`, { type: 'pairing', id: row.id }, data);
  };
  log(DAYS.started, 'project.created', `${mira.displayName} started the project "${p.title}" with MO-041 and MO-042.`, { type: 'project', id: p.id });

  pairing(first, DAYS.firstPairing, 35, 'Two insertions, he got away cleanly.');
  const eaten = em.create(Sac, {
    project: p,
    layDate: on(DAYS.firstSac),
    outcome: 'failed',
    failureReason: 'eaten',
    recordedBy: mira,
    notes: 'Left with her; she ate it four days later.',
    createdAt: evening(DAYS.firstSac),
  });
  log(DAYS.firstSac, 'sac.laid', `Sac laid on ${eaten.layDate}, left with the mother.`, { type: 'sac', id: eaten.id });
  log(DAYS.sacEaten, 'sac.failed', `Sac laid ${eaten.layDate} marked failed (eaten).`, { type: 'sac', id: eaten.id });
  log(DAYS.firstMaleDied, MALE_DEPARTURE_KINDS.died, maleDepartureSummary('died', first.label, on(DAYS.firstMaleDied), null), { type: 'animal', id: first.id });

  pairing(backup, DAYS.backupPairing, 25, 'Backup male; she accepted him at once.');
  const second = em.create(Sac, {
    project: p,
    layDate: on(DAYS.secondSac),
    recordedBy: mira,
    notes: 'Second sac, left with her for now.',
    createdAt: evening(DAYS.secondSac),
  });
  log(DAYS.secondSac, 'sac.laid', `Sac laid on ${second.layDate}, left with the mother.`, { type: 'sac', id: second.id });
};
