import request from 'supertest';
import Papa from 'papaparse';
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import {
  PROVISIONAL_SHARES,
  type BroodCountsResponse,
  type KeptBackBatchResponse,
  type SacResponse,
  type SharesResponse,
  serverWordsFor,
} from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { projectWithRoles } from './support/projects';
import { createSac } from './support/sacs';
import { Clock } from '../src/common/clock';
import { accountScenario, type AccountScenario } from './accounts.fixtures';
import { seedDemo } from '../src/seed/demo-seed';
import { seedCollection } from '../src/seed/collection.seeder';
import { KEPT_BACK_PROJECT, seedKeptBack } from '../src/seed/kept-back.seeder';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../src/seed/demo-accounts';
import { login } from './support/users';
import { binary, pdfText } from './support/pdf';

let t: TestApp;
let owner: SignedIn;
let partner: SignedIn;
let caretaker: SignedIn;
let stranger: SignedIn;
let projectId: string;
const http = () => request(t.app.getHttpServer());
const NOW = '2025-10-20T18:00:00Z';
const pin = () => vi.spyOn(t.app.get(Clock), 'now').mockReturnValue(new Date(NOW));
const post = (who: SignedIn, path: string, body: object) => http().post(`/api/sacs${path}`).set('Authorization', who.bearer).send(body);
const get = (who: SignedIn, path: string) => http().get(`/api/sacs${path}`).set('Authorization', who.bearer);
/** Grammostola pulchripes usually lays 400–1000 eggs (docs/trade-facts.md §6, genus ranges, from memory). */
const INFERTILE = {
  openedAt: '2025-10-18T09:00:00Z',
  healthyEggs: 8,
  eggsWithLegs: 0,
  nymphs: 0,
  darkEggs: 300,
  spoiledEggs: 120,
  keptBack: 5,
};
const newSac = () => createSac(t.app, owner, projectId, { layDate: '2025-09-10', pulledAt: '2025-10-05T10:00:00Z' });
const opened = async () => {
  const sac = await newSac();
  await post(owner, `/${sac.id}/opening`, INFERTILE).expect(201);
  return sac.id;
};

beforeAll(async () => {
  t = await createTestApp();
  // The demo's dud sac first: the demo seeds only into a database without accounts.
  expect(await seedDemo(t.orm.em.fork(), [seedCollection, seedKeptBack])).toBe(true);
  ({ projectId, owner, partner, caretaker } = await projectWithRoles(t.app, t.orm, 'Kept back', ['Odile', 'Piet', 'Carla']));
  stranger = await registerKeeper(t.app, 'Stina');
});
afterEach(() => vi.restoreAllMocks());
afterAll(async () => {
  await t.close();
});

describe('an opening with eggs kept back, exact or estimated', () => {
  it('keeps the kept-back eggs out of the first count, and says "about" for an estimate', async () => {
    pin();
    const sac = await newSac();
    const res = await post(owner, `/${sac.id}/opening`, { ...INFERTILE, estimated: true }).expect(201);
    expect(res.body).toMatchObject({ viable: 8, keptBack: 5, estimated: true, total: 428, warningReason: null });
    const counts = (await get(partner, `/${sac.id}/counts`).expect(200)).body as BroodCountsResponse;
    expect(counts).toMatchObject({ current: 3, currentEstimated: true });
    expect(((await get(partner, `/${sac.id}`)).body as SacResponse).currentCountEstimated).toBe(true);
    const batch = (await get(partner, `/${sac.id}/kept-back`).expect(200)).body as KeptBackBatchResponse;
    expect(batch).toMatchObject({ eggs: 5, state: 'incubating', keptAt: '2025-10-18T09:00:00.000Z', rolls: 0, log: [] });
  });

  it('warns (422, nothing written) when the eggs are outside the species range, and keeps the acknowledged reason', async () => {
    pin();
    const sac = await newSac();
    const few = { ...INFERTILE, darkEggs: 10, spoiledEggs: 2 }; // 20 eggs, fewer than 400
    const warned = await post(owner, `/${sac.id}/opening`, few).expect(422);
    expect(warned.body.details).toEqual([expect.objectContaining({ field: 'acknowledgedWarnings', code: 'eggs-outside-species-range' })]);
    expect(warned.body.message).toContain('20 eggs and young is fewer than this species usually lays (400–1000 a sac)');
    await get(owner, `/${sac.id}/opening`).expect(404);
    await get(owner, `/${sac.id}/kept-back`).expect(404);
    const saved = await post(owner, `/${sac.id}/opening`, { ...few, acknowledgedWarnings: ['eggs-outside-species-range'], warningReason: 'Her first sac.' });
    expect(saved.status).toBe(201);
    expect(saved.body.warningReason).toBe('Her first sac.');
  });

  it('refuses more kept back than were counted viable (400, nothing written)', async () => {
    pin();
    const sac = await newSac();
    const res = await post(owner, `/${sac.id}/opening`, { ...INFERTILE, keptBack: 9 }).expect(400);
    expect(res.body.details[0]).toMatchObject({ field: 'keptBack', message: expect.stringContaining('9 kept back, but 8 counted') });
    await get(owner, `/${sac.id}/kept-back`).expect(404);
  });
});

describe('the kept-back batch', () => {
  it('has its own rolls and checks: owner and caretaker log them, the partner reads, a stranger sees nothing', async () => {
    pin();
    const sacId = await opened();
    await post(caretaker, `/${sacId}/kept-back/log`, { kind: 'roll', at: '2025-10-19T08:00:00Z' }).expect(201);
    const roll = await post(owner, `/${sacId}/kept-back/log`, { kind: 'roll', at: '2025-10-20T08:00:00Z' }).expect(201);
    await post(owner, `/${sacId}/kept-back/log`, { kind: 'check', at: '2025-10-20T08:05:00Z', note: 'Two look darker' }).expect(201);
    await post(partner, `/${sacId}/kept-back/log`, { kind: 'roll' }).expect(403);
    await post(stranger, `/${sacId}/kept-back/log`, { kind: 'roll' }).expect(404);
    await get(stranger, `/${sacId}/kept-back`).expect(404);
    // Bad input: a roll before the opening, in the future, or a strike without a reason.
    expect((await post(owner, `/${sacId}/kept-back/log`, { kind: 'roll', at: '2025-10-17T08:00:00Z' }).expect(400)).body.details[0].field).toBe('at');
    expect((await post(owner, `/${sacId}/kept-back/log`, { kind: 'roll', at: '2025-10-21T08:00:00Z' }).expect(400)).body.details[0].field).toBe('at');
    const rollId = (roll.body as KeptBackBatchResponse).log[0]!.id;
    await post(owner, `/${sacId}/kept-back/log`, { kind: 'strike', strikes: rollId }).expect(400);
    await post(caretaker, `/${sacId}/kept-back/log`, { kind: 'strike', strikes: rollId, reason: 'Logged twice' }).expect(201);
    await post(owner, `/${sacId}/kept-back/log`, { kind: 'strike', strikes: rollId, reason: 'Again' }).expect(409);
    const b = (await get(partner, `/${sacId}/kept-back`).expect(200)).body as KeptBackBatchResponse;
    expect(b.rolls).toBe(1);
    expect(b.lastRollAt).toBe('2025-10-19T08:00:00.000Z');
    expect(b.log.map((e) => [e.kind, e.struckBy !== null])).toEqual([
      ['strike', false],
      ['check', false],
      ['roll', true],
      ['roll', false],
    ]);
    // The sac's own care log is untouched: the batch keeps its own.
    expect((await get(owner, `/${sacId}/log`).expect(200)).body).toEqual({ items: [], nextCursor: null });
  });

  it('written off once, with a date and a reason: only the owner ends it; counting or logging it afterwards is 409', async () => {
    pin();
    const sacId = await opened();
    const off = { outcome: 'written-off', at: '2025-10-20T09:00:00Z', reason: 'All five turned dark.' };
    for (const who of [partner, caretaker]) await post(who, `/${sacId}/kept-back/end`, off).expect(403);
    await post(stranger, `/${sacId}/kept-back/end`, off).expect(404);
    expect((await post(owner, `/${sacId}/kept-back/end`, { ...off, reason: '' }).expect(400)).body.details[0].field).toBe('reason');
    expect((await post(owner, `/${sacId}/kept-back/end`, { ...off, joined: 2 }).expect(400)).body.details[0].field).toBe('joined');
    const ended = (await post(owner, `/${sacId}/kept-back/end`, off).expect(201)).body as KeptBackBatchResponse;
    expect(ended).toMatchObject({ state: 'written-off', endedAt: '2025-10-20T09:00:00.000Z', reason: 'All five turned dark.', joined: null });
    const again = await post(owner, `/${sacId}/kept-back/end`, { outcome: 'joined', joined: 2, reason: 'Two hatched after all' }).expect(409);
    expect(again.body.message).toBe('This batch was already written off; it ends only once.');
    await post(caretaker, `/${sacId}/kept-back/log`, { kind: 'roll' }).expect(409);
    // Written off: the brood may not grow by them.
    const grow = await post(owner, `/${sacId}/counts`, { stage: 'first-instar', alive: 4 }).expect(400);
    expect(grow.body.details[0].message).toContain('3 were alive at the last count');
  });

  it('joined into the brood: the next count may grow by that many, and not more', async () => {
    pin();
    const sacId = await opened();
    const tooMany = await post(owner, `/${sacId}/kept-back/end`, { outcome: 'joined', joined: 6, reason: 'Hatched late' }).expect(400);
    expect(tooMany.body.details[0]).toEqual({ field: 'joined', message: 'Only 5 eggs were kept back; 6 cannot have joined the brood.' });
    await post(owner, `/${sacId}/kept-back/end`, { outcome: 'joined', at: '2025-10-19T12:00:00Z' }).expect(400); // no joined, no reason
    await post(owner, `/${sacId}/kept-back/end`, { outcome: 'joined', joined: 4, at: '2025-10-19T12:00:00Z', reason: 'Hatched four days late' }).expect(201);
    // 3 at the opening + 4 joined = 7 at most.
    const over = await post(caretaker, `/${sacId}/counts`, { at: '2025-10-20T09:00:00Z', stage: 'first-instar', alive: 8 }).expect(400);
    expect(over.body.details[0].message).toContain('4 kept-back young joined the brood since (7 in all)');
    await post(caretaker, `/${sacId}/counts`, { at: '2025-10-20T09:00:00Z', stage: 'first-instar', alive: 7 }).expect(201);
    // A count dated before the batch joined may not use it.
    await post(owner, `/${sacId}/counts`, { at: '2025-10-19T10:00:00Z', stage: 'eggs', alive: 4 }).expect(400);
    // A correction of the opening may not keep back fewer than already joined.
    const first = (await get(owner, `/${sacId}/opening`)).body as { id: string };
    const fewer = await post(owner, `/${sacId}/opening`, { ...INFERTILE, keptBack: 3, corrects: first.id, reason: 'Miscounted' }).expect(400);
    expect(fewer.body.details[0].field).toBe('keptBack');
  });
});

describe('shares from an estimated count', () => {
  let s: AccountScenario;

  beforeAll(async () => {
    s = await accountScenario(t.app, t.orm, { alive: 40 });
    // The opening is an estimate of about 600 young (500 viable, 100 dark), later than the fixture's count.
    await http()
      .post(`/api/sacs/${s.sacId}/opening`)
      .set('Authorization', s.mira.bearer)
      .send({ healthyEggs: 500, eggsWithLegs: 0, nymphs: 0, darkEggs: 100, spoiledEggs: 0, keptBack: 0, estimated: true })
      .expect(201);
  });

  it('are provisional: "about" on the shares page, no cash-out until an exact count (409), then it goes through', async () => {
    const shares = (await http().get(`/api/projects/${s.projectId}/shares`).set('Authorization', s.tomasz.bearer).expect(200)).body as SharesResponse;
    expect(shares.sacs[0]).toMatchObject({ count: 500, estimated: true });
    expect(shares.sacs[0]!.explanation[0]).toBe('The sac counts about 500 young.');
    expect(shares.sacs[0]!.explanation.at(-1)).toBe(PROVISIONAL_SHARES);
    const today = new Date().toISOString().slice(0, 10);
    const cashOut = { kind: 'cash-out', date: today, memberId: s.lenaId, count: 4 };
    const refused = await http().post(`/api/projects/${s.projectId}/entries`).set('Authorization', s.mira.bearer).send(cashOut).expect(409);
    const layDate = shares.sacs[0]!.layDate;
    expect(refused.body.message).toBe(
      `The count of the sac laid ${layDate} is an estimate (about 500 young). Record an exact count first: a cash-out pays for a number of young, so it needs one.`,
    );
    const balances = await http().get(`/api/projects/${s.projectId}/balances`).set('Authorization', s.mira.bearer).expect(200);
    expect(balances.body).toMatchObject({ settled: false, provisional: true });
    // Statements say "about" and provisional, in the CSV and the PDF.
    const csv = await http().get(`/api/projects/${s.projectId}/statements/${s.tomaszId}.csv`).set('Authorization', s.tomasz.bearer).expect(200);
    const rows = Papa.parse<Record<string, string>>(csv.text.trimEnd(), { header: true }).data;
    // The CSV is written in the reader's words (statementCsv in the catalogue).
    const en = serverWordsFor('en');
    const [kind, count, estimated] = (['kind', 'count', 'estimated'] as const).map((c) => en(`statementCsv.column.${c}`));
    const sacRow = rows.find((r) => r[kind!] === en('statementCsv.line.sac'))!;
    expect([sacRow[count!], sacRow[estimated!]]).toEqual(['500', en('statementCsv.yes')]);
    expect(rows.find((r) => r[kind!] === en('statementCsv.line.share'))![estimated!]).toBe(en('statementCsv.yes'));
    const pdf = await http()
      .get(`/api/projects/${s.projectId}/statements/${s.tomaszId}.pdf`)
      .set('Authorization', s.tomasz.bearer)
      .buffer(true)
      .parse(binary)
      .expect(200);
    const text = await pdfText(pdf.body as Buffer);
    expect(text).toContain(`about 500 young counted, an estimate; the shares below are provisional.`);
    expect(text).toMatch(/Share: about \d+ young \(provisional/);
    // An exact count (lower than the estimate) makes the shares firm and the cash-out possible.
    await http().post(`/api/sacs/${s.sacId}/counts`).set('Authorization', s.mira.bearer).send({ stage: 'first-instar', alive: 480 }).expect(201);
    const firm = (await http().get(`/api/projects/${s.projectId}/shares`).set('Authorization', s.tomasz.bearer).expect(200)).body as SharesResponse;
    expect(firm.sacs[0]).toMatchObject({ count: 480, estimated: false });
    await http().post(`/api/projects/${s.projectId}/entries`).set('Authorization', s.mira.bearer).send(cashOut).expect(201);
  });
});

describe('the demo: an infertile sac with eggs kept back', () => {
  it('shows the partner the opening, the batch rolled by the caretaker and its write-off', async () => {
    const tomasz = await login(t.app, DEMO_ACCOUNTS.find((a) => a.key === 'partner')!.email, DEMO_PASSWORD);
    const projects = (await http().get('/api/projects').set('Authorization', tomasz.bearer).expect(200)).body as { id: string; title: string }[];
    const project = projects.find((p) => p.title === KEPT_BACK_PROJECT)!;
    const [sac] = (await http().get(`/api/projects/${project.id}/sacs`).set('Authorization', tomasz.bearer).expect(200)).body as SacResponse[];
    expect(sac).toMatchObject({ outcome: 'failed', failureReason: 'infertile', opened: true, currentCount: 0 });
    const opening = (await get(tomasz, `/${sac!.id}/opening`).expect(200)).body;
    expect(opening).toMatchObject({ darkEggs: 88, spoiledEggs: 31, keptBack: 6, viable: 6 });
    const batch = (await get(tomasz, `/${sac!.id}/kept-back`).expect(200)).body as KeptBackBatchResponse;
    expect(batch).toMatchObject({ eggs: 6, state: 'written-off', rolls: 7, reason: 'All six collapsed and turned dark; no embryo seen.' });
    expect(batch.log.filter((e) => e.kind === 'check').map((e) => e.recordedBy!.name)).toEqual(['Ines Carvalho', 'Ines Carvalho']);
  });
});
