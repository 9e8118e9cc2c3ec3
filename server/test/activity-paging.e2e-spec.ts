import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ActivityEventResponse } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { accountScenario, type AccountScenario } from './accounts.fixtures';
import type { SignedIn } from './support/users';

/** Keyset paging of a project's timeline: pages follow each other without repeats or gaps. */
let t: TestApp;
let s: AccountScenario;
const http = () => request(t.app.getHttpServer());
const timeline = async (who: SignedIn, query: Record<string, string | number> = {}) =>
  (await http().get(`/api/projects/${s.projectId}/activity`).query(query).set('Authorization', who.bearer).expect(200)).body as ActivityEventResponse[];

/** Every page of `size`, each starting after the last event of the one before. */
async function allPages(who: SignedIn, size: number): Promise<ActivityEventResponse[][]> {
  const pages: ActivityEventResponse[][] = [];
  for (let before: string | undefined; ;) {
    const page = await timeline(who, { limit: size, ...(before && { before }) });
    if (!page.length) return pages;
    expect(page.length).toBeLessThanOrEqual(size);
    pages.push(page);
    before = page[page.length - 1].id;
  }
}

beforeAll(async () => {
  t = await createTestApp();
  s = await accountScenario(t.app, t.orm);
  // Three notes at the same instant, so paging must break ties, and two at other times.
  const same = new Date(Date.now() - 3_600_000).toISOString();
  for (const [text, at] of [
    ['tie one', same],
    ['tie two', same],
    ['tie three', same],
    ['earlier', new Date(Date.now() - 7_200_000).toISOString()],
    ['later', new Date(Date.now() - 60_000).toISOString()],
  ])
    await http().post(`/api/sacs/${s.sacId}/log`).set('Authorization', s.mira.bearer).send({ kind: 'note', text, at }).expect(201);
});
afterAll(async () => {
  await t.close();
});

describe('GET /api/projects/:projectId/activity?before=&limit=', () => {
  it('pages of 2 put together are the whole timeline, in order, each event once', async () => {
    const whole = await timeline(s.mira);
    expect(whole.length).toBeGreaterThan(6);
    for (const size of [1, 2, 3]) {
      const pages = await allPages(s.mira, size);
      expect(
        pages.flat().map((e) => e.id),
        `pages of ${size}`,
      ).toEqual(whole.map((e) => e.id));
    }
    const ats = whole.map((e) => e.at);
    expect([...ats].sort().reverse()).toEqual(ats);
  });

  it('an event added after the first page neither repeats nor shifts the next page', async () => {
    const first = await timeline(s.mira, { limit: 3 });
    const rest = (await timeline(s.mira)).slice(3).map((e) => e.id);
    await http().post(`/api/sacs/${s.sacId}/log`).set('Authorization', s.mira.bearer).send({ kind: 'note', text: 'meanwhile' }).expect(201);
    const next = await timeline(s.mira, { before: first[2].id });
    expect(next.map((e) => e.id)).toEqual(rest);
  });

  it('a caretaker pages through only what a caretaker may see, and cannot start after a hidden event', async () => {
    const mine = await timeline(s.caretaker);
    expect((await allPages(s.caretaker, 2)).flat().map((e) => e.id)).toEqual(mine.map((e) => e.id));
    const hidden = (await timeline(s.mira)).find((e) => !mine.some((m) => m.id === e.id));
    expect(hidden, 'the fixture has a partners-only event (the terms)').toBeDefined();
    await http().get(`/api/projects/${s.projectId}/activity`).query({ before: hidden!.id }).set('Authorization', s.caretaker.bearer).expect(404);
  });

  it('refuses a malformed cursor or page size with 400', async () => {
    for (const query of [{ before: 'not-an-id' }, { limit: 0 }, { limit: 201 }, { limit: 'many' }]) {
      const res = await http().get(`/api/projects/${s.projectId}/activity`).query(query).set('Authorization', s.mira.bearer);
      expect(res.status, JSON.stringify(query)).toBe(400);
    }
  });
});
