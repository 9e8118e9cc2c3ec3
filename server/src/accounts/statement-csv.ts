import { stringify } from 'csv-stringify/sync';
import { formatMoneyCode, type StatementResponse } from '@broodsilk/shared';
import { neutraliseCell } from '../common/csv/formula-cells';

export const STATEMENT_CSV_COLUMNS = [
  'line',
  'date',
  'kind',
  'status',
  'party',
  'from',
  'to',
  'count',
  'arrived_alive',
  'arrived_dead',
  'amount_minor',
  'amount',
  'currency',
  'method',
  'carrier',
  'tracking',
  'reason',
  'recorded_by',
  'recorded_at',
  'estimated',
] as const;

/**
 * The statement as RFC 4180 CSV (CRLF, quoted where needed, one header row; text that a spreadsheet
 * would run as a formula starts with an apostrophe, see formula-cells): the party's ledger
 * lines, then summary lines (`kind` share, handed-over, sold, cashed-out, still-owed, debt) with
 * an empty `line`. Counts and minor units are numbers (written unquoted); an arrival's `count` is
 * the young that travelled, split into `arrived_alive` and `arrived_dead`. Each sac's count is a
 * `sac` line; `estimated` says `yes` on a sac counted by estimate and on a share resting on one
 * (provisional), `no` on exact ones, and stays empty on ledger lines.
 */
export function statementCsv(s: StatementResponse): string {
  const currency = s.terms?.currency ?? '';
  const rows: Record<string, string | number>[] = s.entries.map((e) => ({
    line: e.seq,
    date: e.date,
    kind: e.kind,
    status: e.status,
    party: e.party?.name ?? '',
    from: e.from?.name ?? '',
    to: e.to?.name ?? '',
    count: e.count ?? (e.arrivedAlive != null && e.arrivedDead != null ? e.arrivedAlive + e.arrivedDead : ''),
    arrived_alive: e.arrivedAlive ?? '',
    arrived_dead: e.arrivedDead ?? '',
    amount_minor: e.amountMinor ?? e.priceMinor ?? '',
    amount: e.amountMinor != null ? formatMoneyCode(e.amountMinor, e.currency!) : e.priceMinor != null ? formatMoneyCode(e.priceMinor, e.currency!) : '',
    currency: e.currency ?? '',
    method: e.method ?? '',
    carrier: e.carrier ?? '',
    tracking: e.tracking ?? '',
    reason: e.reason ?? e.note ?? '',
    recorded_by: e.recordedBy?.name ?? (e.source === 'payment-provider' ? 'payment provider' : ''),
    recorded_at: e.recordedAt,
  }));
  const b = s.balance;
  if (b) {
    const summary = (kind: string, count: number) => ({ kind, party: s.party.name, count });
    rows.push(
      { ...summary('share', b.share), estimated: s.provisional ? 'yes' : 'no' },
      summary('handed-over', b.handedOver),
      summary('sold', b.sold),
      summary('cashed-out', b.cashedOut),
      summary('still-owed', b.owedSpiderlings),
    );
  }
  for (const sac of s.sacs)
    rows.push({ kind: 'sac', date: sac.layDate, count: sac.count, estimated: sac.estimated ? 'yes' : 'no', reason: `Sac laid ${sac.layDate}` });
  for (const d of s.debts)
    rows.push({
      kind: 'debt',
      from: d.fromName,
      to: d.toName,
      amount_minor: d.amountMinor,
      amount: formatMoneyCode(d.amountMinor, d.currency),
      currency: d.currency || currency,
    });
  return stringify(rows, { header: true, columns: [...STATEMENT_CSV_COLUMNS], record_delimiter: 'windows', cast: { string: neutraliseCell } });
}
