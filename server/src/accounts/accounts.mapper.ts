import type { LedgerEntryResponse, LedgerProblem, PartyRef } from '@broodsilk/shared';
import type { ProjectMember } from '../projects/project-member.entity';
import type { LedgerEntryRow } from './ledger-entry.entity';
import { acceptorOf, memberName, type AccountView } from './account-view';

/** Young out of the owner's brood, counted against a party's share: from the owner, to that party. */
export const FROM_OWNER = new Set(['hand-over', 'arrival', 'sale', 'cash-out']);

const ref = (m: ProjectMember | null | undefined): PartyRef | null => (m ? { memberId: m.id, name: memberName(m) } : null);

/** The ledger as the account page and statements show it, with each entry's status. */
export function toEntryResponses(view: AccountView): LedgerEntryResponse[] {
  const inForce = new Set(view.balances.inForce);
  const problems = new Map(view.balances.problems.map(({ entryId, ...said }) => [entryId, said]));
  const reversedTargets = new Set(view.data.rows.filter((r) => r.kind === 'correction' && r.target && inForce.has(r.id)).map((r) => r.target!.id));
  const arrivedFor = new Set(view.data.rows.filter((r) => r.kind === 'arrival' && inForce.has(r.id)).map((r) => r.target!.id));
  return view.data.rows.map((r, i) => toEntryResponse(r, i + 1, view, { inForce, problems, reversedTargets, arrivedFor }));
}

interface Lookups {
  inForce: Set<string>;
  problems: Map<string, Omit<LedgerProblem, 'entryId'>>;
  reversedTargets: Set<string>;
  arrivedFor: Set<string>;
}

function toEntryResponse(r: LedgerEntryRow, seq: number, view: AccountView, l: Lookups): LedgerEntryResponse {
  let status: LedgerEntryResponse['status'];
  if (r.kind === 'confirmation') status = 'in-force';
  else if (view.pending.has(r.id)) status = l.reversedTargets.has(r.id) ? 'reversed' : 'awaiting-confirmation';
  else if (l.inForce.has(r.id)) status = 'in-force';
  else status = l.problems.has(r.id) ? 'left-out' : 'reversed';
  let awaiting: PartyRef | null = null;
  if (r.kind === 'hand-over' && status === 'in-force' && !l.arrivedFor.has(r.id)) awaiting = ref(r.party);
  if (status === 'awaiting-confirmation') awaiting = ref(acceptorOf(r, view.data.terms?.pricePerSpiderlingMinor ?? 0, view.memberOf));
  return {
    id: r.id,
    seq,
    kind: r.kind,
    date: r.date,
    sacId: r.sacId ?? null,
    party: ref(r.party),
    from: ref(r.fromParty) ?? (FROM_OWNER.has(r.kind) ? ref(view.owner) : null),
    to: ref(r.toParty) ?? (FROM_OWNER.has(r.kind) ? ref(r.party) : null),
    count: r.count ?? null,
    method: r.method ?? null,
    carrier: r.carrier ?? null,
    tracking: r.tracking ?? null,
    priceMinor: r.priceMinor ?? null,
    pricePerSpiderlingMinor: r.pricePerSpiderlingMinor ?? null,
    amountMinor: r.amountMinor ?? null,
    currency: r.currency ?? null,
    handOverId: r.kind === 'arrival' ? r.target!.id : null,
    arrivedAlive: r.arrivedAlive ?? null,
    arrivedDead: r.arrivedDead ?? null,
    reversesId: r.kind === 'correction' ? r.target!.id : null,
    confirmsId: r.kind === 'confirmation' ? r.target!.id : null,
    reason: r.reason ?? null,
    note: r.note ?? null,
    source: r.source,
    recordedBy: r.recordedBy ? { id: r.recordedBy.id, name: r.recordedBy.displayName } : null,
    recordedAt: r.createdAt.toISOString(),
    status,
    problem: l.problems.get(r.id) ?? null,
    awaitingConfirmationBy: awaiting,
  };
}
