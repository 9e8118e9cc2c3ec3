import PDFDocument from 'pdfkit';
import { formatMoneyCode, sacCountLine, shareLine, type StatementResponse } from '@broodsilk/shared';

// The built-in PDF fonts cover WinAnsi only; these few signs from the share explanations are not in it.
const WIN_ANSI_FALLBACK: Record<string, string> = { '−': '-', '→': '->', '≈': '~', '≤': '<=', '≥': '>=' };
export const pdfSafe = (text: string): string => text.replace(/[−→≈≤≥]/g, (c) => WIN_ANSI_FALLBACK[c] ?? c);

const entryLine = (e: StatementResponse['entries'][number]): string => {
  const who = e.party?.name ?? (e.from && e.to ? `${e.from.name} to ${e.to.name}` : '');
  const what =
    e.kind === 'arrival'
      ? `arrived ${e.arrivedAlive} alive, ${e.arrivedDead} dead`
      : e.kind === 'money'
        ? formatMoneyCode(e.amountMinor!, e.currency!)
        : e.kind === 'sale'
          ? `${e.count} young for ${formatMoneyCode(e.priceMinor!, e.currency!)}`
          : e.kind === 'correction'
            ? `reverses an earlier entry: ${e.reason}`
            : e.kind === 'confirmation'
              ? 'payment confirmed'
              : `${e.count} young${e.method === 'shipment' ? ` by ${e.carrier}, tracking ${e.tracking}` : e.method ? ', picked up' : ''}`;
  return `#${e.seq}  ${e.date}  ${e.kind}  ${who}: ${what}  [${e.status}]`;
};

/** The statement as a PDF (pdfkit): project, party, terms in force, shares per sac, entries, balance. */
export function statementPdf(s: StatementResponse): Promise<Buffer> {
  const doc = new PDFDocument({ size: 'A4', margin: 50, info: { Title: `Statement: ${s.project.title} (${s.party.name})`, Author: 'Broodsilk' } });
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  const heading = (t: string) => doc.moveDown(0.8).font('Helvetica-Bold').fontSize(12).text(pdfSafe(t)).font('Helvetica').fontSize(10);
  const line = (t: string) => doc.text(pdfSafe(t));

  doc.font('Helvetica-Bold').fontSize(16).text('Broodsilk account statement');
  doc.font('Helvetica').fontSize(10);
  line(`Project: ${s.project.title}`);
  line(`Party: ${s.party.name} (${s.party.role})`);
  line(`Made on: ${s.generatedAt.slice(0, 10)}`);

  heading('Terms in force');
  if (!s.terms) line('No version of the terms is in force yet.');
  else {
    line(`Version ${s.terms.number}. Price per spiderling for cash-outs: ${formatMoneyCode(s.terms.pricePerSpiderlingMinor, s.terms.currency)}.`);
    for (const l of s.terms.lines) line(`${l.pickOrder}. ${l.name}: weight ${l.weight}${l.fixedCount ? `, ${l.fixedCount} fixed` : ''}`);
    line(`Failure clause: ${s.terms.failureClauseText}`);
    line(`Young are handed over at: ${s.terms.handOverStage}. Shipping paid by: ${s.terms.shippingPaidBy}.`);
  }

  heading('Shares per sac');
  if (!s.sacs.length) line('No sac yet.');
  for (const sac of s.sacs) {
    line(sacCountLine(sac));
    for (const p of sac.parties) line(`   ${p.name}: ${p.count}`);
    for (const e of sac.explanation) line(`   ${e}`);
    if (sac.failure) line(`   ${sac.failure}`);
  }

  heading('Entries');
  if (!s.entries.length) line('No entries yet.');
  for (const e of s.entries) line(entryLine(e));

  heading('Balance');
  const b = s.balance;
  if (!b) line('No share in the terms in force.');
  else {
    line(shareLine(b.share, s.provisional));
    line(`Handed over: ${b.handedOver} young`);
    line(`Sold: ${b.sold} young`);
    line(`Cashed out: ${b.cashedOut} young`);
    line(`Still owed: ${b.owedSpiderlings} young`);
  }
  if (!s.debts.length) line('Money: nothing owed between this party and the others.');
  for (const d of s.debts) line(`Money: ${d.fromName} owes ${d.toName} ${formatMoneyCode(d.amountMinor, d.currency)}`);

  if (s.failureNotes.length) {
    heading('A sac failed');
    for (const n of s.failureNotes) line(n);
  }
  if (s.shippingCautions.length) {
    heading('Shipping live invertebrates');
    for (const c of s.shippingCautions) line(`- ${c}`);
  }
  doc.end();
  return done;
}
