import { computeBalances, computeShares, type AccountBalances, type LedgerEntry, type ShareResult } from '@broodsilk/shared';
import type { Project } from '../projects/project.entity';
import type { ProjectMember } from '../projects/project-member.entity';
import type { TermsVersion } from '../projects/terms-version.entity';
import type { LedgerEntryRow, LedgerRowValues } from './ledger-entry.entity';
import type { SacCountFact } from './sac-counts';

type Ref = { id: string } | null | undefined;

/**
 * What the account's rules read of a ledger row. The entity has all of it; a read that only needs
 * balances and to-dos loads the same columns without hydrating entities (ledger-row-facts.ts).
 */
export type LedgerRowFacts = Pick<LedgerEntryRow, 'id' | 'createdAt' | 'kind' | 'date' | 'source'> &
  Omit<LedgerRowValues, 'note'> & { party?: Ref; fromParty?: Ref; toParty?: Ref; target?: Ref; recordedBy?: Ref };

/** Everything an account is worked out from, loaded in one place (account-loader.ts). */
export interface AccountData<R extends LedgerRowFacts = LedgerEntryRow> {
  project: Project;
  members: ProjectMember[];
  terms: TermsVersion | null;
  sacs: SacCountFact[];
  /** In ledger order. */
  rows: R[];
}

export interface SacShareState {
  fact: SacCountFact;
  /** Alive in care + handed over, sold or cashed out from this sac. */
  count: number;
  aliveInCare: number;
  withdrawn: number;
  /** Null while no terms are in force. */
  result: ShareResult | null;
}

export interface AccountView<R extends LedgerRowFacts = LedgerEntryRow> {
  data: AccountData<R>;
  owner: ProjectMember;
  memberOf: (memberId: string) => ProjectMember | undefined;
  nameOf: (memberId: string) => string;
  sacs: SacShareState[];
  totals: { partyId: string; count: number }[];
  /** The ledger as the shared rules read it (pending payments and confirmations left out). */
  entries: LedgerEntry[];
  /** Entries still waiting for the affected party's acceptance (see pendingEntries). */
  pending: Set<string>;
  balances: AccountBalances;
}

const NO_CURRENCY = 'XXX'; // ISO 4217 "no currency", while no terms are in force

export const memberName = (m: ProjectMember): string => m.user?.displayName ?? m.name;

const WITHDRAWALS = new Set(['hand-over', 'sale', 'cash-out']);

/**
 * The party who must accept an entry before it counts, or null when it counts at once: the payee
 * of a payment (unless it came through the payment provider), and the party whose young are
 * cashed out or sold below the price in the terms in force (the owner alone cannot waive a claim).
 */
export function acceptorOf(r: LedgerRowFacts, price: number, memberOf: (id: string) => ProjectMember | undefined): ProjectMember | null {
  if (r.kind === 'money') return r.source === 'payment-provider' ? null : memberOf(r.toParty!.id)!;
  if (r.kind === 'cash-out' && (r.pricePerSpiderlingMinor ?? price) < price) return memberOf(r.party!.id)!;
  if (r.kind === 'sale' && r.priceMinor! < r.count! * price) return memberOf(r.party!.id)!;
  return null;
}

/**
 * Entries that do not count yet: the acceptor has not recorded or confirmed them. For an acceptor
 * without an account, the owner's record stands in for theirs.
 */
export function pendingEntries(data: AccountData<LedgerRowFacts>, owner: ProjectMember): Set<string> {
  const members = new Map(data.members.map((m) => [m.id, m]));
  const confirmed = new Set(data.rows.filter((r) => r.kind === 'confirmation' && r.target).map((r) => r.target!.id));
  const price = data.terms?.pricePerSpiderlingMinor ?? 0;
  const pending = new Set<string>();
  for (const r of data.rows) {
    const acceptor = acceptorOf(r, price, (id) => members.get(id));
    if (!acceptor || confirmed.has(r.id)) continue;
    const recorder = r.recordedBy?.id ?? null;
    if (acceptor.user ? recorder === acceptor.user.id : recorder === owner.user?.id) continue;
    pending.add(r.id);
  }
  return pending;
}

function toLedgerEntry(r: LedgerRowFacts): LedgerEntry | null {
  const base = { id: r.id, date: r.date };
  switch (r.kind) {
    case 'hand-over':
      return {
        ...base,
        kind: 'hand-over',
        partyId: r.party!.id,
        count: r.count!,
        method: r.method!,
        ...(r.carrier ? { carrier: r.carrier } : {}),
        ...(r.tracking ? { tracking: r.tracking } : {}),
      };
    case 'arrival':
      return { ...base, kind: 'arrival', handOverId: r.target!.id, arrivedAlive: r.arrivedAlive!, arrivedDead: r.arrivedDead! };
    case 'sale':
      return { ...base, kind: 'sale', partyId: r.party!.id, count: r.count!, priceMinor: r.priceMinor!, currency: r.currency! };
    case 'cash-out':
      return {
        ...base,
        kind: 'cash-out',
        partyId: r.party!.id,
        count: r.count!,
        ...(r.pricePerSpiderlingMinor != null ? { pricePerSpiderlingMinor: r.pricePerSpiderlingMinor } : {}),
      };
    case 'money':
      return { ...base, kind: 'money', fromPartyId: r.fromParty!.id, toPartyId: r.toParty!.id, amountMinor: r.amountMinor!, currency: r.currency! };
    case 'correction':
      return { ...base, kind: 'correction', reversesId: r.target!.id, reason: r.reason ?? '' };
    default:
      return null; // confirmations only make a payment count
  }
}

/**
 * Works out shares per sac and the balances. The sac counts need to know which withdrawals are in
 * force, and that depends only on the corrections, so a first pass with zero shares finds them.
 */
export function buildAccountView<R extends LedgerRowFacts>(data: AccountData<R>): AccountView<R> {
  const owner = data.members.find((m) => m.role === 'owner');
  if (!owner) throw new Error(`Project ${data.project.id} has no owner member.`);
  const members = new Map(data.members.map((m) => [m.id, m]));
  const memberOf = (id: string) => members.get(id);
  const nameOf = (id: string) => (members.has(id) ? memberName(members.get(id)!) : 'an unknown party');
  const pending = pendingEntries(data, owner);
  const excluded = new Set(pending);
  for (const r of data.rows) if (r.kind === 'correction' && r.target && excluded.has(r.target.id)) excluded.add(r.id);
  const entries = data.rows
    .filter((r) => !excluded.has(r.id))
    .map(toLedgerEntry)
    .filter((e): e is LedgerEntry => e !== null);

  const price = data.terms?.pricePerSpiderlingMinor ?? 0;
  const currency = data.terms?.currency ?? NO_CURRENCY;
  const lines = [...(data.terms?.lines.getItems() ?? [])].sort((a, b) => a.pickOrder - b.pickOrder); // parties in pick order, whatever order the rows came in
  const parties = lines.length ? lines.map((l) => l.member.id) : data.members.filter((m) => m.role !== 'caretaker').map((m) => m.id);
  const firstPass = computeBalances(
    parties.map((partyId) => ({ partyId, count: 0 })),
    entries,
    price,
    currency,
    owner.id,
  );
  const inForce = new Set(firstPass.inForce);

  const sacs = data.sacs.map((fact): SacShareState => {
    let before = 0;
    let after = 0;
    for (const r of data.rows) {
      if (!WITHDRAWALS.has(r.kind) || r.sacId !== fact.sacId || !inForce.has(r.id)) continue;
      if (fact.countedAt && r.createdAt <= fact.countedAt) before += r.count!;
      else after += r.count!;
    }
    const count = fact.aliveAtCount + before;
    const result = lines.length
      ? computeShares(
          count,
          lines.map((l) => ({ partyId: l.member.id, weight: l.weight, pickOrder: l.pickOrder, ...(l.fixedCount ? { fixedCount: l.fixedCount } : {}) })),
        )
      : null;
    return { fact, count, aliveInCare: Math.max(0, fact.aliveAtCount - after), withdrawn: before + after, result };
  });
  const totals = parties.map((partyId) => ({
    partyId,
    count: sacs.reduce((sum, s) => sum + (s.result?.parties.find((p) => p.partyId === partyId)?.count ?? 0), 0),
  }));
  const balances = computeBalances(totals, entries, price, currency, owner.id);
  return { data, owner, memberOf, nameOf, sacs, totals, entries, pending, balances };
}

/** Hand-overs in force whose recipient has not yet confirmed the arrival: young on their way, not yet settled. */
export function handOversAwaitingArrival(view: AccountView<LedgerRowFacts>): Set<string> {
  const inForce = new Set(view.balances.inForce);
  const arrived = new Set(view.data.rows.filter((r) => r.kind === 'arrival' && inForce.has(r.id)).map((r) => r.target!.id));
  return new Set(view.data.rows.filter((r) => r.kind === 'hand-over' && inForce.has(r.id) && !arrived.has(r.id)).map((r) => r.id));
}
