import { addDays, todayIn } from '@broodsilk/shared';
import { Animal } from '../animals/animal.entity';
import { Project } from '../projects/project.entity';
import { ProjectMember } from '../projects/project-member.entity';
import { Pairing } from '../projects/pairing.entity';
import { TermsVersion } from '../projects/terms-version.entity';
import { TermsLine } from '../projects/terms-line.entity';
import { TermsAcceptance } from '../projects/terms-acceptance.entity';
import { Sac } from '../sacs/sac.entity';
import { SacOpening } from '../sacs/sac-opening.entity';
import { BroodCount } from '../sacs/brood-count.entity';
import { ActivityService } from '../activity/activity.service';
import { Clock } from '../common/clock';
import type { FeatureSeeder } from './demo-seed';

export const MOTHER_KEPT_TITLE = 'Pulchripes brood kept by the mother';

const eveningOf = (date: string) => new Date(`${date}T18:00:00Z`);

/**
 * An invented season: Mira paired her G. pulchripes female with her own male, shares the brood
 * with Tomasz (Mira 2, Tomasz 1), and chose to leave the sac with the mother. The young left the
 * sac on day 64; she counted them at emergence (138 young at 1st instar, 5 dark eggs, 2 spoiled), and the
 * shares follow from that count as from any opened sac.
 */
export const seedMotherKeptBrood: FeatureSeeder = async (ctx) => {
  const { em, users } = ctx;
  const mira = users.keeper;
  const tomasz = users.partner;
  const today = todayIn(mira.timeZone, ctx.today);
  const laid = addDays(today, -80);
  const emerged = addDays(laid, 64);
  const female = await em.findOneOrFail(Animal, { recordedBy: mira, label: 'MO-005' });
  const male = await em.findOneOrFail(Animal, { recordedBy: mira, label: 'MO-018' });
  // G. pulchripes lays some 120 days or more after a pairing (species data): paired 130 days before the sac.
  const started = eveningOf(addDays(laid, -135));
  const project = em.create(Project, {
    owner: mira,
    female,
    male,
    title: MOTHER_KEPT_TITLE,
    notes: 'She guards her sacs well, so this one stays with her.',
    createdAt: started,
  });
  const miraMember = em.create(ProjectMember, { project, user: mira, role: 'owner', name: mira.displayName, email: mira.email, createdAt: started });
  const tomaszMember = em.create(ProjectMember, { project, user: tomasz, role: 'partner', name: tomasz.displayName, email: tomasz.email, createdAt: started });
  const terms = em.create(TermsVersion, {
    project,
    number: 1,
    createdBy: mira,
    pricePerSpiderlingMinor: 800,
    currency: 'EUR',
    failureClause: 'nothing-owed',
    handOverStage: 'second-instar',
    shippingPaidBy: 'recipient',
    createdAt: started,
  });
  em.create(TermsLine, { version: terms, member: miraMember, weight: 2, fixedCount: 0, pickOrder: 1, createdAt: started });
  em.create(TermsLine, { version: terms, member: tomaszMember, weight: 1, fixedCount: 0, pickOrder: 2, createdAt: started });
  em.create(TermsAcceptance, { version: terms, member: miraMember, recordedBy: mira, createdAt: started });
  em.create(TermsAcceptance, { version: terms, member: tomaszMember, recordedBy: tomasz, createdAt: started });
  const pairedOn = addDays(laid, -130);
  em.create(Pairing, { project, male, startedAt: eveningOf(pairedOn), startedOn: pairedOn, durationMinutes: 25, outcome: 'connected', recordedBy: mira });
  const sac = em.create(Sac, {
    project,
    layDate: laid,
    leftWithMother: true,
    outcome: 'emerged',
    broodStage: 'first-instar',
    notes: 'Left with the mother on purpose.',
    recordedBy: mira,
    createdAt: eveningOf(laid),
  });
  const at = eveningOf(emerged);
  em.create(SacOpening, {
    sac,
    openedAt: at,
    healthyEggs: 0,
    eggsWithLegs: 0,
    nymphs: 138,
    darkEggs: 5,
    spoiledEggs: 2,
    keptBack: 0,
    recordedBy: mira,
    createdAt: at,
  });
  em.create(BroodCount, { sac, at, stage: 'first-instar', alive: 138, source: 'opening', recordedBy: mira, createdAt: at });
  const activity = new ActivityService(em, new Clock());
  const event = (when: Date, kind: string, summary: string) =>
    activity.record(em, { projectId: project.id, actorId: mira.id, kind, subjectType: 'sac', subjectId: sac.id, summary, at: when });
  event(eveningOf(laid), 'sac.laid', `Sac laid on ${laid}, left with the mother on purpose.`);
  event(at, 'sac.opened', `Young emerged and counted on ${emerged}: 138 young at 1st instar, 5 dark and 2 spoiled eggs.`);
  await em.flush();
};
