import type { BalancesResponse } from '@broodsilk/shared';
import { handOversAwaitingArrival, type AccountView, type LedgerRowFacts } from './account-view';

/**
 * Nothing owed: a counted sac under terms in force, every other party has had its share (the
 * owner keeps what is left in care), no money is owed, and no payment or hand-over waits for the
 * recipient's confirmation (young on their way are not settled until they have arrived). Shares
 * from an estimated count are provisional, so they are never settled until an exact count.
 */
/** Shares resting on an estimated count (of a sac with young) are provisional. */
export const isProvisional = (view: AccountView<LedgerRowFacts>): boolean => view.sacs.some((s) => s.fact.estimated && s.count > 0);

export function isSettled(view: AccountView<LedgerRowFacts>): boolean {
  if (!view.data.terms || !view.sacs.some((s) => s.count > 0)) return false;
  if (isProvisional(view)) return false;
  const others = view.balances.parties.filter((p) => p.partyId !== view.owner.id);
  return (
    others.every((p) => p.owedSpiderlings <= 0) && view.balances.debts.length === 0 && view.pending.size === 0 && handOversAwaitingArrival(view).size === 0
  );
}

export function toBalancesResponse(view: AccountView): BalancesResponse {
  const b = view.balances;
  return {
    projectId: view.data.project.id,
    currency: view.data.terms?.currency ?? null,
    ownerMemberId: view.owner.id,
    parties: b.parties.map((p) => ({ ...p, memberId: p.partyId, name: view.nameOf(p.partyId) })),
    debts: b.debts.map((d) => ({ ...d, fromName: view.nameOf(d.fromPartyId), toName: view.nameOf(d.toPartyId) })),
    problems: b.problems,
    settled: isSettled(view),
    provisional: isProvisional(view),
  };
}
