import { addDays, label, todayIn, serverWordsFor, type EndedEarlyReason, type PairingOutcome, type ProjectRole } from '@broodsilk/shared';
import type { EntityManager } from '@mikro-orm/postgresql';
import { Animal } from '../animals/animal.entity';
import { User } from '../users/user.entity';
import { ActivityService } from '../activity/activity.service';
import { Project } from '../projects/project.entity';
import { ProjectMember } from '../projects/project-member.entity';
import { Pairing } from '../projects/pairing.entity';
import { TermsVersion } from '../projects/terms-version.entity';
import { TermsLine } from '../projects/terms-line.entity';
import { TermsAcceptance } from '../projects/terms-acceptance.entity';
import type { FeatureSeeder, SeedContext } from './demo-seed';
import { Clock } from '../common/clock';

/**
 * The demo's breeding projects (an invented scenario), keyed so later seeders find them:
 * `metallica` planned, `regalisLoan` waiting for a sac with a proposed terms change,
 * `vagansMolted` ended early. `vagansSac`, `hamoriiIncubator` and `versicolorBrood` are paired and
 * waiting: the sacs seeder lays their sacs (sac laid / in incubator / brood) on top.
 */
export const DEMO_PROJECTS = {
  metallica: 'Metallica: wait until she hardens',
  regalisLoan: 'Regalis breeding loan with Tomasz',
  vagansMolted: 'Vagans spring attempt',
  vagansSac: 'Vagans autumn pairing',
  hamoriiIncubator: 'Hamorii last chance',
  versicolorBrood: 'Versicolor shared brood',
} as const;
export type DemoProjectKey = keyof typeof DEMO_PROJECTS;

/** A demo project of Mira's by key (for the sacs and accounts seeders). */
export function findDemoProject(em: EntityManager, ctx: SeedContext, key: DemoProjectKey): Promise<Project> {
  return em.findOneOrFail(Project, { owner: ctx.users.keeper, title: DEMO_PROJECTS[key] }, { populate: ['female', 'male'] });
}

interface TermsSpec {
  /** Weight, fixed count, pick order per party key. */
  lines: Partial<Record<'mira' | 'tomasz' | 'outside', [number, number, number]>>;
  priceMinor: number;
  clause: 'nothing-owed' | 'carries-over';
  daysAgo: number;
  /** Parties (other than Mira) who accepted; an outside party's acceptance is recorded by Mira. */
  acceptedBy: ('tomasz' | 'outside')[];
  note?: string;
}

interface ProjectSpec {
  key: DemoProjectKey;
  female: string;
  male: string;
  daysAgo: number;
  notes?: string;
  tomasz?: ProjectRole;
  ines?: boolean;
  outside?: { name: string; email: string };
  pairings?: [number, number, PairingOutcome, string?][];
  ended?: { reason: EndedEarlyReason; daysAgo: number; note: string };
  terms?: TermsSpec[];
}

const PROJECTS: ProjectSpec[] = [
  {
    key: 'metallica',
    female: 'MO-008',
    male: 'MO-016',
    daysAgo: 5,
    ines: true,
    notes: 'She molted twelve days ago; pair once her fangs are dark and she takes food again. His clock is running.',
  },
  {
    key: 'regalisLoan',
    female: 'MO-007',
    male: 'MO-030',
    daysAgo: 16,
    tomasz: 'partner',
    ines: true,
    notes: "Tomasz's male on a breeding loan; he goes back after the pairings.",
    pairings: [
      [10, 15, 'female-refused', 'She threat-posed; male removed.'],
      [6, 45, 'connected', 'Two insertions seen, male left calmly.'],
    ],
    terms: [
      { lines: { mira: [2, 0, 1], tomasz: [1, 0, 2] }, priceMinor: 2500, clause: 'carries-over', daysAgo: 15, acceptedBy: ['tomasz'] },
      {
        lines: { mira: [2, 0, 2], tomasz: [1, 5, 1] },
        priceMinor: 2500,
        clause: 'carries-over',
        daysAgo: 2,
        acceptedBy: [],
        note: 'Tomasz picks first and gets 5 off the top for the loan.',
      },
    ],
  },
  {
    key: 'vagansMolted',
    female: 'MO-002',
    male: 'MO-015',
    daysAgo: 100,
    ines: true,
    pairings: [[80, 30, 'connected']],
    ended: { reason: 'female-molted', daysAgo: 28, note: 'She molted 30 days ago, before any sac; the pairing is lost.' },
  },
  {
    key: 'vagansSac',
    female: 'MO-001',
    male: 'MO-015',
    daysAgo: 90,
    ines: true,
    pairings: [[75, 40, 'connected']],
  },
  {
    key: 'hamoriiIncubator',
    female: 'MO-004',
    male: 'MO-026',
    daysAgo: 170,
    outside: { name: 'Jonas Feld', email: 'jonas.feld@example.test' },
    pairings: [[150, 35, 'connected', 'His last good pairing before he died.']],
    terms: [{ lines: { mira: [3, 0, 1], outside: [1, 0, 2] }, priceMinor: 4000, clause: 'nothing-owed', daysAgo: 160, acceptedBy: ['outside'] }],
  },
  {
    key: 'versicolorBrood',
    female: 'MO-006',
    male: 'MO-028',
    daysAgo: 140,
    tomasz: 'partner',
    ines: true,
    pairings: [[130, 25, 'connected']],
    terms: [{ lines: { mira: [2, 0, 1], tomasz: [1, 0, 2] }, priceMinor: 1800, clause: 'carries-over', daysAgo: 135, acceptedBy: ['tomasz'] }],
  },
];

/** A moment on a calendar day of the scenario (evening in Europe). */
const eveningOf = (date: string) => new Date(`${date}T18:00:00Z`);

export const seedProjects: FeatureSeeder = async (ctx) => {
  const { em, users, today: now } = ctx;
  const mira = users.keeper;
  const tomasz = users.partner;
  const ines = users.caretaker;
  const today = todayIn(mira.timeZone, now);
  const activity = new ActivityService(em, new Clock());
  const animals = new Map((await em.find(Animal, { recordedBy: mira })).map((a) => [a.label, a]));

  for (const s of PROJECTS) {
    const start = eveningOf(addDays(today, -s.daysAgo));
    const female = animals.get(s.female)!;
    const male = animals.get(s.male)!;
    const p = em.create(Project, { owner: mira, female, male, title: DEMO_PROJECTS[s.key], notes: s.notes ?? null, createdAt: start });
    const log = (
      actor: User | null,
      at: Date,
      kind: string,
      summary: string,
      extra: { subjectType?: string; subjectId?: string; audience?: 'members' | 'partners'; data?: Record<string, unknown> } = {},
    ) =>
      activity.record(em, {
        projectId: p.id,
        actorId: actor?.id ?? null,
        kind,
        subjectType: extra.subjectType ?? 'project',
        subjectId: extra.subjectId ?? p.id,
        summary,
        at,
        data: extra.data ?? {},
        audience: extra.audience,
      });
    log(mira, start, 'project.created', `${mira.displayName} started the project "${p.title}" with ${female.label} and ${male.label}.`);

    const members: Record<string, ProjectMember> = {
      mira: em.create(ProjectMember, { project: p, user: mira, role: 'owner', name: mira.displayName, email: mira.email, createdAt: start }),
    };
    if (s.tomasz) {
      members.tomasz = em.create(ProjectMember, { project: p, user: tomasz, role: s.tomasz, name: tomasz.displayName, email: tomasz.email, createdAt: start });
      log(tomasz, start, 'member.joined', `${tomasz.displayName} joined as ${s.tomasz}.`, { subjectType: 'member', subjectId: members.tomasz.id });
    }
    if (s.ines) {
      members.ines = em.create(ProjectMember, { project: p, user: ines, role: 'caretaker', name: ines.displayName, email: ines.email, createdAt: start });
      log(ines, start, 'member.joined', `${ines.displayName} joined as caretaker.`, { subjectType: 'member', subjectId: members.ines.id });
    }
    if (s.outside) {
      members.outside = em.create(ProjectMember, { project: p, user: null, role: 'partner', name: s.outside.name, email: s.outside.email, createdAt: start });
      log(mira, start, 'member.added', `Added ${s.outside.name} as partner.`, { subjectType: 'member', subjectId: members.outside.id });
    }

    for (const [daysAgo, minutes, outcome, notes] of s.pairings ?? []) {
      const startedOn = addDays(today, -daysAgo);
      const pairing = em.create(Pairing, {
        project: p,
        male: p.male,
        startedAt: eveningOf(startedOn),
        startedOn,
        durationMinutes: minutes,
        outcome,
        notes: notes ?? null,
        recordedBy: mira,
        createdAt: eveningOf(startedOn),
      });
      log(
        mira,
        eveningOf(startedOn),
        'pairing.recorded',
        serverWordsFor('en')('text.pairingOn', { date: startedOn, minutes, outcome: label(serverWordsFor('en'), 'pairingOutcome', outcome) }),
        {
          subjectType: 'pairing',
          subjectId: pairing.id,
          data: { on: startedOn, outcome, durationMinutes: minutes },
        },
      );
    }

    for (const [i, t] of (s.terms ?? []).entries()) {
      const at = eveningOf(addDays(today, -t.daysAgo));
      const v = em.create(TermsVersion, {
        project: p,
        number: i + 1,
        createdBy: mira,
        pricePerSpiderlingMinor: t.priceMinor,
        currency: 'EUR',
        failureClause: t.clause,
        handOverStage: 'second-instar',
        shippingPaidBy: 'recipient',
        note: t.note ?? null,
        createdAt: at,
      });
      for (const [party, [weight, fixedCount, pickOrder]] of Object.entries(t.lines) as [string, [number, number, number]][]) {
        em.create(TermsLine, { version: v, member: members[party], weight, fixedCount, pickOrder, createdAt: at });
      }
      em.create(TermsAcceptance, { version: v, member: members.mira, recordedBy: mira, note: 'Proposed these terms.', createdAt: at });
      log(mira, at, 'terms.proposed', `Proposed terms version ${v.number}.`, {
        subjectType: 'terms-version',
        subjectId: v.id,
        audience: 'partners',
        data: { number: v.number },
      });
      const later = new Date(at.getTime() + 86_400_000);
      for (const party of t.acceptedBy) {
        const onBehalf = party === 'outside';
        em.create(TermsAcceptance, {
          version: v,
          member: members[party],
          recordedBy: onBehalf ? mira : tomasz,
          onBehalf,
          note: onBehalf ? 'Agreed by e-mail.' : null,
          createdAt: later,
        });
        const who = members[party].name;
        log(
          onBehalf ? mira : tomasz,
          later,
          'terms.accepted',
          onBehalf ? `Recorded that ${who} accepted terms version ${v.number} (on their behalf).` : `${who} accepted terms version ${v.number}.`,
          { subjectType: 'terms-version', subjectId: v.id, audience: 'partners', data: { number: v.number } },
        );
      }
      if (t.acceptedBy.length)
        log(onBehalfActor(t, mira, tomasz), later, 'terms.in-force', `Terms version ${v.number} is now in force.`, {
          subjectType: 'terms-version',
          subjectId: v.id,
          audience: 'partners',
          data: { number: v.number },
        });
    }

    if (s.ended) {
      const on = addDays(today, -s.ended.daysAgo);
      p.endedEarlyReason = s.ended.reason;
      p.endedEarlyNote = s.ended.note;
      p.endedOn = on;
      log(
        mira,
        eveningOf(on),
        'project.ended',
        serverWordsFor('en')('text.endedEarly', { reason: label(serverWordsFor('en'), 'endedEarly', s.ended.reason) }),
        {
          data: { reason: s.ended.reason },
        },
      );
    }
  }
};

function onBehalfActor(t: TermsSpec, mira: User, tomasz: User): User {
  return t.acceptedBy.includes('tomasz') ? tomasz : mira;
}
