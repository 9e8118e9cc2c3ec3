import type { BalancesResponse } from '@broodsilk/shared';
import type { AccountView } from './account-view';

/** Nothing owed: at least one counted sac under terms in force, no young still owed, no money owed. */
export function isSettled(view: AccountView): boolean {
  if (!view.data.terms || !view.sacs.some((s) => s.count > 0)) return false;
  return view.balances.parties.every((p) => p.owedSpiderlings === 0) && view.balances.debts.length === 0 && view.pending.size === 0;
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
  };
}
