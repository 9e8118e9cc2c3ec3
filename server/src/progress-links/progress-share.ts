import type { ProgressShareView } from '@broodsilk/shared';
import type { AccountView } from '../accounts/account-view';
import { isProvisional } from '../accounts/balances.mapper';

/** One party's part of the account: its own counts only, no other party's name, share or money. */
export function toProgressShare(view: AccountView, memberId: string): ProgressShareView {
  const balance = view.balances.parties.find((p) => p.partyId === memberId);
  const total = view.totals.find((t) => t.partyId === memberId)?.count ?? 0;
  return {
    termsInForce: !!view.data.terms,
    failureClause: view.data.terms?.failureClause ?? null,
    sacs: view.sacs.map((s) => ({
      sacId: s.fact.sacId,
      layDate: s.fact.layDate,
      count: s.result?.parties.find((p) => p.partyId === memberId)?.count ?? 0,
      failed: s.fact.outcome === 'failed',
    })),
    total,
    handedOver: balance?.handedOver ?? 0,
    stillOwed: balance ? Math.max(0, balance.owedSpiderlings) : 0,
    provisional: isProvisional(view),
  };
}
