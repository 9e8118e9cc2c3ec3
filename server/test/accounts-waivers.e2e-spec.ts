/**
 * The owner alone cannot waive a partner's claim: a cash-out or sale of a partner's young below
 * the price in the terms (EUR 5.00 a spiderling here) waits for that partner's acceptance, the
 * same way a payment waits for its payee. At or above the price it counts at once.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BalancesResponse, LedgerEntryResponse, PartyBalanceView } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { accountScenario, api, type AccountScenario } from './accounts.fixtures';

let t: TestApp;
let s: AccountScenario;

beforeAll(async () => {
  t = await createTestApp();
  s = await accountScenario(t.app, t.orm);
});
afterAll(async () => t?.close());

const D = '2026-11-20';
const tomaszBalance = async (): Promise<PartyBalanceView> =>
  ((await api(t.app).get(`/api/projects/${s.projectId}/balances`).set('Authorization', s.mira.bearer).expect(200)).body as BalancesResponse).parties.find(
    (p) => p.memberId === s.tomaszId,
  )!;
const record = async (body: object): Promise<LedgerEntryResponse> => {
  const res = await api(t.app).post(`/api/projects/${s.projectId}/entries`).set('Authorization', s.mira.bearer).send(body);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body as LedgerEntryResponse;
};
const confirm = (id: string, who = s.tomasz) => api(t.app).post(`/api/projects/${s.projectId}/entries/${id}/confirm`).set('Authorization', who.bearer).send({});

describe('a cash-out below the price in the terms', () => {
  it('at price 0 does not count until the partner accepts it; the owner cannot accept it for him', async () => {
    const before = await tomaszBalance();
    expect(before).toMatchObject({ cashedOut: 0, owedSpiderlings: 17 });
    const waived = await record({ kind: 'cash-out', date: D, memberId: s.tomaszId, count: 5, pricePerSpiderlingMinor: 0 });
    expect(waived).toMatchObject({ status: 'awaiting-confirmation', awaitingConfirmationBy: { memberId: s.tomaszId } });
    expect(await tomaszBalance()).toEqual(before);

    const byOwner = await confirm(waived.id, s.mira);
    expect(byOwner.status).toBe(403);
    expect(byOwner.body.message).toBe('Only the party whose young these were confirms this.');
    expect((await confirm(waived.id, s.stranger)).status).toBe(404);
    expect(await tomaszBalance()).toEqual(before);

    expect((await confirm(waived.id)).status).toBe(201);
    expect(await tomaszBalance()).toMatchObject({ cashedOut: 5, owedSpiderlings: 12 });
    const again = await confirm(waived.id);
    expect(again.status).toBe(409);
    expect(again.body.message).toBe('This cash-out already counts; there is nothing to confirm.');
  });

  it('at the price in the terms counts at once and has nothing to accept', async () => {
    const full = await record({ kind: 'cash-out', date: D, memberId: s.tomaszId, count: 1 });
    expect(full).toMatchObject({ status: 'in-force', awaitingConfirmationBy: null });
    expect(await tomaszBalance()).toMatchObject({ cashedOut: 6, owedSpiderlings: 11 });
    expect((await confirm(full.id)).status).toBe(409);
  });
});

describe('a sale below the price in the terms', () => {
  it('waits for the partner: 2 young for EUR 9.99 is under 2 × EUR 5.00', async () => {
    const cheap = await record({ kind: 'sale', date: D, memberId: s.tomaszId, count: 2, priceMinor: 999 });
    expect(cheap).toMatchObject({ status: 'awaiting-confirmation', awaitingConfirmationBy: { memberId: s.tomaszId } });
    expect(await tomaszBalance()).toMatchObject({ sold: 0, owedSpiderlings: 11 });
    expect((await confirm(cheap.id)).status).toBe(201);
    expect(await tomaszBalance()).toMatchObject({ sold: 2, salesMinor: 999, owedSpiderlings: 9 });
  });

  it('for a party without an account, the owner records it and it counts, as for payments', async () => {
    const lena = await record({ kind: 'sale', date: D, memberId: s.lenaId, count: 1, priceMinor: 0 });
    expect(lena).toMatchObject({ status: 'in-force', awaitingConfirmationBy: null });
  });
});
