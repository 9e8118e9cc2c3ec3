import type { EntityManager } from '@mikro-orm/postgresql';
import { diffShares, type SacShareChange, type ShareResult, type Words } from '@broodsilk/shared';
import type { AccountView } from './account-view';

interface BasisRow {
  sac_id: string;
  revision: number;
  count: number;
  terms_number: number | null;
  result: ShareResult;
  created_at: Date;
}

function describe(
  view: AccountView,
  before: BasisRow,
  after: { count: number; termsNumber: number | null; result: ShareResult },
  at: Date,
  t: Words,
): SacShareChange {
  const diff = diffShares(before.result, after.result, view.nameOf, t);
  const reasons: string[] = [];
  if (before.count !== after.count) reasons.push(t('shares.countChanged', { before: before.count, after: after.count }));
  if (before.terms_number !== after.termsNumber) reasons.push(t('shares.termsChanged', { before: before.terms_number, after: after.termsNumber }));
  return {
    changedAt: at.toISOString(),
    reasons,
    lines: diff.lines,
    changes: diff.changes.map((c) => ({ ...c, name: view.nameOf(c.partyId) })),
  };
}

/**
 * Keeps one `share_bases` row per change of a sac's basis (count or terms version) and says what
 * changed since the one before, in the reader's words `t`. Adding is `on conflict do nothing`, so two readers at once agree.
 */
export async function trackShareBases(em: EntityManager, view: AccountView, now: Date, t: Words): Promise<Map<string, SacShareChange | null>> {
  const out = new Map<string, SacShareChange | null>();
  const termsNumber = view.data.terms?.number ?? null;
  const rows = await em.execute<BasisRow[]>(
    `select sac_id, revision, count, terms_number, result, created_at from share_bases where project_id = ? order by sac_id, revision desc`,
    [view.data.project.id],
  );
  for (const s of view.sacs) {
    if (!s.result) continue;
    const mine = rows.filter((r) => r.sac_id === s.fact.sacId);
    const [last, previous] = mine;
    const current = { count: s.count, termsNumber, result: s.result };
    if (!last || last.count !== s.count || last.terms_number !== termsNumber) {
      const at = now;
      await em.execute(
        `insert into share_bases (id, created_at, updated_at, project_id, sac_id, revision, count, terms_number, result)
         values (gen_random_uuid(), ?, ?, ?, ?, ?, ?, ?, ?) on conflict (sac_id, revision) do nothing`,
        [at, at, view.data.project.id, s.fact.sacId, (last?.revision ?? 0) + 1, s.count, termsNumber, JSON.stringify(s.result)],
      );
      out.set(s.fact.sacId, last ? describe(view, last, current, at, t) : null);
    } else {
      out.set(s.fact.sacId, previous ? describe(view, previous, current, new Date(last.created_at), t) : null);
    }
  }
  return out;
}
