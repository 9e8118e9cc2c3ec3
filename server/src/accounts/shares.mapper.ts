import { explainShares, type FailureClause, type SacShareChange, type SacSharesView, type SharesResponse, type TermsSummary } from '@broodsilk/shared';
import type { TermsVersion } from '../projects/terms-version.entity';
import { memberName, type AccountView, type SacShareState } from './account-view';

export const FAILURE_CLAUSE_TEXT: Record<FailureClause, string> = {
  'nothing-owed': 'If a sac fails, nothing is owed for it.',
  'carries-over': 'If a sac fails, the deal carries over to the next sac.',
};

const FAILED_SAC_TEXT: Record<FailureClause, string> = {
  'nothing-owed':
    'This sac failed. The terms say nothing is owed for a failed sac: no party is owed young from it beyond what was already handed over, sold or cashed out.',
  'carries-over':
    'This sac failed. The terms say the deal carries over: the parties are owed their shares from the next sac instead, worked out on that sac’s count.',
};

export function toTermsSummary(t: TermsVersion): TermsSummary {
  return {
    number: t.number,
    pricePerSpiderlingMinor: t.pricePerSpiderlingMinor,
    currency: t.currency,
    failureClause: t.failureClause,
    failureClauseText: FAILURE_CLAUSE_TEXT[t.failureClause],
    handOverStage: t.handOverStage,
    shippingPaidBy: t.shippingPaidBy,
    lines: t.lines
      .getItems()
      .map((l) => ({ memberId: l.member.id, name: memberName(l.member), weight: l.weight, fixedCount: l.fixedCount, pickOrder: l.pickOrder }))
      .sort((a, b) => a.pickOrder - b.pickOrder),
  };
}

export function failureNote(view: AccountView, s: SacShareState): string | null {
  if (s.fact.outcome !== 'failed') return null;
  return view.data.terms ? FAILED_SAC_TEXT[view.data.terms.failureClause] : 'This sac failed. No terms are in force, so nothing is owed from it.';
}

export function toSacSharesView(view: AccountView, s: SacShareState, change: SacShareChange | null): SacSharesView {
  return {
    sacId: s.fact.sacId,
    layDate: s.fact.layDate,
    outcome: s.fact.outcome,
    count: s.count,
    aliveInCare: s.aliveInCare,
    withdrawn: s.withdrawn,
    estimated: s.fact.estimated,
    parties: (s.result?.parties ?? []).map((p) => ({
      memberId: p.partyId,
      name: view.nameOf(p.partyId),
      count: p.count,
      fixed: p.fixed,
      proportional: p.proportional,
      exactQuota: p.exactQuota,
      roundedUp: p.roundedUp,
    })),
    explanation: s.result ? explainShares(s.result, view.nameOf, s.fact.estimated) : [],
    change,
    failure: failureNote(view, s),
  };
}

export function toSharesResponse(view: AccountView, changes: Map<string, SacShareChange | null>): SharesResponse {
  const notices: string[] = [];
  if (!view.data.terms)
    notices.push('No version of the terms is in force yet, so there are no shares. Shares follow once every partner has accepted the terms.');
  if (!view.sacs.length) notices.push('This project has no sac yet; shares are worked out per sac from its count of young.');
  return {
    projectId: view.data.project.id,
    terms: view.data.terms ? toTermsSummary(view.data.terms) : null,
    sacs: view.sacs.map((s) => toSacSharesView(view, s, changes.get(s.fact.sacId) ?? null)),
    totals: view.totals.map((t) => ({ memberId: t.partyId, name: view.nameOf(t.partyId), count: t.count })),
    notices,
  };
}
