import request from 'supertest';
import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addDays, todayIn, type AnimalSummary } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { createAnimal, speciesId } from './support/fixtures/collection';

let t: TestApp;
let mira: SignedIn;
let vagans: string;
let today: string;
const http = () => request(t.app.getHttpServer());
const BOM = '\uFEFF';

async function exportCsv(who: SignedIn): Promise<{ text: string; bytes: Buffer; type: string }> {
  const res = await http()
    .get('/api/animals/export.csv')
    .set('Authorization', who.bearer)
    .buffer(true)
    .parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    })
    .expect(200);
  const bytes = res.body as Buffer;
  return { bytes, text: bytes.toString('utf8'), type: res.headers['content-type'] };
}
const importCsv = (who: SignedIn, text: string, filename = 'animals.csv') =>
  http().post('/api/animals/import').set('Authorization', who.bearer).attach('file', Buffer.from(text, 'utf8'), { filename, contentType: 'text/csv' });
async function labels(who: SignedIn): Promise<string[]> {
  const res = await http().get('/api/animals').query({ sort: 'label', limit: 500 }).set('Authorization', who.bearer).expect(200);
  return res.body.items.map((a: AnimalSummary) => a.label);
}

// Notes that exercise every RFC 4180 rule: comma, doubled quote, CRLF and LF inside a quoted field.
const TRICKY = ['Rack 3, shelf "top"', 'line one\r\nline two', 'just\nLF', 'Dor & Hénaut — ü 🕷', ' leading and trailing spaces '];

beforeAll(async () => {
  t = await createTestApp();
  mira = await registerKeeper(t.app, 'Mira');
  vagans = await speciesId(t.orm, 'Tliltocatl vagans');
  today = todayIn('UTC', new Date());
  for (const [i, notes] of TRICKY.entries()) {
    await createAnimal(t.app, mira, {
      speciesId: vagans,
      label: `RT-${i}`,
      sex: i % 2 ? 'male' : 'female',
      maturity: i % 2 ? 'mature' : 'immature',
      maturedOn: i % 2 ? addDays(today, -30 * i) : null,
      acquiredOn: addDays(today, -400),
      pricePaidMinor: 1250 * i,
      priceCurrency: 'EUR',
      notes,
      enclosure: `E,${i}`,
    });
  }
});
afterAll(async () => {
  await t.close();
});

describe('CSV export (RFC 4180, checked with papaparse as an independent parser)', () => {
  it('is UTF-8 with a BOM, a header row and CRLF record ends', async () => {
    const { bytes, text, type } = await exportCsv(mira);
    expect(type).toMatch(/^text\/csv; charset=utf-8/);
    expect([...bytes.subarray(0, 3)]).toEqual([0xef, 0xbb, 0xbf]);
    const body = text.slice(1);
    expect(body.startsWith('label,species,speciesId,sex,maturity,maturedOn,')).toBe(true);
    // RFC 4180 §2.1: each record ends with CRLF, including the last
    expect(body.endsWith('\r\n')).toBe(true);
    const parsed = Papa.parse<Record<string, string>>(body, { header: true, skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    expect(parsed.meta.linebreak).toBe('\r\n');
    // the product trims spaces around typed text
    expect(parsed.data.map((r) => r.notes)).toEqual(TRICKY.map((n) => n.trim()));
    expect(parsed.data.map((r) => r.enclosure)).toEqual(TRICKY.map((_, i) => `E,${i}`));
    expect(parsed.data[1]).toMatchObject({
      label: 'RT-1',
      species: 'Tliltocatl vagans',
      speciesId: vagans,
      sex: 'male',
      maturity: 'mature',
      maturedOn: addDays(today, -30),
      pricePaidMinor: '1250',
      priceCurrency: 'EUR',
    });
    // §2.7: a quote inside a field is doubled
    expect(body).toContain('"Rack 3, shelf ""top"""');
  });

  it('round-trips: another keeper imports the exported file and exports the same rows', async () => {
    const { text } = await exportCsv(mira);
    const copy = await registerKeeper(t.app, 'Copy');
    const res = await importCsv(copy, text).expect(201);
    expect(res.body).toEqual({ imported: TRICKY.length });
    const again = await exportCsv(copy);
    expect(again.text).toBe(text);
  });
});

describe('formula-like text (OWASP CSV Injection: = + - @ tab CR start a formula in a spreadsheet)', () => {
  // Typed text is trimmed, so tab and CR only survive inside; they are covered by the unit spec of formula-cells.
  const FORMULAS = ['=HYPERLINK("http://evil.test","click")', '+1+1', '-2+3', '@SUM(A1:A9)', "'=already quoted", '-12.50'];

  it('is written with a leading apostrophe, plain numbers excepted, and imports back exactly', async () => {
    const keeper = await registerKeeper(t.app, 'Formula Keeper');
    for (const [i, notes] of FORMULAS.entries()) {
      await createAnimal(t.app, keeper, {
        speciesId: vagans,
        label: i === 0 ? '=1+1' : `FX-${i}`,
        sex: 'female',
        maturity: 'immature',
        notes,
        enclosure: '@shelf',
      });
    }
    const { text } = await exportCsv(keeper);
    const rows = Papa.parse<Record<string, string>>(text.slice(1), { header: true, skipEmptyLines: true }).data;
    const byLabel = new Map(rows.map((r) => [r.label, r]));
    expect(byLabel.get("'=1+1")?.notes).toBe(`'${FORMULAS[0]}`);
    expect(rows.map((r) => r.notes).sort()).toEqual(
      ["'+1+1", "''=already quoted", "'-2+3", '\'=HYPERLINK("http://evil.test","click")', "'@SUM(A1:A9)", '-12.50'].sort(),
    );
    expect(rows.every((r) => r.enclosure === "'@shelf")).toBe(true);

    const copy = await registerKeeper(t.app, 'Formula Copy');
    await importCsv(copy, text).expect(201);
    const list = (await http().get('/api/animals').query({ sort: 'label' }).set('Authorization', copy.bearer).expect(200)).body.items as AnimalSummary[];
    expect(list.map((a) => a.label).sort()).toEqual(['=1+1', ...FORMULAS.slice(1).map((_, i) => `FX-${i + 1}`)].sort());
    const notes = await Promise.all(
      list.map(async (a) => (await http().get(`/api/animals/${a.id}`).set('Authorization', copy.bearer).expect(200)).body.notes as string),
    );
    expect(notes.sort()).toEqual([...FORMULAS].sort());
    expect(list.every((a) => a.enclosure === '@shelf')).toBe(true);
    expect((await exportCsv(copy)).text).toBe(text);
  });
});

describe('CSV import', () => {
  it('reads RFC 4180 edge cases written by hand, with a BOM, and species by a former name', async () => {
    const keeper = await registerKeeper(t.app, 'Hand Written');
    const text =
      `${BOM}label,species,sex,notes,enclosure\r\n` +
      `"HW-1",Brachypelma vagans,female,"comma, inside",A1\r\n` +
      `HW-2,Tliltocatl vagans,male,"she said ""wait""",A2\r\n` +
      `HW-3,Avicularia versicolor,unsexed,"two\r\nlines",A3\r\n` +
      `HW-4,Caribena versicolor,female,,"quoted, enclosure"`;
    // The independent parser must read our hand-written file the same way first.
    const papa = Papa.parse<Record<string, string>>(text.slice(1), { header: true });
    expect(papa.errors).toEqual([]);
    expect(papa.data.map((r) => r.notes)).toEqual(['comma, inside', 'she said "wait"', 'two\r\nlines', '']);

    await importCsv(keeper, text).expect(201);
    const rows = (await http().get('/api/animals').query({ sort: 'label' }).set('Authorization', keeper.bearer).expect(200)).body.items as AnimalSummary[];
    expect(rows.map((r) => [r.label, r.species.scientificName, r.enclosure])).toEqual([
      ['HW-1', 'Tliltocatl vagans', 'A1'],
      ['HW-2', 'Tliltocatl vagans', 'A2'],
      ['HW-3', 'Caribena versicolor', 'A3'],
      ['HW-4', 'Caribena versicolor', 'quoted, enclosure'],
    ]);
    const hw3 = await http().get(`/api/animals/${rows[2].id}`).set('Authorization', keeper.bearer).expect(200);
    expect(hw3.body.notes).toBe('two\r\nlines');
  });

  it('accepts a text/csv body as well as a multipart file', async () => {
    const keeper = await registerKeeper(t.app, 'Body Sender');
    await http()
      .post('/api/animals/import')
      .set('Authorization', keeper.bearer)
      .set('Content-Type', 'text/csv')
      .send('label,species,sex\nTB-1,Poecilotheria regalis,female\n')
      .expect(201);
    expect(await labels(keeper)).toEqual(['TB-1']);
  });

  it('is all or nothing: one bad row imports nothing and every bad row is named by its line', async () => {
    const keeper = await registerKeeper(t.app, 'Careful');
    await createAnimal(t.app, keeper, { speciesId: vagans, label: 'OLD-1', sex: 'female' });
    const text = [
      'label,species,sex,maturity,maturedOn,notes',
      'AN-1,Tliltocatl vagans,female,,,"a note over\ntwo lines"', // lines 2–3
      'AN-2,Tliltocatl vagans,male,mature,,', // line 4: mature male without a date
      'AN-3,Not a spider,female,,,', // line 5: unknown species
      'AN-4,Tliltocatl vagans,female,,,', // line 6: fine
      'OLD-1,Tliltocatl vagans,female,,,', // line 7: label already taken
      `AN-5,Tliltocatl vagans,male,mature,${addDays(today, 5)},`, // line 8: future date
      '',
      'AN-6,Tliltocatl vagans,dragon,,,', // line 10, after a blank line: bad sex
    ].join('\n');
    const res = await importCsv(keeper, text).expect(400);
    expect(res.body.message).toMatch(/^Nothing was imported: 5 lines have problems/);
    const byLine = (line: number) => res.body.details.filter((d: { field: string }) => d.field === `line ${line}`).map((d: { message: string }) => d.message);
    expect(byLine(2)).toEqual([]);
    expect(byLine(4)).toEqual([expect.stringMatching(/^maturedOn: A mature male needs the date/)]);
    expect(byLine(5)).toEqual(['species: "Not a spider" is not a name in the catalogue.']);
    expect(byLine(6)).toEqual([]);
    expect(byLine(7)).toEqual(['label: You already have an animal labelled "OLD-1".']);
    expect(byLine(8)).toEqual([expect.stringMatching(/^maturedOn: The maturing date .* is in the future/)]);
    expect(byLine(10)).toEqual(['sex: sex must be one of: female, male, unsexed.']);
    expect(await labels(keeper)).toEqual(['OLD-1']);
  });

  it('a repeated label inside the file names the first line', async () => {
    const keeper = await registerKeeper(t.app, 'Twice');
    const res = await importCsv(keeper, 'label,species,sex\nTW-1,Tliltocatl vagans,female\nTW-1,Tliltocatl vagans,male\n').expect(400);
    expect(res.body.details).toEqual([{ field: 'line 3', message: 'label: The label "TW-1" is also on line 2.' }]);
    expect(await labels(keeper)).toEqual([]);
  });

  it('refuses unknown columns, broken quoting and non-UTF-8 with messages', async () => {
    const keeper = await registerKeeper(t.app, 'Odd Files');
    const unknown = await importCsv(keeper, 'label,species,sex,colour\nOF-1,Tliltocatl vagans,female,red\n').expect(400);
    expect(unknown.body.details).toEqual([{ field: 'line 2', message: '"colour" is not a column this import knows.' }]);
    const broken = await importCsv(keeper, 'label,species,sex\n"OF-2,Tliltocatl vagans,female\n').expect(400);
    expect(broken.body.message).toMatch(/not valid CSV/);
    const latin1 = await http()
      .post('/api/animals/import')
      .set('Authorization', keeper.bearer)
      .attach('file', Buffer.from('label,species,sex\nOF-3,Tliltocatl vagans,female,H\xe9naut\n', 'latin1'), 'old.csv')
      .expect(400);
    expect(latin1.body.message).toMatch(/not UTF-8/);
    expect(await labels(keeper)).toEqual([]);
  });
});
