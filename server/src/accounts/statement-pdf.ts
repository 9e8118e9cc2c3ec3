import PDFDocument from 'pdfkit';
import {
  broodStageLabel,
  formatMoneyCode,
  label,
  shippingCautions,
  type BroodStage,
  type ProjectRole,
  type ShippingPayer,
  type StatementResponse,
} from '@broodsilk/shared';
import type { Reader } from '../users/reader-words';

// The built-in PDF fonts cover WinAnsi only; these few signs from the share explanations are not in it.
const WIN_ANSI_FALLBACK: Record<string, string> = { '−': '-', '→': '->', '≈': '~', '≤': '<=', '≥': '>=' };
export const pdfSafe = (text: string): string => text.replace(/[−→≈≤≥]/g, (c) => WIN_ANSI_FALLBACK[c] ?? c);

const entryLine = (e: StatementResponse['entries'][number], { t }: Reader): string => {
  const who = e.party?.name ?? (e.from && e.to ? t('statement.fromTo', { from: e.from.name, to: e.to.name }) : '');
  const what =
    e.kind === 'arrival'
      ? t('statement.arrived', { alive: e.arrivedAlive, dead: e.arrivedDead })
      : e.kind === 'money'
        ? formatMoneyCode(e.amountMinor!, e.currency!)
        : e.kind === 'sale'
          ? t('statement.sold', { count: e.count, price: formatMoneyCode(e.priceMinor!, e.currency!) })
          : e.kind === 'correction'
            ? t('statement.reverses', { reason: e.reason })
            : e.kind === 'confirmation'
              ? t('statement.paymentConfirmed')
              : e.method === 'shipment'
                ? t('statement.shipped', { count: e.count, carrier: e.carrier, tracking: e.tracking })
                : e.method
                  ? t('statement.pickedUp', { count: e.count })
                  : t('statement.young', { count: e.count });
  return `#${e.seq}  ${e.date}  ${label(t, 'entryKind', e.kind)}  ${who}: ${what}  [${label(t, 'entryStatus', e.status)}]`;
};

/** The statement as a PDF (pdfkit) in the reader's language: project, party, terms in force, shares per sac, entries, balance. */
export function statementPdf(s: StatementResponse, reader: Reader): Promise<Buffer> {
  const { t } = reader;
  const doc = new PDFDocument({
    size: 'A4',
    margin: 50,
    lang: reader.lng,
    info: { Title: t('statement.docTitle', { project: s.project.title, party: s.party.name }), Author: 'Broodsilk' },
  });
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  const heading = (text: string) => doc.moveDown(0.8).font('Helvetica-Bold').fontSize(12).text(pdfSafe(text)).font('Helvetica').fontSize(10);
  const line = (text: string) => doc.text(pdfSafe(text));

  doc.font('Helvetica-Bold').fontSize(16).text(t('statement.title'));
  doc.font('Helvetica').fontSize(10);
  line(t('statement.project', { title: s.project.title }));
  line(t('statement.party', { name: s.party.name, role: label(t, 'role', s.party.role as ProjectRole) }));
  line(t('statement.madeOn', { date: s.generatedAt.slice(0, 10) }));

  heading(t('statement.termsHeading'));
  if (!s.terms) line(t('statement.noTerms'));
  else {
    line(t('statement.termsVersion', { number: s.terms.number, price: formatMoneyCode(s.terms.pricePerSpiderlingMinor, s.terms.currency) }));
    for (const l of s.terms.lines)
      line(t(l.fixedCount ? 'statement.termsLineFixed' : 'statement.termsLine', { order: l.pickOrder, name: l.name, weight: l.weight, fixed: l.fixedCount }));
    line(t('statement.failureClause', { text: label(t, 'failureClauseText', s.terms.failureClause) }));
    line(
      t('statement.handOver', {
        stage: broodStageLabel(t, s.terms.handOverStage as BroodStage, reader.numbering),
        payer: label(t, 'shippingPayer', s.terms.shippingPaidBy as ShippingPayer),
      }),
    );
  }

  heading(t('statement.sharesHeading'));
  if (!s.sacs.length) line(t('statement.noSac'));
  for (const sac of s.sacs) {
    line(
      t(sac.estimated ? 'statement.sacLineEstimated' : 'statement.sacLine', {
        layDate: sac.layDate,
        outcome: label(t, 'sacOutcome', sac.outcome),
        count: sac.count,
      }),
    );
    for (const p of sac.parties) line(`   ${p.name}: ${p.count}`);
    for (const e of sac.explanation) line(`   ${e}`);
    if (sac.failure) line(`   ${sac.failure}`);
  }

  heading(t('statement.entriesHeading'));
  if (!s.entries.length) line(t('statement.noEntries'));
  for (const e of s.entries) line(entryLine(e, reader));

  heading(t('statement.balanceHeading'));
  const b = s.balance;
  if (!b) line(t('statement.noShare'));
  else {
    line(t(s.provisional ? 'statement.shareProvisional' : 'statement.share', { count: b.share }));
    line(t('statement.handedOver', { count: b.handedOver }));
    line(t('statement.soldCount', { count: b.sold }));
    line(t('statement.cashedOut', { count: b.cashedOut }));
    line(t('statement.stillOwed', { count: b.owedSpiderlings }));
  }
  if (!s.debts.length) line(t('statement.noDebts'));
  for (const d of s.debts) line(t('statement.debt', { from: d.fromName, to: d.toName, amount: formatMoneyCode(d.amountMinor, d.currency) }));

  if (s.failureNotes.length) {
    heading(t('statement.failedHeading'));
    for (const n of s.failureNotes) line(n);
  }
  if (s.hasShipment) {
    heading(t('statement.shippingHeading'));
    for (const c of shippingCautions(t)) line(`- ${c}`);
  }
  doc.end();
  return done;
}
