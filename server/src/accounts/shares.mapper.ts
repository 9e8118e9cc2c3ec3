import { explainShares, type SacShareChange, type SacSharesView, type SharesResponse, type TermsSummary, type Words } from '@broodsilk/shared';
import type { TermsVersion } from '../projects/terms-version.entity';
import { memberName, type AccountView, type SacShareState } from './account-view';

export function toTermsSummary(t: TermsVersion): TermsSummary {
  return {
    number: t.number,
    pricePerSpiderlingMinor: t.pricePerSpiderlingMinor,
    currency: t.currency,
    failureClause: t.failureClause,
    handOverStage: t.handOverStage,
    shippingPaidBy: t.shippingPaidBy,
    lines: t.lines
      .getItems()
      .map((l) => ({ memberId: l.member.id, name: memberName(l.member), weight: l.weight, fixedCount: l.fixedCount, pickOrder: l.pickOrder }))
      .sort((a, b) => a.pickOrder - b.pickOrder),
  };
}

/** What a failed sac means under the terms in force, in the reader's words; null for a sac that did not fail. */
export function failureNote(view: AccountView, s: SacShareState, t: Words): string | null {
  if (s.fact.outcome !== 'failed') return null;
  return view.data.terms ? t(`shares.failed.${view.data.terms.failureClause}`) : t('shares.failedNoTerms');
}

export function toSacSharesView(view: AccountView, s: SacShareState, change: SacShareChange | null, t: Words): SacSharesView {
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
    explanation: s.result ? explainShares(s.result, view.nameOf, s.fact.estimated, t) : [],
    change,
    failure: failureNote(view, s, t),
  };
}

export function toSharesResponse(view: AccountView, changes: Map<string, SacShareChange | null>, t: Words): SharesResponse {
  const notices: string[] = [];
  if (!view.data.terms) notices.push(t('shares.noTerms'));
  if (!view.sacs.length) notices.push(t('shares.noSac'));
  return {
    projectId: view.data.project.id,
    terms: view.data.terms ? toTermsSummary(view.data.terms) : null,
    sacs: view.sacs.map((s) => toSacSharesView(view, s, changes.get(s.fact.sacId) ?? null, t)),
    totals: view.totals.map((t) => ({ memberId: t.partyId, name: view.nameOf(t.partyId), count: t.count })),
    notices,
  };
}
