import { Logger } from '@nestjs/common';
import { addDays, computeShares, todayIn } from '@broodsilk/shared';
import type { EntityManager } from '@mikro-orm/postgresql';
import { ActivityService } from '../activity/activity.service';
import { Project } from '../projects/project.entity';
import { ProjectMember } from '../projects/project-member.entity';
import { TermsVersion } from '../projects/terms-version.entity';
import { TermsLine } from '../projects/terms-line.entity';
import { TermsAcceptance } from '../projects/terms-acceptance.entity';
import { Sac } from '../sacs/sac.entity';
import { BroodCount } from '../sacs/brood-count.entity';
import type { User } from '../users/user.entity';
import { LedgerEntryRow } from '../accounts/ledger-entry.entity';
import { sacCountsOf } from '../accounts/sac-counts';
import { findDemoProject } from './projects.seeder';
import type { FeatureSeeder } from './demo-seed';
import { Clock } from '../common/clock';

/**
 * The demo's partner accounts (an invented scenario). On "Versicolor shared brood" a third party,
 * Dara Quill (an outside party, no account), joins the terms in version 2: Mira 2, Tomasz 1,
 * Dara 1. A shipment to Tomasz waits for his confirmation, Dara cashed out 3 young (Mira owes her),
 * and Mira paid the courier for Tomasz's parcel (shipping is the recipient's), so Tomasz owes
 * her that fee and can pay it through the payment fake once Mira links a payout account.
 * An older project of the same pair, "Versicolor first brood", is fully settled.
 */
const eveningOf = (date: string) => new Date(`${date}T18:00:00Z`);

async function nextSeq(em: EntityManager): Promise<number> {
  const [{ n }] = await em.execute<{ n: number }[]>(`select nextval('ledger_entry_seq')::int as n`);
  return Number(n);
}

type Row = Omit<Partial<LedgerEntryRow>, 'kind' | 'date'> & { kind: LedgerEntryRow['kind']; date: string };

export const seedAccounts: FeatureSeeder = async (ctx) => {
  const { em, users } = ctx;
  const mira = users.keeper;
  const tomasz = users.partner;
  const today = todayIn(mira.timeZone, ctx.today);
  const activity = new ActivityService(em, new Clock());
  const append = async (project: Project, r: Row, by: User, summary: string): Promise<LedgerEntryRow> => {
    const at = eveningOf(r.date);
    const row = em.create(LedgerEntryRow, { ...r, project, seq: await nextSeq(em), recordedBy: by, createdAt: at });
    activity.record(em, {
      projectId: project.id,
      actorId: by.id,
      kind: `account.${r.kind}`,
      subjectType: 'ledger-entry',
      subjectId: row.id,
      summary,
      // The same data the entries service writes, so partner updates read the count from it.
      data: { kind: r.kind, count: r.count ?? null, amountMinor: r.amountMinor ?? null },
      at,
      audience: 'partners',
    });
    // One row per flush: rows pointing at each other in one flush would be inserted, then updated, and the ledger refuses updates.
    await em.flush();
    return row;
  };

  // --- the shared brood: three parties, money owed both ways ---
  const brood = await findDemoProject(em, ctx, 'versicolorBrood');
  const members = await em.find(ProjectMember, { project: brood });
  const miraM = members.find((m) => m.role === 'owner')!;
  const tomaszM = members.find((m) => m.user?.id === tomasz.id)!;
  const joined = eveningOf(addDays(today, -20));
  const dara = em.create(ProjectMember, {
    project: brood,
    user: null,
    role: 'partner',
    name: 'Dara Quill',
    email: 'dara.quill@example.test',
    createdAt: joined,
  });
  activity.record(em, {
    projectId: brood.id,
    actorId: mira.id,
    kind: 'member.added',
    subjectType: 'member',
    subjectId: dara.id,
    summary: 'Added Dara Quill as partner.',
    at: joined,
  });
  const v2 = em.create(TermsVersion, {
    project: brood,
    number: 2,
    createdBy: mira,
    pricePerSpiderlingMinor: 1800,
    currency: 'EUR',
    failureClause: 'carries-over',
    handOverStage: 'second-instar',
    shippingPaidBy: 'recipient',
    note: 'Dara paid half of the female; she takes a share like Tomasz.',
    createdAt: joined,
  });
  const lines = [
    [miraM, 2, 1],
    [tomaszM, 1, 2],
    [dara, 1, 3],
  ] as const;
  for (const [member, weight, pickOrder] of lines) em.create(TermsLine, { version: v2, member, weight, fixedCount: 0, pickOrder, createdAt: joined });
  const accepted = eveningOf(addDays(today, -19));
  em.create(TermsAcceptance, { version: v2, member: miraM, recordedBy: mira, note: 'Proposed these terms.', createdAt: joined });
  em.create(TermsAcceptance, { version: v2, member: tomaszM, recordedBy: tomasz, createdAt: accepted });
  em.create(TermsAcceptance, { version: v2, member: dara, recordedBy: mira, onBehalf: true, note: 'Agreed by e-mail.', createdAt: accepted });
  activity.record(em, {
    projectId: brood.id,
    actorId: tomasz.id,
    kind: 'terms.in-force',
    subjectType: 'terms-version',
    subjectId: v2.id,
    summary: 'Terms version 2 is now in force.',
    at: accepted,
    audience: 'partners',
    data: { number: 2 },
  });
  await em.flush();

  const counted = (await sacCountsOf(em, brood.id)).filter((s) => s.aliveAtCount > 0).at(-1);
  if (!counted) {
    new Logger('Seed').warn('Accounts demo: "Versicolor shared brood" has no counted sac yet (the sacs seeder adds it); no entries seeded there.');
  } else {
    const shares = computeShares(
      counted.aliveAtCount,
      lines.map(([m, weight, pickOrder]) => ({ partyId: m.id, weight, pickOrder })),
    );
    const share = (m: ProjectMember) => shares.parties.find((p) => p.partyId === m.id)!.count;
    const handOver = Math.min(6, share(tomaszM));
    const cashOut = Math.min(3, share(dara));
    const d1 = addDays(today, -3);
    const d2 = addDays(today, -2);
    if (handOver > 0) {
      await append(
        brood,
        {
          kind: 'hand-over',
          date: d1,
          sacId: counted.sacId,
          party: tomaszM,
          count: handOver,
          method: 'shipment',
          // Berlin to Chicago: an international live-animal shipment through a shipping agent who files the
          // US wildlife import declaration (docs/trade-facts.md §9), not a plain parcel; C. versicolor is not CITES-listed.
          carrier: 'Live-animal shipping agent (air freight); US wildlife import declaration filed by the agent',
          tracking: 'BRS-DEMO-0412',
        },
        mira,
        `${handOver} young handed over to ${tomaszM.name} (sent through a live-animal shipping agent by air freight, US wildlife import declaration filed, tracking BRS-DEMO-0412).`,
      );
      await append(
        brood,
        {
          kind: 'money',
          date: d1,
          fromParty: miraM,
          toParty: tomaszM,
          amountMinor: 1450,
          currency: 'EUR',
          note: 'Courier to the shipping agent for Tomasz’s young, paid by Mira; the agent bills air freight and the import declaration to Tomasz directly. The terms say the recipient pays shipping.',
        },
        tomasz,
        `${miraM.name} paid ${tomaszM.name} EUR 14.50.`,
      );
    }
    if (cashOut > 0) {
      await append(brood, { kind: 'cash-out', date: d2, sacId: counted.sacId, party: dara, count: cashOut }, mira, `Dara Quill cashed out ${cashOut} young.`);
    }
  }

  // --- an older brood of the same pair, fully settled ---
  const laid = addDays(today, -400);
  const old = em.create(Project, {
    owner: mira,
    female: brood.female,
    male: brood.male,
    title: 'Versicolor first brood',
    notes: 'Last year’s brood; everything handed over.',
    createdAt: eveningOf(addDays(laid, -40)),
  });
  const oldMira = em.create(ProjectMember, { project: old, user: mira, role: 'owner', name: mira.displayName, email: mira.email, createdAt: old.createdAt });
  const oldTomasz = em.create(ProjectMember, {
    project: old,
    user: tomasz,
    role: 'partner',
    name: tomasz.displayName,
    email: tomasz.email,
    createdAt: old.createdAt,
  });
  const v1 = em.create(TermsVersion, {
    project: old,
    number: 1,
    createdBy: mira,
    pricePerSpiderlingMinor: 1500,
    currency: 'EUR',
    failureClause: 'nothing-owed',
    handOverStage: 'second-instar',
    shippingPaidBy: 'split',
    createdAt: old.createdAt,
  });
  em.create(TermsLine, { version: v1, member: oldMira, weight: 1, fixedCount: 0, pickOrder: 1, createdAt: old.createdAt });
  em.create(TermsLine, { version: v1, member: oldTomasz, weight: 1, fixedCount: 0, pickOrder: 2, createdAt: old.createdAt });
  em.create(TermsAcceptance, { version: v1, member: oldMira, recordedBy: mira, createdAt: old.createdAt });
  em.create(TermsAcceptance, { version: v1, member: oldTomasz, recordedBy: tomasz, createdAt: old.createdAt });
  const sac = em.create(Sac, {
    project: old,
    layDate: laid,
    pulledAt: eveningOf(addDays(laid, 28)),
    pulledOn: addDays(laid, 28),
    outcome: 'emerged',
    broodStage: 'second-instar',
    recordedBy: mira,
    createdAt: eveningOf(laid),
  });
  em.create(BroodCount, {
    sac,
    at: eveningOf(addDays(laid, 80)),
    stage: 'second-instar',
    alive: 24,
    source: 'count',
    recordedBy: mira,
    createdAt: eveningOf(addDays(laid, 80)),
  });
  await em.flush();
  const given = await append(
    old,
    { kind: 'hand-over', date: addDays(laid, 90), sacId: sac.id, party: oldTomasz, count: 12, method: 'pick-up' },
    mira,
    `12 young handed over to ${oldTomasz.name} (picked up).`,
  );
  await append(
    old,
    { kind: 'arrival', date: addDays(laid, 90), target: given, party: oldTomasz, arrivedAlive: 12, arrivedDead: 0 },
    tomasz,
    `${oldTomasz.name} confirmed the hand-over: 12 arrived alive, 0 dead.`,
  );
};
