import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CareLogEntryResponse, KeysetPage, LedgerEntryResponse } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { accountScenario, type AccountScenario } from './accounts.fixtures';
import { createSac } from './support/sacs';
import type { SignedIn } from './support/users';

/**
 * Keyset paging of a sac's care log and a project's ledger entries: pages put together are the whole
 * list in its order, each item once, also where several entries share one instant; an item added
 * meanwhile neither repeats nor shifts the next page; a cursor that is not one of the list's is a 400.
 */
let t: TestApp;
let s: AccountScenario;
let otherSacId: string;
const http = () => request(t.app.getHttpServer());
const logPath = (sacId = s.sacId) => `/api/sacs/${sacId}/log`;
const entriesPath = () => `/api/projects/${s.projectId}/entries`;

async function page<T>(path: string, who: SignedIn, query: Record<string, string | number> = {}): Promise<KeysetPage<T>> {
  const res = await http().get(path).query(query).set('Authorization', who.bearer);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body as KeysetPage<T>;
}

/** Every page of `size`, each starting after the cursor of the one before. */
async function allPages<T>(path: string, who: SignedIn, size: number): Promise<T[][]> {
  const pages: T[][] = [];
  let after: string | undefined;
  do {
    const p: KeysetPage<T> = await page<T>(path, who, { limit: size, ...(after && { after }) });
    expect(p.items.length).toBeGreaterThan(0);
    expect(p.items.length).toBeLessThanOrEqual(size);
    pages.push(p.items);
    after = p.nextCursor ?? undefined;
  } while (after);
  return pages;
}

const ids = (items: { id: string }[]) => items.map((e) => e.id);

beforeAll(async () => {
  t = await createTestApp();
  s = await accountScenario(t.app, t.orm);
  otherSacId = (await createSac(t.app, s.mira, s.projectId, { layDate: '2026-01-05' })).id;
  // Four notes at one instant (paging must break the tie) and three at other instants.
  const same = new Date(Date.now() - 3_600_000).toISOString();
  const notes: [string, string][] = [
    ['tie one', same],
    ['tie two', same],
    ['tie three', same],
    ['tie four', same],
    ['earlier', new Date(Date.now() - 7_200_000).toISOString()],
    ['later', new Date(Date.now() - 60_000).toISOString()],
    ['much earlier', new Date(Date.now() - 86_400_000).toISOString()],
  ];
  for (const [text, at] of notes) await http().post(logPath()).set('Authorization', s.mira.bearer).send({ kind: 'note', text, at }).expect(201);
  await http().post(logPath(otherSacId)).set('Authorization', s.mira.bearer).send({ kind: 'note', text: 'other sac' }).expect(201);
  // Six payments on one day: the ledger's order is the order of recording.
  for (let i = 1; i <= 6; i++)
    await http()
      .post(entriesPath())
      .set('Authorization', s.mira.bearer)
      .send({ kind: 'money', date: '2026-11-20', fromMemberId: s.miraId, toMemberId: s.tomaszId, amountMinor: 100 * i })
      .expect(201);
}, 90_000);
afterAll(async () => {
  await t.close();
});

describe('GET /api/sacs/:id/log?after=&limit=', () => {
  it('pages of 1, 2 and 3 put together are the whole log, newest first, each entry once (ties at one instant included)', async () => {
    const whole = await page<CareLogEntryResponse>(logPath(), s.tomasz);
    expect(whole.nextCursor).toBeNull();
    expect(whole.items).toHaveLength(7);
    const ats = whole.items.map((e) => e.at);
    expect([...ats].sort().reverse()).toEqual(ats);
    expect(new Set(ats).size, 'four entries share one instant').toBe(4);
    for (const size of [1, 2, 3]) {
      const pages = await allPages<CareLogEntryResponse>(logPath(), s.tomasz, size);
      expect(pages).toHaveLength(Math.ceil(7 / size));
      expect(ids(pages.flat()), `pages of ${size}`).toEqual(ids(whole.items));
    }
  });

  it('an entry added after the first page neither repeats nor shifts the next page', async () => {
    const first = await page<CareLogEntryResponse>(logPath(), s.mira, { limit: 3 });
    const rest = ids((await page<CareLogEntryResponse>(logPath(), s.mira)).items).slice(3);
    await http().post(logPath()).set('Authorization', s.mira.bearer).send({ kind: 'note', text: 'meanwhile' }).expect(201);
    const next = await page<CareLogEntryResponse>(logPath(), s.mira, { after: first.nextCursor! });
    expect(ids(next.items)).toEqual(rest);
  });

  it('an entry struck by a strike on another page still shows as struck', async () => {
    const whole = (await page<CareLogEntryResponse>(logPath(), s.mira)).items;
    const oldest = whole[whole.length - 1];
    await http().post(logPath()).set('Authorization', s.mira.bearer).send({ kind: 'strike', strikes: oldest.id, reason: 'wrong sac' }).expect(201);
    const pages = await allPages<CareLogEntryResponse>(logPath(), s.mira, 2);
    expect(pages[0][0].kind).toBe('strike');
    expect(pages.flat().find((e) => e.id === oldest.id)!.struck).toMatchObject({ reason: 'wrong sac' });
  });

  it('refuses a malformed cursor, a cursor of another sac, or a bad page size with 400 and a message', async () => {
    const otherEntry = (await page<CareLogEntryResponse>(logPath(otherSacId), s.mira)).items[0];
    const otherCursor = Buffer.from(JSON.stringify({ entry: otherEntry.id })).toString('base64url');
    const ledgerCursor = (await page<LedgerEntryResponse>(entriesPath(), s.mira, { limit: 1 })).nextCursor!;
    for (const query of [
      { after: 'not a cursor!' },
      { after: 'bm90LWpzb24' },
      { after: Buffer.from('{"entry":"1"}').toString('base64url') },
      { after: otherCursor },
      { after: ledgerCursor },
      { limit: 0 },
      { limit: 201 },
      { limit: 'many' },
    ]) {
      const res = await http().get(logPath()).query(query).set('Authorization', s.mira.bearer);
      expect(res.status, JSON.stringify(query)).toBe(400);
      expect(JSON.stringify(res.body.message)).toMatch(/after|limit/);
    }
  });

  it('a stranger gets 404, whatever the cursor', async () => {
    const first = await page<CareLogEntryResponse>(logPath(), s.mira, { limit: 1 });
    await http().get(logPath()).query({ after: first.nextCursor! }).set('Authorization', s.stranger.bearer).expect(404);
  });
});

describe('GET /api/projects/:projectId/entries?after=&limit=', () => {
  it('pages put together are the whole ledger in its order, each entry once', async () => {
    const whole = await page<LedgerEntryResponse>(entriesPath(), s.tomasz);
    expect(whole.nextCursor).toBeNull();
    expect(whole.items.map((e) => e.seq)).toEqual([1, 2, 3, 4, 5, 6]);
    for (const size of [1, 4, 6]) {
      const pages = await allPages<LedgerEntryResponse>(entriesPath(), s.tomasz, size);
      expect(pages).toHaveLength(Math.ceil(6 / size));
      expect(ids(pages.flat()), `pages of ${size}`).toEqual(ids(whole.items));
    }
  });

  it('refuses a malformed cursor or a care-log cursor with 400; a caretaker gets 403', async () => {
    const logCursor = (await page<CareLogEntryResponse>(logPath(), s.mira, { limit: 1 })).nextCursor!;
    for (const after of ['%%%', Buffer.from('{"seq":-1}').toString('base64url'), Buffer.from('{"seq":999999}').toString('base64url'), logCursor]) {
      const res = await http().get(entriesPath()).query({ after }).set('Authorization', s.mira.bearer);
      expect(res.status, after).toBe(400);
    }
    await http().get(entriesPath()).query({ limit: 2 }).set('Authorization', s.caretaker.bearer).expect(403);
  });
});
