/** Today lists every to-do for whom it concerns: terms to accept, hand-overs to confirm, payments owed either way. */
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { DashboardResponse } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { createProject } from './support/projects';
import { accountScenario, api, standardTerms, type AccountScenario } from './accounts.fixtures';
import type { SignedIn } from './support/users';

let t: TestApp;
let s: AccountScenario;
const D = '2026-11-20';
const today = async (who: SignedIn) =>
  ((await api(t.app).get('/api/dashboard').set('Authorization', who.bearer).expect(200)).body as DashboardResponse).dueToday;
const post = (body: object) => api(t.app).post(`/api/projects/${s.projectId}/entries`).set('Authorization', s.mira.bearer).send(body).expect(201);

beforeAll(async () => {
  t = await createTestApp();
  s = await accountScenario(t.app, t.orm);
}, 90_000);
afterAll(async () => t?.close());

describe('to-dos on Today, per role', () => {
  it('nothing to do in a settled start: no terms waiting, no hand-over, no money', async () => {
    for (const who of [s.mira, s.tomasz, s.caretaker]) expect(await today(who)).toMatchObject({ termsToAccept: [], handOversToConfirm: [], payments: [] });
  });

  it('a proposed terms version waits for the partner’s acceptance, not the owner’s', async () => {
    await api(t.app)
      .post(`/api/projects/${s.projectId}/terms`)
      .set('Authorization', s.mira.bearer)
      .send(standardTerms(s, { pricePerSpiderlingMinor: 600 }))
      .expect(201);
    expect((await today(s.tomasz)).termsToAccept).toEqual([{ projectId: s.projectId, projectTitle: 'Account test project', version: 2 }]);
    expect((await today(s.mira)).termsToAccept).toEqual([]);
    expect((await today(s.caretaker)).termsToAccept).toEqual([]);
    await api(t.app).post(`/api/projects/${s.projectId}/terms/2/accept`).set('Authorization', s.tomasz.bearer).send({}).expect(200);
    expect((await today(s.tomasz)).termsToAccept).toEqual([]);
  });

  it('a hand-over waits for the recipient’s confirmation (the owner’s for a party without an account), then leaves Today', async () => {
    const toTomasz = (await post({ kind: 'hand-over', date: D, memberId: s.tomaszId, count: 5, method: 'pick-up' })).body as { id: string };
    const toLena = (await post({ kind: 'hand-over', date: D, memberId: s.lenaId, count: 2, method: 'pick-up' })).body as { id: string };
    expect((await today(s.tomasz)).handOversToConfirm).toEqual([
      { projectId: s.projectId, projectTitle: 'Account test project', entryId: toTomasz.id, date: D, count: 5, partyName: 'Tomasz Partner', mine: true },
    ]);
    expect((await today(s.mira)).handOversToConfirm.map((h) => [h.entryId, h.partyName, h.mine])).toEqual([[toLena.id, 'Lena Outside', false]]);
    expect((await today(s.caretaker)).handOversToConfirm).toEqual([]);
    await api(t.app)
      .post(`/api/projects/${s.projectId}/entries/${toTomasz.id}/confirm`)
      .set('Authorization', s.tomasz.bearer)
      .send({ arrivedAlive: 5, arrivedDead: 0 })
      .expect(201);
    expect((await today(s.tomasz)).handOversToConfirm).toEqual([]);
  });

  it('money owed shows for both sides: owed by the owner, owed to the partner; never to the caretaker', async () => {
    await post({ kind: 'cash-out', date: D, memberId: s.tomaszId, count: 3 }); // 3 × EUR 5.00: version 2 still waits for Lena
    const base = { projectId: s.projectId, projectTitle: 'Account test project', amountMinor: 1500, currency: 'EUR' };
    expect((await today(s.mira)).payments).toEqual([{ ...base, direction: 'owed-by-me', otherName: 'Tomasz Partner' }]);
    expect((await today(s.tomasz)).payments).toEqual([{ ...base, direction: 'owed-to-me', otherName: 'Mira Keeper' }]);
    expect((await today(s.caretaker)).payments).toEqual([]);
  });

  it('gathers the facts with a fixed number of SQL queries, however many projects the viewer has', async () => {
    const connection = t.orm.em.getConnection();
    const count = async () => {
      const spy = vi.spyOn(connection, 'execute');
      await today(s.mira);
      const n = spy.mock.calls.length;
      spy.mockRestore();
      return n;
    };
    const before = await count();
    expect(before).toBeGreaterThan(0);
    for (let i = 0; i < 3; i += 1) await createProject(t.app, t.orm, s.mira, { title: `More ${i}` });
    expect(await count()).toBe(before);
  });
});
