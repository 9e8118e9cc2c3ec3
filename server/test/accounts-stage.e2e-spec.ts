/** The project reaches stage `shares-settled` exactly when nothing is owed (the accounts module's stage fact). */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BalancesResponse, LedgerEntryResponse, ProjectResponse, KeysetPage } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { accountScenario, api, type AccountScenario } from './accounts.fixtures';

let t: TestApp;
let s: AccountScenario;
const D = '2026-11-25';

beforeAll(async () => {
  t = await createTestApp();
  // 4 young: Tomasz 2 fixed, then 2 by 2:1:1 → quotas 1, 1/2, 1/2; the tie goes to the earlier pick → Mira 1, Tomasz 3, Lena 0.
  s = await accountScenario(t.app, t.orm, { alive: 4 });
  for (const stage of ['eggs-with-legs', 'first-instar']) {
    const res = await api(t.app).post(`/api/sacs/${s.sacId}/log`).set('Authorization', s.mira.bearer).send({ kind: 'stage', stage });
    if (res.status !== 201) throw new Error(`stage log answered ${res.status}: ${JSON.stringify(res.body)}`);
  }
}, 90_000);
afterAll(async () => t?.close());

const stage = async () =>
  ((await api(t.app).get(`/api/projects/${s.projectId}`).set('Authorization', s.tomasz.bearer).expect(200)).body as ProjectResponse).stage.stage;
const post = async (body: object, who = s.mira) => {
  const res = await api(t.app).post(`/api/projects/${s.projectId}/entries`).set('Authorization', who.bearer).send(body);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body as LedgerEntryResponse;
};

describe('stage shares-settled', () => {
  it('stays at brood while young or money are owed or a hand-over is unconfirmed, and reaches shares-settled when nothing is', async () => {
    const b = (await api(t.app).get(`/api/projects/${s.projectId}/balances`).set('Authorization', s.mira.bearer).expect(200)).body as BalancesResponse;
    expect(b.parties.map((p) => p.share)).toEqual([1, 3, 0]);
    expect(await stage()).toBe('brood');

    const handOver = await post({ kind: 'hand-over', date: D, memberId: s.tomaszId, count: 2, method: 'pick-up' });
    await post({ kind: 'cash-out', date: D, memberId: s.tomaszId, count: 1 });
    expect(await stage()).toBe('brood'); // young all out, but Mira owes Tomasz EUR 5.00

    const paid = await post({ kind: 'money', date: D, fromMemberId: s.miraId, toMemberId: s.tomaszId, amountMinor: 500 });
    expect(await stage()).toBe('brood'); // waiting for Tomasz to confirm
    await api(t.app).post(`/api/projects/${s.projectId}/entries/${paid.id}/confirm`).set('Authorization', s.tomasz.bearer).send({}).expect(201);
    expect(await stage()).toBe('brood'); // the hand-over is not settled before Tomasz confirms it arrived
    const balances = async () =>
      (await api(t.app).get(`/api/projects/${s.projectId}/balances`).set('Authorization', s.mira.bearer).expect(200)).body as BalancesResponse;
    expect((await balances()).settled).toBe(false);
    await api(t.app)
      .post(`/api/projects/${s.projectId}/entries/${handOver.id}/confirm`)
      .set('Authorization', s.tomasz.bearer)
      .send({ arrivedAlive: 2, arrivedDead: 0 })
      .expect(201);
    expect(await stage()).toBe('shares-settled');
    expect((await balances()).settled).toBe(true);

    await post({ kind: 'correction', date: D, reversesId: paid.id, reason: 'the transfer bounced' });
    expect(await stage()).toBe('brood');
  });

  it('refuses an entry or a confirmation dated after the recorder’s today (400), writing nothing', async () => {
    const before = ((await api(t.app).get(`/api/projects/${s.projectId}/entries`).set('Authorization', s.mira.bearer).expect(200)).body as KeysetPage<unknown>)
      .items.length;
    const tomorrow = new Date(Date.now() + 2 * 86_400_000).toISOString().slice(0, 10);
    const res = await api(t.app)
      .post(`/api/projects/${s.projectId}/entries`)
      .set('Authorization', s.mira.bearer)
      .send({ kind: 'hand-over', date: tomorrow, memberId: s.tomaszId, count: 1, method: 'pick-up' })
      .expect(400);
    expect(res.body.message).toMatch(
      new RegExp(`^The hand-over date ${tomorrow} is after today \\(\\d{4}-\\d{2}-\\d{2} where you are\\); record it once it has happened\\.$`),
    );
    expect(
      ((await api(t.app).get(`/api/projects/${s.projectId}/entries`).set('Authorization', s.mira.bearer).expect(200)).body as KeysetPage<unknown>).items.length,
    ).toBe(before);
  });
});
