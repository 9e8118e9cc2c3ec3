import { stringify } from 'csv-stringify/sync';
import { formatMoneyCode, label, type Catalogue, type StatementResponse } from '@broodsilk/shared';
import { neutraliseCell } from '../common/csv/formula-cells';
import type { Reader } from '../users/reader-words';

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
] as const satisfies readonly (keyof Catalogue['statementCsv']['column'])[];

type SummaryLine = keyof Catalogue['statementCsv']['line'];

/**
 * The statement as RFC 4180 CSV (CRLF, quoted where needed, one header row; text that a spreadsheet
 * would run as a formula starts with an apostrophe, see formula-cells), in the reader's language:
 * the header row and the words in the cells (kind, status, method, yes/no) come from the catalogue
 * (`statementCsv`, `entryKind`, `entryStatus`, `handOverMethod`). The party's ledger lines come
 * first, then summary lines (kind share, handed over, sold, cashed out, still owed, money owed)
 * with an empty `line`. Counts and minor units are numbers (written unquoted); an arrival's `count`
 * is the young that travelled, split into `arrived_alive` and `arrived_dead`. Each sac's count is a
 * sac line; `estimated` says yes on a sac counted by estimate and on a share resting on one
 * (provisional), no on exact ones, and stays empty on ledger lines.
 */
export function statementCsv(s: StatementResponse, { t }: Pick<Reader, 't'>): string {
  const line = (kind: SummaryLine) => t(`statementCsv.line.${kind}`);
  const yesNo = (yes: boolean) => t(yes ? 'statementCsv.yes' : 'statementCsv.no');
  const currency = s.terms?.currency ?? '';
  const rows: Record<string, string | number>[] = s.entries.map((e) => ({
    line: e.seq,
    date: e.date,
    kind: label(t, 'entryKind', e.kind),
    status: label(t, 'entryStatus', e.status),
    party: e.party?.name ?? '',
    from: e.from?.name ?? '',
    to: e.to?.name ?? '',
    count: e.count ?? (e.arrivedAlive != null && e.arrivedDead != null ? e.arrivedAlive + e.arrivedDead : ''),
    arrived_alive: e.arrivedAlive ?? '',
    arrived_dead: e.arrivedDead ?? '',
    amount_minor: e.amountMinor ?? e.priceMinor ?? '',
    amount: e.amountMinor != null ? formatMoneyCode(e.amountMinor, e.currency!) : e.priceMinor != null ? formatMoneyCode(e.priceMinor, e.currency!) : '',
    currency: e.currency ?? '',
    method: e.method ? label(t, 'handOverMethod', e.method) : '',
    carrier: e.carrier ?? '',
    tracking: e.tracking ?? '',
    reason: e.reason ?? e.note ?? '',
    recorded_by: e.recordedBy?.name ?? (e.source === 'payment-provider' ? t('statementCsv.paymentProvider') : ''),
    recorded_at: e.recordedAt,
  }));
  const b = s.balance;
  if (b) {
    const summary = (kind: SummaryLine, count: number) => ({ kind: line(kind), party: s.party.name, count });
    rows.push(
      { ...summary('share', b.share), estimated: yesNo(s.provisional) },
      summary('handed-over', b.handedOver),
      summary('sold', b.sold),
      summary('cashed-out', b.cashedOut),
      summary('still-owed', b.owedSpiderlings),
    );
  }
  for (const sac of s.sacs)
    rows.push({
      kind: line('sac'),
      date: sac.layDate,
      count: sac.count,
      estimated: yesNo(sac.estimated),
      reason: t('statementCsv.sacLaid', { layDate: sac.layDate }),
    });
  for (const d of s.debts)
    rows.push({
      kind: line('debt'),
      from: d.fromName,
      to: d.toName,
      amount_minor: d.amountMinor,
      amount: formatMoneyCode(d.amountMinor, d.currency),
      currency: d.currency || currency,
    });
  const columns = STATEMENT_CSV_COLUMNS.map((key) => ({ key, header: t(`statementCsv.column.${key}`) }));
  return stringify(rows, { header: true, columns, record_delimiter: 'windows', cast: { string: neutraliseCell } });
}
