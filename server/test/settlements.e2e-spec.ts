/**
 * Settlement payments through the real Stripe SDK against the local payment fake
 * (scripts/payment-fake): payout account onboarding, a destination-charge checkout, the signed
 * webhook (valid, bad signature, stale timestamp, redelivery of the same event).
 */
import type { AddressInfo } from 'node:net';
import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BalancesResponse, CheckoutResponse, LedgerEntryResponse, PayoutAccountResponse, KeysetPage } from '@broodsilk/shared';
import type { PaymentFake } from '../../scripts/payment-fake/server.mjs';
import { createTestApp, type TestApp } from './support/test-app';
import { accountScenario, api, type AccountScenario } from './accounts.fixtures';

const SECRET_KEY = 'sk_test_broodsilk_settlements_0123';
const WEBHOOK_SECRET = 'whsec_broodsilk_settlements_abcdef';

let fake: PaymentFake;
let t: TestApp;
let s: AccountScenario;
let stripe: Stripe;
let webhookUrl: string;
const savedEnv = { ...process.env };

/** The form holding the button labelled `label` on one of the fake's pages. */
function formAction(html: string, label: string): { action: string; fields: URLSearchParams } {
  for (const m of html.matchAll(/<form\b[^>]*>[\s\S]*?<\/form>/g)) {
    if (!m[0].includes(`>${label}</button>`)) continue;
    const action = /action="([^"]+)"/.exec(m[0])![1]!.replaceAll('&amp;', '&');
    const fields = new URLSearchParams();
    for (const input of m[0].matchAll(/<input type="hidden" name="([^"]+)" value="([^"]*)">/g)) fields.append(input[1]!, input[2]!);
    return { action, fields };
  }
  throw new Error(`no form with a "${label}" button`);
}

async function press(pageUrl: string, label: string): Promise<Response> {
  const page = await fetch(pageUrl, { redirect: 'manual' });
  expect(page.status).toBe(200);
  const { action, fields } = formAction(await page.text(), label);
  return fetch(new URL(action, fake.url), { method: 'POST', body: fields, redirect: 'manual' });
}

beforeAll(async () => {
  const { startPaymentFake } = await import('../../scripts/payment-fake/server.mjs');
  fake = await startPaymentFake({ secretKey: SECRET_KEY, webhookSecret: WEBHOOK_SECRET, port: 0, retryDelaysMs: [20, 40] });
  // The config is read at module init, so the environment is set before the app is made.
  Object.assign(process.env, {
    STRIPE_SECRET_KEY: SECRET_KEY,
    STRIPE_WEBHOOK_SECRET: WEBHOOK_SECRET,
    STRIPE_API_HOST: '127.0.0.1',
    STRIPE_API_PORT: String(fake.port),
    STRIPE_API_PROTOCOL: 'http',
  });
  t = await createTestApp();
  await t.app.listen(0, '127.0.0.1');
  webhookUrl = `http://127.0.0.1:${(t.app.getHttpServer().address() as AddressInfo).port}/api/webhooks/payments`;
  fake.setWebhookUrl(webhookUrl);
  stripe = new Stripe(SECRET_KEY, { host: '127.0.0.1', port: fake.port, protocol: 'http' });
  s = await accountScenario(t.app, t.orm);
  // Tomasz cashes out 4 young at EUR 5.00: Mira owes him EUR 20.00.
  await api(t.app)
    .post(`/api/projects/${s.projectId}/entries`)
    .set('Authorization', s.mira.bearer)
    .send({ kind: 'cash-out', date: '2026-11-20', memberId: s.tomaszId, count: 4 })
    .expect(201);
}, 90_000);

afterAll(async () => {
  await t?.close();
  await fake?.close();
  for (const k of ['STRIPE_SECRET_KEY', 'STRIPE_WEBHOOK_SECRET', 'STRIPE_API_HOST', 'STRIPE_API_PORT', 'STRIPE_API_PROTOCOL']) {
    if (savedEnv[k] === undefined) delete process.env[k];
    else process.env[k] = savedEnv[k];
  }
});

const payout = async (who = s.tomasz) =>
  (await api(t.app).get('/api/settlements/payout-account').set('Authorization', who.bearer).expect(200)).body as PayoutAccountResponse;
const checkout = (amountMinor: number, who = s.mira, toMemberId = s.tomaszId) =>
  api(t.app).post(`/api/projects/${s.projectId}/settlements/checkout`).set('Authorization', who.bearer).send({ toMemberId, amountMinor });
/** An event signed with our own webhook secret, as someone who learnt it could sign one. */
const signedEvent = (id: string, object: Record<string, unknown>) => {
  const payload = JSON.stringify({ id, object: 'event', type: 'checkout.session.completed', data: { object } });
  const signature = stripe.webhooks.generateTestHeaderString({ payload, secret: WEBHOOK_SECRET });
  return fetch(webhookUrl, { method: 'POST', headers: { 'content-type': 'application/json', 'stripe-signature': signature }, body: payload });
};
const moneyEntries = async () =>
  (
    (await api(t.app).get(`/api/projects/${s.projectId}/entries`).set('Authorization', s.mira.bearer).expect(200)).body as KeysetPage<LedgerEntryResponse>
  ).items.filter((e) => e.kind === 'money');

describe('payout account', () => {
  it('cannot be paid before linking a payout account', async () => {
    const res = await checkout(2000);
    expect(res.status).toBe(409);
    expect(res.body.message).toBe(
      'Tomasz Partner has not linked a payout account yet, so they cannot be paid here. Pay them another way and record the payment.',
    );
  });

  it('links an express account, then onboarding on the provider enables charges (account.updated webhook)', async () => {
    expect(await payout()).toMatchObject({ linked: false, chargesEnabled: false });
    await api(t.app).post('/api/settlements/payout-account').set('Authorization', s.tomasz.bearer).send({ country: 'Germany' }).expect(400);
    const res = await api(t.app).post('/api/settlements/payout-account').set('Authorization', s.tomasz.bearer).send({ country: 'DE' }).expect(201);
    const linked = res.body as PayoutAccountResponse;
    expect(linked).toMatchObject({ linked: true, chargesEnabled: false });
    expect(linked.accountId).toMatch(/^acct_/);
    expect(linked.onboardingUrl).toContain(fake.url);
    const account = await stripe.accounts.retrieve(linked.accountId!);
    expect(account.type).toBe('express');
    expect((await checkout(2000)).status).toBe(409); // onboarding not finished

    expect((await press(linked.onboardingUrl!, 'Complete test onboarding')).status).toBe(303);
    await fake.whenDeliveriesSettled();
    expect(await payout()).toMatchObject({ linked: true, chargesEnabled: true, payoutsEnabled: true, detailsSubmitted: true });
  });
});

describe('checkout and webhook', () => {
  let session: CheckoutResponse;

  it('refuses more than is owed, and a payee who is owed nothing', async () => {
    const over = await checkout(2500);
    expect(over.status).toBe(409);
    expect(over.body.message).toBe('You owe Tomasz Partner EUR 20.00; EUR 25.00 is EUR 5.00 more than that.');
    const reverse = await checkout(100, s.tomasz, s.miraId);
    expect(reverse.status).toBe(409);
  });

  it('a signed event claiming a payment the provider has not seen records nothing; an unknown session is acknowledged and ignored', async () => {
    const unpaid = (await checkout(2000).expect(201)).body as CheckoutResponse;
    // The provider's API is the source of truth (Stripe docs, "Fulfill orders": retrieve the Checkout Session).
    let res = await signedEvent('evt_forged_unpaid', { id: unpaid.sessionId, payment_status: 'paid', amount_total: 2000, currency: 'eur' });
    expect(res.status).toBe(200);
    expect(await moneyEntries()).toEqual([]);
    res = await signedEvent('evt_forged_unknown', { id: 'cs_test_not_ours', payment_status: 'paid', amount_total: 2000, currency: 'eur' });
    expect(res.status).toBe(200);
    expect(await moneyEntries()).toEqual([]);
  });

  it('a destination charge to the creditor; paying it records one money entry from the webhook', async () => {
    const res = await checkout(2000);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    session = res.body as CheckoutResponse;
    expect(session).toMatchObject({ amountMinor: 2000, currency: 'EUR' });
    expect(session.url).toBe(`${fake.url}/pay/${session.sessionId}`);
    const stored = await stripe.checkout.sessions.retrieve(session.sessionId);
    expect(stored.amount_total).toBe(2000);
    expect(stored.currency).toBe('eur');

    expect((await press(session.url, 'Pay (test)')).status).toBe(303);
    await fake.whenDeliveriesSettled();
    const paid = await stripe.checkout.sessions.retrieve(session.sessionId);
    const intent = await stripe.paymentIntents.retrieve(paid.payment_intent as string);
    expect(intent.transfer_data?.destination).toBe((await payout()).accountId); // the money reaches Tomasz, not the platform

    const money = await moneyEntries();
    expect(money).toHaveLength(1);
    expect(money[0]).toMatchObject({
      source: 'payment-provider',
      amountMinor: 2000,
      currency: 'EUR',
      status: 'in-force',
      from: { memberId: s.miraId },
      to: { memberId: s.tomaszId },
      recordedBy: null,
    });
    const b = (await api(t.app).get(`/api/projects/${s.projectId}/balances`).set('Authorization', s.tomasz.bearer).expect(200)).body as BalancesResponse;
    expect(b.debts).toEqual([]);
  });

  it('a second delivery of the same event records nothing', async () => {
    const events = (await (await fetch(`${fake.url}/_fake/events`)).json()) as { events: { id: string; type: string; data: { object: { id: string } } }[] };
    const completed = events.events.find((e) => e.type === 'checkout.session.completed' && e.data.object.id === session.sessionId)!;
    const redo = await fetch(`${fake.url}/_fake/redeliver/${completed.id}`, { method: 'POST' });
    expect(redo.status).toBeLessThan(300);
    await fake.whenDeliveriesSettled();
    const last = fake.state.deliveries.filter((d) => d.eventId === completed.id).at(-1)!;
    expect(last).toMatchObject({ redelivery: true, status: 200, ok: true });
    expect(await moneyEntries()).toHaveLength(1);
  });

  it('a signed event with another amount for a session already paid records nothing more', async () => {
    const res = await signedEvent('evt_forged_amount', { id: session.sessionId, payment_status: 'paid', amount_total: 500000, currency: 'usd' });
    expect(res.status).toBe(200);
    const money = await moneyEntries();
    expect(money).toHaveLength(1);
    expect(money[0]).toMatchObject({ amountMinor: 2000, currency: 'EUR' });
  });

  it('a bad signature or a stale timestamp is refused with 400 and records nothing', async () => {
    const payload = JSON.stringify({
      id: 'evt_forged_1',
      object: 'event',
      type: 'checkout.session.completed',
      data: { object: { id: session.sessionId, payment_status: 'paid', amount_total: 2000, currency: 'eur' } },
    });
    const send = (signature: string) =>
      fetch(webhookUrl, { method: 'POST', headers: { 'content-type': 'application/json', 'stripe-signature': signature }, body: payload });
    const wrongSecret = stripe.webhooks.generateTestHeaderString({ payload, secret: 'whsec_not_ours_at_all' });
    let res = await send(wrongSecret);
    expect(res.status).toBe(400);
    expect(((await res.json()) as { message: string }).message).toMatch(/signature could not be verified/);
    // Signed with our secret, but an hour old: outside the SDK's default 300 s tolerance.
    const stale = stripe.webhooks.generateTestHeaderString({ payload, secret: WEBHOOK_SECRET, timestamp: Math.floor(Date.now() / 1000) - 3600 });
    res = await send(stale);
    expect(res.status).toBe(400);
    expect(((await res.json()) as { message: string }).message).toMatch(/tolerance/i);
    res = await fetch(webhookUrl, { method: 'POST', headers: { 'content-type': 'application/json' }, body: payload });
    expect(res.status).toBe(400);
    expect(await moneyEntries()).toHaveLength(1);
    const [{ n }] = await t.orm.em.getConnection().execute(`select count(*)::int as n from payment_events where id = 'evt_forged_1'`);
    expect(n).toBe(0);
  });

  it('the route is open without a session but every settlement route needs one', async () => {
    await api(t.app).get('/api/settlements/payout-account').expect(401);
    await api(t.app).post(`/api/projects/${s.projectId}/settlements/checkout`).send({ toMemberId: s.tomaszId, amountMinor: 1 }).expect(401);
    await api(t.app)
      .post(`/api/projects/${s.projectId}/settlements/checkout`)
      .set('Authorization', s.caretaker.bearer)
      .send({ toMemberId: s.tomaszId, amountMinor: 1 })
      .expect(403);
    await api(t.app)
      .post(`/api/projects/${s.projectId}/settlements/checkout`)
      .set('Authorization', s.stranger.bearer)
      .send({ toMemberId: s.tomaszId, amountMinor: 1 })
      .expect(404);
  });
});
