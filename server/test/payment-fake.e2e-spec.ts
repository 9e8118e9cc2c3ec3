/**
 * The local payment provider fake (scripts/payment-fake) driven by the real
 * Stripe SDK, built through the server's own client factory. No database.
 */
import { spawn } from 'node:child_process';
import { createHmac, timingSafeEqual } from 'node:crypto';
import { createServer, type IncomingHttpHeaders, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { createInterface } from 'node:readline';
import { fileURLToPath } from 'node:url';
import { ConfigModule } from '@nestjs/config';
import { Test } from '@nestjs/testing';
import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { paymentsConfig, readPaymentsConfig } from '../src/config/payments.config';
import { STRIPE_CLIENT, createStripeClient, stripeClientOptions, stripeClientProvider } from '../src/payments/stripe.client';
import type { PaymentFake } from '../../scripts/payment-fake/server.mjs';

const SECRET_KEY = 'sk_test_broodsilk_fake_0123456789';
const WEBHOOK_SECRET = 'whsec_broodsilk_fake_abcdefghijklmnop';
const APP = 'https://app.broodsilk.test';

// ---- a webhook endpoint of our own ------------------------------------------

interface Received {
  headers: IncomingHttpHeaders;
  raw: string;
  json: { id: string; type: string; data: { object: Record<string, unknown> } };
}

class WebhookReceiver {
  readonly received: Received[] = [];
  /** Statuses to answer, one per request, before falling back to 200. */
  replies: number[] = [];
  private waiters: { match: (r: Received) => boolean; resolve: (r: Received) => void }[] = [];
  private server!: Server;
  url = '';

  async start(): Promise<void> {
    this.server = createServer((req, res) => {
      const chunks: Buffer[] = [];
      req.on('data', (c: Buffer) => chunks.push(c));
      req.on('end', () => {
        const raw = Buffer.concat(chunks).toString('utf8');
        const item: Received = { headers: req.headers, raw, json: JSON.parse(raw) };
        this.received.push(item);
        res.statusCode = this.replies.shift() ?? 200;
        res.end('{"received":true}');
        this.waiters = this.waiters.filter((w) => {
          if (!w.match(item)) return true;
          w.resolve(item);
          return false;
        });
      });
    });
    await new Promise<void>((resolve) => this.server.listen(0, '127.0.0.1', resolve));
    this.url = `http://127.0.0.1:${(this.server.address() as AddressInfo).port}/api/payments/webhook`;
  }

  /** The n-th (1-based) delivery that matches, now or when it arrives. */
  waitFor(match: (r: Received) => boolean, nth = 1): Promise<Received> {
    const seen = this.received.filter(match);
    if (seen.length >= nth) return Promise.resolve(seen[nth - 1]);
    let skip = nth - 1 - seen.length;
    return new Promise((resolve) =>
      this.waiters.push({
        match: (r) => match(r) && skip-- <= 0,
        resolve,
      }),
    );
  }

  close(): Promise<void> {
    return new Promise((resolve) => this.server.close(() => resolve()));
  }
}

const isEvent = (type: string, objectId: string) => (r: Received) => r.json.type === type && r.json.data.object.id === objectId;

// ---- reading the fake's pages the way a browser would ---------------------------

/** The form holding the button labelled `label`: its action and hidden fields. */
function formWithButton(html: string, label: string): { action: string; fields: URLSearchParams } {
  for (const m of html.matchAll(/<form\b[^>]*>[\s\S]*?<\/form>/g)) {
    const form = m[0];
    if (!form.includes(`>${label}</button>`)) continue;
    expect(form).toMatch(/method="post"/);
    const action = /action="([^"]+)"/.exec(form)?.[1];
    if (!action) throw new Error(`form for "${label}" has no action`);
    const fields = new URLSearchParams();
    for (const input of form.matchAll(/<input type="hidden" name="([^"]+)" value="([^"]*)">/g)) fields.append(input[1], input[2]);
    return { action: action.replaceAll('&amp;', '&'), fields };
  }
  throw new Error(`no form with a "${label}" button`);
}

// ---- shared set-up ------------------------------------------------------------------

let fake: PaymentFake;
let receiver: WebhookReceiver;
let stripe: Stripe;

beforeAll(async () => {
  receiver = new WebhookReceiver();
  await receiver.start();
  const { startPaymentFake } = await import('../../scripts/payment-fake/server.mjs');
  fake = await startPaymentFake({
    secretKey: SECRET_KEY,
    webhookSecret: WEBHOOK_SECRET,
    webhookUrl: receiver.url,
    retryDelaysMs: [20, 40],
  });
  stripe = createStripeClient(
    readPaymentsConfig({
      STRIPE_SECRET_KEY: SECRET_KEY,
      STRIPE_WEBHOOK_SECRET: WEBHOOK_SECRET,
      STRIPE_API_HOST: '127.0.0.1',
      STRIPE_API_PORT: String(fake.port),
      STRIPE_API_PROTOCOL: 'http',
    }),
  );
});

afterAll(async () => {
  await fake?.close();
  await receiver?.close();
});

/** Opens the onboarding link's page and presses the button labelled `label`. */
async function pressOnboardingButton(linkUrl: string, label: string): Promise<Response> {
  const page = await fetch(linkUrl, { redirect: 'manual' });
  expect(page.status).toBe(200);
  const { action, fields } = formWithButton(await page.text(), label);
  return fetch(new URL(action, fake.url), { method: 'POST', body: fields, redirect: 'manual' });
}

async function onboardedAccount(email = 'keeper@broodsilk.test'): Promise<Stripe.Account> {
  const account = await stripe.accounts.create({ type: 'express', country: 'DE', email });
  const link = await stripe.accountLinks.create({
    account: account.id,
    type: 'account_onboarding',
    refresh_url: `${APP}/settings/payouts?again=1`,
    return_url: `${APP}/settings/payouts?done=1`,
  });
  const done = await pressOnboardingButton(link.url, 'Complete test onboarding');
  expect(done.status).toBe(303);
  await receiver.waitFor(isEvent('account.updated', account.id));
  return stripe.accounts.retrieve(account.id);
}

function checkoutParams(destination: string, amount = 1250): Stripe.Checkout.SessionCreateParams {
  return {
    mode: 'payment',
    line_items: [{ price_data: { currency: 'eur', unit_amount: amount, product_data: { name: 'Cash-out of 3 spiderlings' } }, quantity: 1 }],
    payment_intent_data: { transfer_data: { destination } },
    success_url: `${APP}/projects/p1/account?paid={CHECKOUT_SESSION_ID}`,
    cancel_url: `${APP}/projects/p1/account?cancelled=1`,
  };
}

/** Pays a session through its pay page; returns the redirect. */
async function payOnPage(session: Stripe.Checkout.Session): Promise<Response> {
  const page = await fetch(session.url!);
  expect(page.status).toBe(200);
  const { action } = formWithButton(await page.text(), 'Pay (test)');
  return fetch(new URL(action, fake.url), { method: 'POST', redirect: 'manual' });
}

async function paidSessionWebhook(): Promise<{ session: Stripe.Checkout.Session; delivery: Received }> {
  const account = await onboardedAccount();
  const session = await stripe.checkout.sessions.create(checkoutParams(account.id, 900));
  expect((await payOnPage(session)).status).toBe(303);
  const delivery = await receiver.waitFor(isEvent('checkout.session.completed', session.id));
  return { session, delivery };
}

function signatureOf(headers: IncomingHttpHeaders): string {
  const header = headers['stripe-signature'];
  if (typeof header !== 'string') throw new Error('no Stripe-Signature header');
  return header;
}

// ---- the tests --------------------------------------------------------------------------

describe('payment fake: API keys', () => {
  it('refuses a wrong key through the SDK and a missing key with the provider error shape', async () => {
    const wrong = new Stripe(
      'sk_test_not_the_right_key',
      stripeClientOptions(
        readPaymentsConfig({
          STRIPE_API_HOST: '127.0.0.1',
          STRIPE_API_PORT: String(fake.port),
          STRIPE_API_PROTOCOL: 'http',
        }),
      ),
    );
    const refused = await wrong.accounts.create({ type: 'express' }).then(
      () => null,
      (err: unknown) => err,
    );
    expect(refused).toBeInstanceOf(Stripe.errors.StripeAuthenticationError);
    expect(refused).toMatchObject({ statusCode: 401, rawType: 'invalid_request_error' });
    expect((refused as Error).message).toMatch(/^Invalid API Key provided: sk_test_/);
    expect((refused as Error).message).not.toContain('not_the_right_key');

    const accountsBefore = fake.state.accounts.size;
    const bare = await fetch(`${fake.url}/v1/accounts`, { method: 'POST' });
    expect(bare.status).toBe(401);
    const body = await bare.json();
    expect(body).toEqual({ error: { type: 'invalid_request_error', message: expect.stringContaining('did not provide an API key') } });
    expect(fake.state.accounts.size).toBe(accountsBefore);

    const accepted = await stripe.accounts.create({ type: 'express' });
    expect(accepted.id).toMatch(/^acct_/);
  });
});

describe('payment fake: connected accounts and onboarding', () => {
  it('creates an express account, onboards it through the test page and reports account.updated', async () => {
    const account = await stripe.accounts.create({ type: 'express', country: 'NL', email: 'mara@broodsilk.test', metadata: { user: 'u-41' } });
    expect(account).toMatchObject({
      object: 'account',
      type: 'express',
      country: 'NL',
      default_currency: 'eur',
      email: 'mara@broodsilk.test',
      charges_enabled: false,
      payouts_enabled: false,
      details_submitted: false,
      metadata: { user: 'u-41' },
    });
    expect(account.id).toMatch(/^acct_[A-Za-z0-9]{16}$/);
    expect(Number.isInteger(account.created)).toBe(true);
    expect(account.created!).toBeLessThan(1e11); // seconds, not milliseconds
    expect(await stripe.accounts.retrieve(account.id)).toEqual(account);

    const link = await stripe.accountLinks.create({
      account: account.id,
      type: 'account_onboarding',
      refresh_url: `${APP}/settings/payouts?again=1`,
      return_url: `${APP}/settings/payouts?done=1`,
    });
    expect(link.object).toBe('account_link');
    expect(link.url.startsWith(`${fake.url}/onboarding/${account.id}?`)).toBe(true);
    expect(link.expires_at).toBeGreaterThan(link.created);

    const page = await fetch(link.url);
    const html = await page.text();
    expect(page.headers.get('content-type')).toMatch(/^text\/html/);
    expect(html).toContain('Local test stand-in for the payment provider');
    expect(html).toContain(account.id);

    const done = await pressOnboardingButton(link.url, 'Complete test onboarding');
    expect(done.status).toBe(303);
    expect(done.headers.get('location')).toBe(`${APP}/settings/payouts?done=1`);

    const after = await stripe.accounts.retrieve(account.id);
    expect(after).toMatchObject({ charges_enabled: true, payouts_enabled: true, details_submitted: true });
    expect(after.requirements?.currently_due).toEqual([]);

    const delivery = await receiver.waitFor(isEvent('account.updated', account.id));
    const event = stripe.webhooks.constructEvent(delivery.raw, signatureOf(delivery.headers), WEBHOOK_SECRET);
    expect(event.type).toBe('account.updated');
    expect(event.account).toBe(account.id);
    const updated = event.data.object as Stripe.Account;
    expect(updated).toMatchObject({ id: account.id, charges_enabled: true, payouts_enabled: true, details_submitted: true });
    expect(event.data.previous_attributes).toEqual({ charges_enabled: false, payouts_enabled: false, details_submitted: false });

    // An onboarding link works once: opening it again sends the keeper to refresh_url.
    const again = await fetch(link.url, { redirect: 'manual' });
    expect(again.status).toBe(303);
    expect(again.headers.get('location')).toBe(`${APP}/settings/payouts?again=1`);
  });

  it('leaving onboarding unfinished returns to return_url with nothing enabled and no event', async () => {
    const account = await stripe.accounts.create({ type: 'express', country: 'GB' });
    const link = await stripe.accountLinks.create({
      account: account.id,
      type: 'account_onboarding',
      refresh_url: `${APP}/r`,
      return_url: `${APP}/back`,
    });
    const left = await pressOnboardingButton(link.url, 'Leave without finishing');
    expect(left.status).toBe(303);
    expect(left.headers.get('location')).toBe(`${APP}/back`);
    expect(await stripe.accounts.retrieve(account.id)).toMatchObject({ charges_enabled: false, details_submitted: false });
    expect(fake.state.events.filter((e) => e.data.object.id === account.id)).toEqual([]);
  });

  it('answers an unknown account with 404 resource_missing', async () => {
    const err = await stripe.accounts.retrieve('acct_0000000000000000').then(
      () => null,
      (e: unknown) => e,
    );
    expect(err).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(err).toMatchObject({ statusCode: 404, code: 'resource_missing', param: 'id' });

    const malformed = await fetch(`${fake.url}/v1/accounts/%E0%A4%A`, { headers: { authorization: `Bearer ${SECRET_KEY}` } });
    expect(malformed.status).toBe(404);
    expect((await malformed.json()).error).toMatchObject({ type: 'invalid_request_error', code: 'resource_missing' });
  });
});

describe('payment fake: checkout with a destination charge', () => {
  it('refuses a destination that has not finished onboarding or does not exist', async () => {
    const fresh = await stripe.accounts.create({ type: 'express', country: 'DE' });
    const before = fake.state.checkoutSessions.size;

    const notReady = await stripe.checkout.sessions.create(checkoutParams(fresh.id)).then(
      () => null,
      (e: unknown) => e,
    );
    expect(notReady).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(notReady).toMatchObject({ statusCode: 400, param: 'payment_intent_data[transfer_data][destination]' });
    expect((notReady as Error).message).toContain('has not completed onboarding');

    const unknown = await stripe.checkout.sessions.create(checkoutParams('acct_nobodyhere000000')).then(
      () => null,
      (e: unknown) => e,
    );
    expect(unknown).toMatchObject({ statusCode: 400, code: 'resource_missing', param: 'payment_intent_data[transfer_data][destination]' });

    expect(fake.state.checkoutSessions.size).toBe(before);
  });

  it('creates a session, pays it on the pay page and delivers a verified checkout.session.completed', async () => {
    const account = await onboardedAccount('ines@broodsilk.test');
    const session = await stripe.checkout.sessions.create({
      mode: 'payment',
      line_items: [
        { price_data: { currency: 'eur', unit_amount: 1250, product_data: { name: 'Share: 2 spiderlings' } }, quantity: 2 },
        { price_data: { currency: 'eur', unit_amount: 300, product_data: { name: 'Shipping box' } }, quantity: 1 },
      ],
      payment_intent_data: { transfer_data: { destination: account.id }, application_fee_amount: 150, metadata: { entry: 'cash-9' } },
      success_url: `${APP}/projects/p7/account?paid={CHECKOUT_SESSION_ID}`,
      cancel_url: `${APP}/projects/p7/account?cancelled=1`,
      client_reference_id: 'settlement-p7-3',
      metadata: { project: 'p7', payer: 'u-12', payee: 'u-41' },
    });
    expect(session).toMatchObject({
      object: 'checkout.session',
      mode: 'payment',
      amount_total: 2800,
      currency: 'eur',
      status: 'open',
      payment_status: 'unpaid',
      livemode: false,
      client_reference_id: 'settlement-p7-3',
      metadata: { project: 'p7', payer: 'u-12', payee: 'u-41' },
      payment_intent: null,
    });
    expect(session.id).toMatch(/^cs_test_[A-Za-z0-9]+$/);
    expect(session.url).toBe(`${fake.url}/pay/${session.id}`);
    expect(await stripe.checkout.sessions.retrieve(session.id)).toEqual(session);

    const page = await fetch(session.url!);
    const html = await page.text();
    expect(html).toContain('Local test stand-in for the payment provider');
    expect(html).toContain('€28.00');
    expect(html).toContain('<dd data-field="amount_total">2800</dd>');
    expect(html).toContain('<dd data-field="currency">eur</dd>');
    expect(html).toContain(`<dd data-field="destination">${account.id}</dd>`);

    const paid = await payOnPage(session);
    expect(paid.status).toBe(303);
    expect(paid.headers.get('location')).toBe(`${APP}/projects/p7/account?paid=${session.id}`);

    const delivery = await receiver.waitFor(isEvent('checkout.session.completed', session.id));
    const event = stripe.webhooks.constructEvent(delivery.raw, signatureOf(delivery.headers), WEBHOOK_SECRET);
    expect(event.id).toMatch(/^evt_/);
    expect(event).toMatchObject({ object: 'event', type: 'checkout.session.completed', livemode: false, api_version: Stripe.API_VERSION });
    expect(Number.isInteger(event.created)).toBe(true);
    const completed = event.data.object as Stripe.Checkout.Session;
    expect(completed).toMatchObject({ id: session.id, status: 'complete', payment_status: 'paid', amount_total: 2800, metadata: session.metadata });
    expect(completed.payment_intent).toMatch(/^pi_/);

    expect(await stripe.checkout.sessions.retrieve(session.id)).toMatchObject({
      status: 'complete',
      payment_status: 'paid',
      payment_intent: completed.payment_intent,
    });
    const intent = await stripe.paymentIntents.retrieve(completed.payment_intent as string);
    expect(intent).toMatchObject({
      object: 'payment_intent',
      amount: 2800,
      currency: 'eur',
      status: 'succeeded',
      application_fee_amount: 150,
      transfer_data: { destination: account.id },
      metadata: { entry: 'cash-9' },
    });

    // A second press of "Pay" changes nothing and sends no second event.
    const twice = await fetch(`${fake.url}/pay/${session.id}`, { method: 'POST', redirect: 'manual' });
    expect(twice.headers.get('location')).toBe(`${APP}/projects/p7/account?paid=${session.id}`);
    expect(fake.state.events.filter((e) => e.type === 'checkout.session.completed' && e.data.object.id === session.id)).toHaveLength(1);
  });

  it('cancel returns to cancel_url and leaves the session open and unpaid', async () => {
    const account = await onboardedAccount();
    const session = await stripe.checkout.sessions.create(checkoutParams(account.id));
    const page = await fetch(session.url!);
    const { action } = formWithButton(await page.text(), 'Cancel');
    const cancelled = await fetch(new URL(action, fake.url), { method: 'POST', redirect: 'manual' });
    expect(cancelled.status).toBe(303);
    expect(cancelled.headers.get('location')).toBe(`${APP}/projects/p1/account?cancelled=1`);
    expect(await stripe.checkout.sessions.retrieve(session.id)).toMatchObject({ status: 'open', payment_status: 'unpaid', payment_intent: null });
  });

  it('refuses malformed checkout requests with 400 and the offending param', async () => {
    const account = await onboardedAccount();
    const base = checkoutParams(account.id);
    const cases: [Stripe.Checkout.SessionCreateParams, string][] = [
      [{ ...base, mode: 'subscription' }, 'mode'],
      [{ ...base, line_items: undefined }, 'line_items'],
      [
        { ...base, line_items: [{ price_data: { currency: 'euro', unit_amount: 100, product_data: { name: 'x' } }, quantity: 1 }] },
        'line_items[0][price_data][currency]',
      ],
      [
        { ...base, line_items: [{ price_data: { currency: 'eur', unit_amount: 12.5, product_data: { name: 'x' } }, quantity: 1 }] },
        'line_items[0][price_data][unit_amount]',
      ],
      [{ ...base, line_items: [{ price_data: { currency: 'eur', unit_amount: 100, product_data: { name: 'x' } }, quantity: 0 }] }, 'line_items[0][quantity]'],
      [{ ...base, payment_intent_data: { ...base.payment_intent_data, application_fee_amount: 999_999 } }, 'payment_intent_data[application_fee_amount]'],
      [{ ...base, success_url: 'not a url' }, 'success_url'],
    ];
    for (const [params, param] of cases) {
      const err = await stripe.checkout.sessions.create(params).then(
        () => null,
        (e: unknown) => e,
      );
      expect(err, param).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
      expect(err, param).toMatchObject({ statusCode: 400, param });
    }
    const missing = await stripe.checkout.sessions.retrieve('cs_test_missing').then(
      () => null,
      (e: unknown) => e,
    );
    expect(missing).toMatchObject({ statusCode: 404, code: 'resource_missing' });
  });
});

describe('payment fake: webhook signatures', () => {
  it('the SDK refuses a tampered body, a wrong secret and a stale timestamp', async () => {
    const { delivery } = await paidSessionWebhook();
    const header = signatureOf(delivery.headers);
    const t = Number(/(?:^|,)t=(\d+)/.exec(header)?.[1]);
    expect(Number.isInteger(t)).toBe(true);

    // The SDK's receivedAt is in milliseconds; pinning it to the signing time keeps any clock out.
    const at = (seconds: number) => seconds * 1000;
    expect(stripe.webhooks.constructEvent(delivery.raw, header, WEBHOOK_SECRET, 300, undefined, at(t)).id).toBe(delivery.json.id);

    const tampered = delivery.raw.replace('"amount_total": 900', '"amount_total": 1');
    expect(tampered).not.toBe(delivery.raw);
    expect(() => stripe.webhooks.constructEvent(tampered, header, WEBHOOK_SECRET, 300, undefined, at(t))).toThrow(
      Stripe.errors.StripeSignatureVerificationError,
    );
    expect(() => stripe.webhooks.constructEvent(delivery.raw, header, 'whsec_someone_else_entirely', 300, undefined, at(t))).toThrow(
      Stripe.errors.StripeSignatureVerificationError,
    );

    // Tolerance: 299 s old is fine, 301 s old is refused, with the default tolerance (300 s) too.
    expect(stripe.webhooks.constructEvent(delivery.raw, header, WEBHOOK_SECRET, 300, undefined, at(t + 299)).id).toBe(delivery.json.id);
    expect(() => stripe.webhooks.constructEvent(delivery.raw, header, WEBHOOK_SECRET, 300, undefined, at(t + 301))).toThrow(
      'Timestamp outside the tolerance zone',
    );
    expect(() => stripe.webhooks.constructEvent(delivery.raw, header, WEBHOOK_SECRET, undefined, undefined, at(t + 301))).toThrow(
      'Timestamp outside the tolerance zone',
    );
  });

  it('signs as documented, checked with our own HMAC', async () => {
    // Scheme from Stripe's documentation, "Verify webhook signatures manually"
    // (https://docs.stripe.com/webhooks#verify-manually): the header is a list
    // of `key=value` pairs; `t` is the timestamp, `v1` the signature; the signed
    // payload is `<t>` + "." + the raw request body, and the signature is the
    // hex HMAC with SHA-256 of that payload keyed by the endpoint's secret.
    const { delivery } = await paidSessionWebhook();
    const header = signatureOf(delivery.headers);
    const pairs = header.split(',').map((part) => part.split('=') as [string, string]);
    const t = pairs.find(([k]) => k === 't')?.[1];
    const v1 = pairs.filter(([k]) => k === 'v1').map(([, v]) => v);
    expect(t).toMatch(/^\d+$/);
    expect(v1).toHaveLength(1);
    expect(v1[0]).toMatch(/^[0-9a-f]{64}$/);

    const expected = createHmac('sha256', WEBHOOK_SECRET).update(`${t}.${delivery.raw}`, 'utf8').digest('hex');
    expect(timingSafeEqual(Buffer.from(expected, 'hex'), Buffer.from(v1[0], 'hex'))).toBe(true);
    const forOtherBody = createHmac('sha256', WEBHOOK_SECRET).update(`${t}.${delivery.raw} `, 'utf8').digest('hex');
    expect(forOtherBody).not.toBe(v1[0]);

    // And the SDK's own test-header helper produces the very same header.
    expect(stripe.webhooks.generateTestHeaderString({ payload: delivery.raw, secret: WEBHOOK_SECRET, timestamp: Number(t) })).toBe(header);
    expect(delivery.headers['content-type']).toMatch(/^application\/json/);
  });
});

describe('payment fake: delivery log, redelivery and retries', () => {
  it('redelivers the same event (same id, same body) with a fresh valid signature', async () => {
    const { delivery } = await paidSessionWebhook();
    const eventId = delivery.json.id;

    const res = await fetch(`${fake.url}/_fake/redeliver/${eventId}`, { method: 'POST' });
    expect(res.status).toBe(202);
    expect(await res.json()).toMatchObject({ event: eventId, delivery: { eventId, ok: true, redelivery: true } });

    const second = await receiver.waitFor((r) => r.json.id === eventId, 2);
    expect(second.raw).toBe(delivery.raw);
    expect(stripe.webhooks.constructEvent(second.raw, signatureOf(second.headers), WEBHOOK_SECRET).id).toBe(eventId);

    const log = await (await fetch(`${fake.url}/_fake/events`)).json();
    expect(log.events.map((e: { id: string }) => e.id)).toContain(eventId);
    const sends = log.deliveries.filter((d: { eventId: string }) => d.eventId === eventId);
    expect(sends.map((d: { redelivery: boolean; ok: boolean }) => [d.redelivery, d.ok])).toEqual([
      [false, true],
      [true, true],
    ]);

    expect((await fetch(`${fake.url}/_fake/redeliver/evt_unknown`, { method: 'POST' })).status).toBe(404);
  });

  it('retries a delivery the target refused', async () => {
    const account = await onboardedAccount();
    const session = await stripe.checkout.sessions.create(checkoutParams(account.id));
    receiver.replies = [500];
    expect((await payOnPage(session)).status).toBe(303);
    const first = await receiver.waitFor(isEvent('checkout.session.completed', session.id), 1);
    const retry = await receiver.waitFor(isEvent('checkout.session.completed', session.id), 2);
    expect(retry.json.id).toBe(first.json.id);
    await fake.whenDeliveriesSettled();
    const attempts = fake.state.deliveries.filter((d) => d.eventId === first.json.id);
    expect(attempts.map((d) => [d.attempt, d.status, d.ok])).toEqual([
      [1, 500, false],
      [2, 200, true],
    ]);
  });

  it('gives up on a target that is down, still answering the pay page', async () => {
    const gone = createServer();
    await new Promise<void>((resolve) => gone.listen(0, '127.0.0.1', resolve));
    const deadUrl = `http://127.0.0.1:${(gone.address() as AddressInfo).port}/hook`;
    await new Promise<void>((resolve) => gone.close(() => resolve()));

    const account = await onboardedAccount();
    const session = await stripe.checkout.sessions.create(checkoutParams(account.id));
    fake.setWebhookUrl(deadUrl);
    try {
      const paid = await payOnPage(session);
      expect(paid.status).toBe(303);
      await fake.whenDeliveriesSettled();
    } finally {
      fake.setWebhookUrl(receiver.url);
    }
    const event = fake.state.events.find((e) => e.type === 'checkout.session.completed' && e.data.object.id === session.id);
    expect(event).toBeDefined();
    const attempts = fake.state.deliveries.filter((d) => d.eventId === event!.id);
    expect(attempts.map((d) => [d.attempt, d.ok, d.url])).toEqual([
      [1, false, deadUrl],
      [2, false, deadUrl],
      [3, false, deadUrl],
    ]);
    expect(attempts.every((d) => d.status === null && typeof d.error === 'string')).toBe(true);
    expect(receiver.received.some((r) => r.json.id === event!.id)).toBe(false);
  });
});

describe('payment fake: form bodies', () => {
  it('expands bracketed keys into nested objects and lists, and refuses dangerous or clashing keys', async () => {
    const { parseFormBody } = await import('../../scripts/payment-fake/server.mjs');
    const body = new URLSearchParams([
      ['line_items[0][price_data][currency]', 'eur'],
      ['line_items[0][price_data][product_data][name]', 'Share [A]'],
      ['line_items[0][quantity]', '2'],
      ['line_items[1][quantity]', '1'],
      ['metadata[project]', 'p1'],
      ['expand[]', 'payment_intent'],
      ['expand[]', 'customer'],
      ['mode', 'payment'],
    ]).toString();
    expect(parseFormBody(body)).toEqual({
      line_items: [{ price_data: { currency: 'eur', product_data: { name: 'Share [A]' } }, quantity: '2' }, { quantity: '1' }],
      metadata: { project: 'p1' },
      expand: ['payment_intent', 'customer'],
      mode: 'payment',
    });
    // Unencoded brackets, as the SDK sends them, parse the same way.
    expect(parseFormBody('a[b][0]=x&a[b][1]=y')).toEqual({ a: { b: ['x', 'y'] } });
    // Numbered keys that are not 0..n-1 stay an object.
    expect(parseFormBody('a[1]=x')).toEqual({ a: { '1': 'x' } });
    expect(() => parseFormBody('__proto__[polluted]=1')).toThrow(/Invalid parameter/);
    expect(() => parseFormBody('a[constructor][prototype]=1')).toThrow(/Invalid parameter/);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    expect(() => parseFormBody('a=1&a[b]=2')).toThrow(/both as a value and as an object/);
  });
});

describe('server payments config and Stripe client factory', () => {
  it('reads host, port and protocol from the environment and leaves them out when unset', () => {
    const local = readPaymentsConfig({
      STRIPE_SECRET_KEY: 'sk_test_x',
      STRIPE_WEBHOOK_SECRET: 'whsec_y',
      STRIPE_API_HOST: '127.0.0.1',
      STRIPE_API_PORT: '12180',
      STRIPE_API_PROTOCOL: 'HTTP',
    });
    expect(local).toEqual({ secretKey: 'sk_test_x', webhookSecret: 'whsec_y', apiHost: '127.0.0.1', apiPort: 12180, apiProtocol: 'http', apiVersion: null });
    expect(stripeClientOptions(local)).toMatchObject({ host: '127.0.0.1', port: 12180, protocol: 'http' });

    const hosted = readPaymentsConfig({ STRIPE_SECRET_KEY: 'sk_live_z' });
    const options = stripeClientOptions(hosted);
    expect(options).not.toHaveProperty('host');
    expect(options).not.toHaveProperty('port');
    expect(options).not.toHaveProperty('protocol');
    expect(createStripeClient(hosted).getApiField('host')).toBe('api.stripe.com');
    expect(createStripeClient(local).getApiField('port')).toBe(12180);
  });

  it('refuses malformed settings and a missing secret key', () => {
    expect(() => readPaymentsConfig({ STRIPE_SECRET_KEY: 'pk_test_public' })).toThrow(/STRIPE_SECRET_KEY/);
    expect(() => readPaymentsConfig({ STRIPE_API_PORT: 'eighty' })).toThrow(/STRIPE_API_PORT/);
    expect(() => readPaymentsConfig({ STRIPE_API_PORT: '70000' })).toThrow(/STRIPE_API_PORT/);
    expect(() => readPaymentsConfig({ STRIPE_API_PROTOCOL: 'ftp' })).toThrow(/STRIPE_API_PROTOCOL/);
    expect(() => createStripeClient(readPaymentsConfig({}))).toThrow(/STRIPE_SECRET_KEY is not set/);
  });
});

describe('the Nest provider and the start script', () => {
  it('STRIPE_CLIENT resolves through Nest DI from the STRIPE_* environment and reaches the fake', async () => {
    const keys = ['STRIPE_SECRET_KEY', 'STRIPE_API_HOST', 'STRIPE_API_PORT', 'STRIPE_API_PROTOCOL'] as const;
    const saved = keys.map((k) => process.env[k]);
    Object.assign(process.env, {
      STRIPE_SECRET_KEY: SECRET_KEY,
      STRIPE_API_HOST: '127.0.0.1',
      STRIPE_API_PORT: String(fake.port),
      STRIPE_API_PROTOCOL: 'http',
    });
    try {
      const moduleRef = await Test.createTestingModule({
        imports: [ConfigModule.forFeature(paymentsConfig)],
        providers: [stripeClientProvider],
      }).compile();
      const client = moduleRef.get<Stripe>(STRIPE_CLIENT);
      expect(client).toBeInstanceOf(Stripe);
      const account = await client.accounts.create({ type: 'express', country: 'FR' });
      expect(fake.state.accounts.get(account.id)).toMatchObject({ country: 'FR', default_currency: 'eur' });
      await moduleRef.close();
    } finally {
      keys.forEach((k, i) => {
        if (saved[i] === undefined) delete process.env[k];
        else process.env[k] = saved[i];
      });
    }
  });

  it('node scripts/payment-fake/start.mjs announces its URL, serves the SDK and stops on SIGTERM', async () => {
    const script = fileURLToPath(new URL('../../scripts/payment-fake/start.mjs', import.meta.url));
    const child = spawn(process.execPath, [script], {
      env: { ...process.env, PAYMENT_FAKE_PORT: '0', STRIPE_SECRET_KEY: SECRET_KEY, STRIPE_WEBHOOK_SECRET: WEBHOOK_SECRET, PAYMENT_WEBHOOK_URL: '' },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    const exited = new Promise<number | null>((resolve) => child.once('exit', (code) => resolve(code)));
    try {
      const firstLine = await new Promise<string>((resolve, reject) => {
        createInterface({ input: child.stdout! }).once('line', resolve);
        child.once('exit', (code) => reject(new Error(`start.mjs exited with ${code} before announcing itself`)));
      });
      const match = /^payment fake listening on (http:\/\/127\.0\.0\.1:(\d+))$/.exec(firstLine);
      expect(match, firstLine).not.toBeNull();
      const client = createStripeClient(
        readPaymentsConfig({
          STRIPE_SECRET_KEY: SECRET_KEY,
          STRIPE_API_HOST: '127.0.0.1',
          STRIPE_API_PORT: match![2],
          STRIPE_API_PROTOCOL: 'http',
        }),
      );
      const account = await client.accounts.create({ type: 'express' });
      expect(account.id).toMatch(/^acct_/);
      expect(await client.accounts.retrieve(account.id)).toMatchObject({ id: account.id, charges_enabled: false });
    } finally {
      child.kill('SIGTERM');
    }
    expect(await exited).toBe(0);
  });

  it('start.mjs refuses to start without the keys', async () => {
    const script = fileURLToPath(new URL('../../scripts/payment-fake/start.mjs', import.meta.url));
    const env: NodeJS.ProcessEnv = { ...process.env, PAYMENT_FAKE_PORT: '0' };
    delete env.STRIPE_SECRET_KEY;
    delete env.STRIPE_WEBHOOK_SECRET;
    const child = spawn(process.execPath, [script], { env, stdio: ['ignore', 'pipe', 'pipe'] });
    let stderr = '';
    child.stderr!.on('data', (c: Buffer) => (stderr += c.toString()));
    const code = await new Promise<number | null>((resolve) => child.once('exit', (c) => resolve(c)));
    expect(code).toBe(2);
    expect(stderr).toContain('STRIPE_SECRET_KEY and STRIPE_WEBHOOK_SECRET');
  });
});
