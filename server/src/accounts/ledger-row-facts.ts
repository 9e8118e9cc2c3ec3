import type { EntityManager } from '@mikro-orm/postgresql';
import type { LedgerRowFacts } from './account-view';
import { LedgerEntryRow } from './ledger-entry.entity';

interface FactsRow {
  project_id: string;
  id: string;
  created_at: Date;
  kind: LedgerRowFacts['kind'];
  date: string;
  sac_id: string | null;
  count: number | null;
  method: LedgerRowFacts['method'];
  carrier: string | null;
  tracking: string | null;
  price_minor: number | null;
  price_per_spiderling_minor: number | null;
  amount_minor: number | null;
  currency: string | null;
  arrived_alive: number | null;
  arrived_dead: number | null;
  reason: string | null;
  source: LedgerRowFacts['source'];
  party_id: string | null;
  from_party_id: string | null;
  to_party_id: string | null;
  target_id: string | null;
  recorded_by_id: string | null;
}

const ref = (id: string | null) => (id ? { id } : null);

/**
 * The ledgers of many projects as plain rows, in ledger order, grouped by project: the columns the
 * account's rules read, without hydrating an entity per row. For reads that show balances and
 * to-dos of many accounts at once (the dashboard); a page that shows the entries loads the entities.
 */
export async function ledgerRowFactsOf(em: EntityManager, projectIds: string[]): Promise<Map<string, LedgerRowFacts[]>> {
  const out = new Map<string, LedgerRowFacts[]>();
  if (!projectIds.length) return out;
  // A plain query does not flush as em.find does first: a row persisted in this unit of work but
  // not yet written would be missed. Flush when em.find would (MikroORM's auto-flush rule).
  if (em.getUnitOfWork().shouldAutoFlush(em.getMetadata().get(LedgerEntryRow.name))) await em.flush();
  const rows = await em.execute<FactsRow[]>(
    `select project_id, id, created_at, kind, date::text as date, sac_id, count, method, carrier, tracking, price_minor,
            price_per_spiderling_minor, amount_minor, currency, arrived_alive, arrived_dead, reason, source,
            party_id, from_party_id, to_party_id, target_id, recorded_by_id
       from ledger_entries where project_id = any(?::uuid[]) order by seq`,
    [`{${projectIds.join(',')}}`], // a PostgreSQL array literal: knex would spread a JS array
  );
  for (const r of rows) {
    const facts: LedgerRowFacts = {
      id: r.id,
      createdAt: new Date(r.created_at),
      kind: r.kind,
      date: r.date,
      sacId: r.sac_id,
      count: r.count,
      method: r.method,
      carrier: r.carrier,
      tracking: r.tracking,
      priceMinor: r.price_minor,
      pricePerSpiderlingMinor: r.price_per_spiderling_minor,
      amountMinor: r.amount_minor,
      currency: r.currency,
      arrivedAlive: r.arrived_alive,
      arrivedDead: r.arrived_dead,
      reason: r.reason,
      source: r.source,
      party: ref(r.party_id),
      fromParty: ref(r.from_party_id),
      toParty: ref(r.to_party_id),
      target: ref(r.target_id),
      recordedBy: ref(r.recorded_by_id),
    };
    const group = out.get(r.project_id);
    if (group) group.push(facts);
    else out.set(r.project_id, [facts]);
  }
  return out;
}
