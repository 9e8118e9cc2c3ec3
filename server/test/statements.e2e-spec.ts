/**
 * Statements per party: JSON, CSV read back with an independent parser (papaparse), PDF text
 * extracted with pdf-parse, and the e-mail with its attachment read from the mail sink with
 * mailparser. Every figure is compared with what the balances route says.
 */
import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { serverWordsFor, type BalancesResponse, type Language, type StatementResponse } from '@broodsilk/shared';
import { STATEMENT_CSV_COLUMNS } from '../src/accounts/statement-csv';
import { createTestApp, type TestApp } from './support/test-app';
import { waitForMail } from './support/mail-sink';
import { createSac } from './support/sacs';
import { accountScenario, api, type AccountScenario } from './accounts.fixtures';
import { binary, pdfText } from './support/pdf';

let t: TestApp;
let s: AccountScenario;
let balances: BalancesResponse;

const D = '2026-11-20';

beforeAll(async () => {
  t = await createTestApp();
  s = await accountScenario(t.app, t.orm);
  const post = (body: object) => api(t.app).post(`/api/projects/${s.projectId}/entries`).set('Authorization', s.mira.bearer).send(body).expect(201);
  await post({ kind: 'hand-over', date: D, memberId: s.tomaszId, count: 10, method: 'shipment', carrier: 'Overnight courier', tracking: 'TRK-88, "fragile"' });
  await post({ kind: 'cash-out', date: D, memberId: s.tomaszId, count: 3 });
  await post({ kind: 'sale', date: D, memberId: s.lenaId, count: 2, priceMinor: 3000 });
  // An earlier sac that failed: its count is 0 and the failure clause is said in plain words.
  const failed = await createSac(t.app, s.mira, s.projectId, { layDate: '2026-06-01' });
  await api(t.app).patch(`/api/sacs/${failed.id}`).set('Authorization', s.mira.bearer).send({ outcome: 'failed', failureReason: 'spoiled' }).expect(200);
  balances = (await api(t.app).get(`/api/projects/${s.projectId}/balances`).set('Authorization', s.mira.bearer).expect(200)).body as BalancesResponse;
}, 90_000);
afterAll(async () => t?.close());

const tomasz = () => balances.parties.find((p) => p.memberId === s.tomaszId)!;

/** The header row a reader of this language gets, from the catalogue (statementCsv.column). */
const headerRow = (lng: Language) => STATEMENT_CSV_COLUMNS.map((c) => serverWordsFor(lng)(`statementCsv.column.${c}`));
const en = serverWordsFor('en');
/** Reads a statement CSV back with papaparse, each cell under its column's code (the header row is in the reader's words). */
function readCsv<T = string>(text: string, lng: Language = 'en', dynamicTyping = false): { fields: string[]; rows: Record<string, T>[]; errors: unknown[] } {
  const headers = headerRow(lng);
  const parsed = Papa.parse<Record<string, T>>(text.trimEnd(), {
    header: true,
    dynamicTyping,
    transformHeader: (h) => STATEMENT_CSV_COLUMNS[headers.indexOf(h)] ?? `unknown: ${h}`,
  });
  return { fields: parsed.meta.fields ?? [], rows: parsed.data, errors: parsed.errors };
}

describe('statement page data', () => {
  it('shows the party its own entries and balance, equal to the balances route', async () => {
    const res = await api(t.app).get(`/api/projects/${s.projectId}/statements/${s.tomaszId}`).set('Authorization', s.tomasz.bearer).expect(200);
    const st = res.body as StatementResponse;
    expect(st.party).toMatchObject({ memberId: s.tomaszId, name: 'Tomasz Partner', role: 'partner' });
    expect(st.entries.map((e) => e.kind)).toEqual(['hand-over', 'cash-out']); // Lena's sale is not his
    expect(st.balance).toEqual(tomasz());
    expect(st.debts).toEqual(balances.debts.filter((d) => d.toPartyId === s.tomaszId || d.fromPartyId === s.tomaszId));
    expect(st.failureNotes).toEqual([expect.stringContaining('the deal carries over')]);
    expect(st.hasShipment).toBe(true); // Tomasz's hand-over went by courier: the PDF adds the shipping cautions
  });

  it('a partner sees only their own statement; the owner sees everyone’s', async () => {
    const other = await api(t.app).get(`/api/projects/${s.projectId}/statements/${s.lenaId}`).set('Authorization', s.tomasz.bearer);
    expect(other.status).toBe(403);
    expect(other.body.message).toBe('You can see only your own statement; the project owner sees every party’s.');
    const lena = await api(t.app).get(`/api/projects/${s.projectId}/statements/${s.lenaId}`).set('Authorization', s.mira.bearer).expect(200);
    expect((lena.body as StatementResponse).hasShipment).toBe(false); // nothing was shipped to her: no shipping cautions
    await api(t.app).get(`/api/projects/${s.projectId}/statements/00000000-0000-4000-8000-000000000000`).set('Authorization', s.mira.bearer).expect(404);
  });
});

describe('statement CSV', () => {
  it('is RFC 4180 with a header row; papaparse reads back the entries and the balance figures', async () => {
    const res = await api(t.app).get(`/api/projects/${s.projectId}/statements/${s.tomaszId}.csv`).set('Authorization', s.tomasz.bearer).expect(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['content-disposition']).toMatch(/attachment; filename="statement-account-test-project-tomasz-partner\.csv"/);
    expect(res.text).toContain('\r\n'); // RFC 4180 line breaks
    expect(res.text.split('\r\n')[0]).toBe(headerRow('en').join(','));
    const parsed = readCsv(res.text);
    expect(parsed.errors).toEqual([]);
    expect(parsed.fields).toEqual([...STATEMENT_CSV_COLUMNS]);
    const handOver = parsed.rows.find((r) => r.kind === en('entryKind.hand-over'))!;
    expect(handOver).toMatchObject({ party: 'Tomasz Partner', count: '10', method: en('handOverMethod.shipment'), tracking: 'TRK-88, "fragile"' }); // comma and quotes survive
    const summary = (kind: string) => Number(parsed.rows.find((r) => r.kind === en(`statementCsv.line.${kind}`))!.count);
    expect(summary('share')).toBe(tomasz().share);
    expect(summary('handed-over')).toBe(tomasz().handedOver);
    expect(summary('cashed-out')).toBe(tomasz().cashedOut);
    expect(summary('still-owed')).toBe(tomasz().owedSpiderlings);
    const debt = parsed.rows.find((r) => r.kind === en('statementCsv.line.debt'))!;
    expect(Number(debt.amount_minor)).toBe(balances.debts.find((d) => d.toPartyId === s.tomaszId)!.amountMinor);
    expect(debt.amount).toBe('EUR 15.00');
  });

  it("is written in the reader's language: a German reader gets the German header row and words in the cells", async () => {
    await api(t.app).patch('/api/users/me').set('Authorization', s.tomasz.bearer).send({ language: 'de' }).expect(200);
    try {
      const res = await api(t.app).get(`/api/projects/${s.projectId}/statements/${s.tomaszId}.csv`).set('Authorization', s.tomasz.bearer).expect(200);
      const de = serverWordsFor('de');
      expect(res.text.split('\r\n')[0]).toBe(headerRow('de').join(','));
      expect(res.text.split('\r\n')[0]).not.toBe(headerRow('en').join(','));
      const { rows, errors } = readCsv(res.text, 'de');
      expect(errors).toEqual([]);
      expect(rows.find((r) => r.kind === de('entryKind.hand-over'))).toMatchObject({
        method: de('handOverMethod.shipment'),
        status: de('entryStatus.in-force'),
      });
      expect(Number(rows.find((r) => r.kind === de('statementCsv.line.still-owed'))!.count)).toBe(tomasz().owedSpiderlings);
      expect(rows.find((r) => r.kind === de('statementCsv.line.share'))!.estimated).toBe(de('statementCsv.no'));
      // no English word or raw code in a cell the catalogue writes
      expect(rows.map((r) => r.kind)).not.toContain('hand-over');
      expect(rows.map((r) => r.kind)).not.toContain(en('entryKind.hand-over'));
    } finally {
      await api(t.app).patch('/api/users/me').set('Authorization', s.tomasz.bearer).send({ language: 'en' }).expect(200);
    }
  });
});

describe('every entry that concerns the party, with numbers as numbers', () => {
  it('the keeper’s own statement lists the hand-overs, cash-outs and sales he made, and the arrival he was told of', async () => {
    const entries = (
      (await api(t.app).get(`/api/projects/${s.projectId}/entries`).set('Authorization', s.mira.bearer).expect(200)).body as {
        items: StatementResponse['entries'];
      }
    ).items;
    const handOver = entries.find((e) => e.kind === 'hand-over')!;
    await api(t.app)
      .post(`/api/projects/${s.projectId}/entries/${handOver.id}/confirm`)
      .set('Authorization', s.tomasz.bearer)
      .send({ arrivedAlive: 9, arrivedDead: 1 })
      .expect(201);
    const own = (await api(t.app).get(`/api/projects/${s.projectId}/statements/${s.miraId}`).set('Authorization', s.mira.bearer).expect(200))
      .body as StatementResponse;
    expect(own.entries.map((e) => e.kind)).toEqual(['hand-over', 'cash-out', 'sale', 'arrival']);
    expect(own.entries[0]).toMatchObject({ from: { memberId: s.miraId, name: 'Mira Keeper' }, to: { memberId: s.tomaszId, name: 'Tomasz Partner' } });
    // Tomasz's statement gains the arrival he confirmed; Lena's sale is still not his.
    const his = (await api(t.app).get(`/api/projects/${s.projectId}/statements/${s.tomaszId}`).set('Authorization', s.tomasz.bearer).expect(200))
      .body as StatementResponse;
    expect(his.entries.map((e) => e.kind)).toEqual(['hand-over', 'cash-out', 'arrival']);
  });

  // RFC 4180 §2: fields may be quoted; csv-stringify quotes only where needed, so numbers stay bare.
  it('the CSV fills from and to, and writes counts as unquoted numbers (arrival: 10 = 9 alive + 1 dead)', async () => {
    const res = await api(t.app).get(`/api/projects/${s.projectId}/statements/${s.miraId}.csv`).set('Authorization', s.mira.bearer).expect(200);
    const rows = Papa.parse<string[]>(res.text.trimEnd(), { header: false }).data;
    const col = (name: (typeof STATEMENT_CSV_COLUMNS)[number]) => rows[0]!.indexOf(en(`statementCsv.column.${name}`));
    const arrival = rows.find((r) => r[col('kind')] === en('entryKind.arrival'))!;
    expect([arrival[col('from')], arrival[col('to')], arrival[col('count')], arrival[col('arrived_alive')], arrival[col('arrived_dead')]]).toEqual([
      'Mira Keeper',
      'Tomasz Partner',
      '10',
      '9',
      '1',
    ]);
    const raw = res.text.split('\r\n').find((line) => line.includes(`,${en('entryKind.arrival')},`))!;
    expect(raw).toMatch(/,Mira Keeper,Tomasz Partner,10,9,1,/); // bare, not "10"
    const typed = readCsv<unknown>(res.text, 'en', true).rows;
    expect(typed.find((r) => r.kind === en('entryKind.hand-over'))).toMatchObject({
      line: expect.any(Number),
      count: 10,
      from: 'Mira Keeper',
      to: 'Tomasz Partner',
    });
  });
});

describe('statement CSV and formula-like text (OWASP CSV Injection)', () => {
  it('writes text that starts with = + - @ with a leading apostrophe; numbers stay numbers', async () => {
    const f = await accountScenario(t.app, t.orm);
    await api(t.app)
      .post(`/api/projects/${f.projectId}/entries`)
      .set('Authorization', f.mira.bearer)
      .send({
        kind: 'hand-over',
        date: D,
        memberId: f.tomaszId,
        count: 4,
        method: 'shipment',
        carrier: '=HYPERLINK("http://evil.test","open")',
        tracking: '@TRK-9',
      })
      .expect(201);
    const res = await api(t.app).get(`/api/projects/${f.projectId}/statements/${f.tomaszId}.csv`).set('Authorization', f.tomasz.bearer).expect(200);
    const { rows } = readCsv(res.text);
    const handOver = rows.find((r) => r.kind === en('entryKind.hand-over'))!;
    expect(handOver).toMatchObject({ carrier: `'=HYPERLINK("http://evil.test","open")`, tracking: "'@TRK-9", count: '4' });
    for (const row of rows) for (const cell of Object.values(row)) expect(cell, JSON.stringify(row)).not.toMatch(/^[=+@\t\r]|^-(?!\d+(\.\d+)?$)/);
  });
});

describe('statement PDF', () => {
  it('holds the project, party, terms, shares, entries and the same balance figures as the route', async () => {
    const res = await api(t.app)
      .get(`/api/projects/${s.projectId}/statements/${s.tomaszId}.pdf`)
      .set('Authorization', s.tomasz.bearer)
      .buffer(true)
      .parse(binary)
      .expect(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    const text = await pdfText(res.body as Buffer);
    const b = tomasz();
    expect(text).toContain('Project: Account test project');
    expect(text).toContain('Party: Tomasz Partner (Partner)');
    expect(text).not.toMatch(/\[in-force\]|\(in-progress\)|hand-over {2}/);
    expect(text).toContain('Version 1. Price per spiderling for cash-outs: EUR 5.00.');
    expect(text).toContain(`Share: ${b.share} young`);
    expect(text).toContain(`Handed over: ${b.handedOver} young`);
    expect(text).toContain(`Cashed out: ${b.cashedOut} young`);
    expect(text).toContain(`Still owed: ${b.owedSpiderlings} young`);
    expect(text).toContain('Money: Mira Keeper owes Tomasz Partner EUR 15.00');
    expect(text).toContain('In all: Mira Keeper 30, Tomasz Partner 17, Lena Outside 15.');
    expect(text).toMatch(/The terms say the deal carries over/);
    expect(text).toMatch(/Overnight courier, tracking TRK-88/);
    expect(text).toMatch(/overnight service/i);
  });

  it("speaks the reader's language: German words, no codes, for a partner who chose German", async () => {
    await api(t.app).patch('/api/users/me').set('Authorization', s.tomasz.bearer).send({ language: 'de' }).expect(200);
    try {
      const res = await api(t.app)
        .get(`/api/projects/${s.projectId}/statements/${s.tomaszId}.pdf`)
        .set('Authorization', s.tomasz.bearer)
        .buffer(true)
        .parse((r, cb) => {
          const chunks: Buffer[] = [];
          r.on('data', (c: Buffer) => chunks.push(c));
          r.on('end', () => cb(null, Buffer.concat(chunks)));
        })
        .expect(200);
      const text = await pdfText(res.body as Buffer);
      const b = tomasz();
      expect(text).toContain('Broodsilk-Kontoauszug');
      expect(text).toContain('Projekt: Account test project');
      expect(text).toContain('Beteiligter: Tomasz Partner (Partner)');
      expect(text).toContain(`Noch geschuldet: ${b.owedSpiderlings} Jungtiere`);
      expect(text).toContain('Versand lebender Wirbelloser');
      // The share explanation too (catalogue section `shares`, German).
      expect(text).toMatch(/Gezählt im Kokon: \d+ Jungtiere\./);
      expect(text).toMatch(/Insgesamt: Mira Keeper \d+, Tomasz Partner \d+/);
      expect(text).not.toMatch(/\[in-force\]|\(in-progress\)|Still owed|The sac counts|In all:/);
    } finally {
      await api(t.app).patch('/api/users/me').set('Authorization', s.tomasz.bearer).send({ language: 'en' }).expect(200);
    }
  });
});

describe('statement e-mail', () => {
  it('arrives in the mail sink with the PDF attached (read with mailparser and pdf-parse)', async () => {
    const res = await api(t.app).post(`/api/projects/${s.projectId}/statements/${s.tomaszId}/email`).set('Authorization', s.mira.bearer).expect(201);
    expect(res.body).toEqual({ sentTo: s.tomasz.user.email });
    const mail = await waitForMail(s.tomasz.user.email, /Broodsilk statement: Account test project \(Tomasz Partner\)/);
    expect(mail.text).toContain(`Still owed: ${tomasz().owedSpiderlings} young.`);
    expect(mail.attachments).toHaveLength(1);
    const [pdf] = mail.attachments;
    expect(pdf!.contentType).toBe('application/pdf');
    expect(pdf!.filename).toBe('statement-account-test-project-tomasz-partner.pdf');
    expect(await pdfText(pdf!.content)).toContain(`Still owed: ${tomasz().owedSpiderlings} young`);
  });

  it("is written in the recipient's language: German subject and text for a partner who chose German", async () => {
    await api(t.app).patch('/api/users/me').set('Authorization', s.tomasz.bearer).send({ language: 'de' }).expect(200);
    try {
      await api(t.app).post(`/api/projects/${s.projectId}/statements/${s.tomaszId}/email`).set('Authorization', s.mira.bearer).expect(201);
      const de = serverWordsFor('de');
      const subject = de('statement.mailSubject', { project: 'Account test project', party: 'Tomasz Partner' });
      expect(subject).toBe('Broodsilk-Kontoauszug: Account test project (Tomasz Partner)');
      const mail = await waitForMail(s.tomasz.user.email, new RegExp(subject.replace(/[()]/g, '\\$&')));
      expect(mail.subject).toBe(subject);
      expect(mail.text).toContain(de('statement.mailHello', { name: 'Tomasz Partner' }));
      expect(mail.text).toContain(`${de('statement.stillOwed', { count: tomasz().owedSpiderlings })}.`);
      expect(mail.text).not.toMatch(/Still owed|Hello/);
    } finally {
      await api(t.app).patch('/api/users/me').set('Authorization', s.tomasz.bearer).send({ language: 'en' }).expect(200);
    }
  });

  it('says so when the party has no e-mail address', async () => {
    const res = await api(t.app).post(`/api/projects/${s.projectId}/statements/${s.lenaId}/email`).set('Authorization', s.mira.bearer);
    expect(res.status).toBe(404);
    expect(res.body.message).toBe('Lena Outside has no e-mail address on this project; add one to e-mail the statement.');
  });
});
