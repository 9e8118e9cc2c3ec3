/**
 * When the payment provider refuses a call or cannot be reached, the request answers 502 or 503
 * with a message, and nothing is written. Uses the local payment fake (scripts/payment-fake).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ApiErrorBody } from '@broodsilk/shared';
import type { PaymentFake } from '../../scripts/payment-fake/server.mjs';
import { createTestApp, type TestApp } from './support/test-app';
import { rowCounts } from './support/row-counts';
import { accountScenario, api, type AccountScenario } from './accounts.fixtures';
import { PayoutAccount } from '../src/settlements/payout-account.entity';
import { User } from '../src/users/user.entity';

const SECRET_KEY = 'sk_test_broodsilk_provider_errors_01';
const KEYS = ['STRIPE_SECRET_KEY', 'STRIPE_API_HOST', 'STRIPE_API_PORT', 'STRIPE_API_PROTOCOL'] as const;
const savedEnv = { ...process.env };

let fake: PaymentFake;
let t: TestApp;
let s: AccountScenario;

beforeAll(async () => {
  const { startPaymentFake } = await import('../../scripts/payment-fake/server.mjs');
  fake = await startPaymentFake({ secretKey: SECRET_KEY, webhookSecret: 'whsec_provider_errors_abcdef', port: 0 });
  Object.assign(process.env, { STRIPE_SECRET_KEY: SECRET_KEY, STRIPE_API_HOST: '127.0.0.1', STRIPE_API_PORT: String(fake.port), STRIPE_API_PROTOCOL: 'http' });
  t = await createTestApp();
  s = await accountScenario(t.app, t.orm);
  // Tomasz cashes out 4 young: Mira owes him money, and his payout account names one the provider does not know.
  await api(t.app)
    .post(`/api/projects/${s.projectId}/entries`)
    .set('Authorization', s.mira.bearer)
    .send({ kind: 'cash-out', date: '2026-11-20', memberId: s.tomaszId, count: 4 })
    .expect(201);
  const em = t.orm.em.fork();
  em.create(PayoutAccount, { user: em.getReference(User, s.tomasz.user.id), providerAccountId: 'acct_unknown_to_provider', chargesEnabled: true });
  await em.flush();
}, 90_000);
afterAll(async () => {
  await t?.close();
  await fake?.close();
  for (const k of KEYS) {
    if (savedEnv[k] === undefined) delete process.env[k];
    else process.env[k] = savedEnv[k];
  }
});

const checkout = () =>
  api(t.app).post(`/api/projects/${s.projectId}/settlements/checkout`).set('Authorization', s.mira.bearer).send({ toMemberId: s.tomaszId, amountMinor: 100 });
const linkPayout = () => api(t.app).post('/api/settlements/payout-account').set('Authorization', s.mira.bearer).send({ country: 'DE' });

async function refusedWith(status: number, send: () => Promise<{ status: number; body: unknown }>): Promise<ApiErrorBody> {
  const before = await rowCounts(t.orm);
  const res = await send();
  expect(res.status, JSON.stringify(res.body)).toBe(status);
  expect(await rowCounts(t.orm)).toEqual(before);
  return res.body as ApiErrorBody;
}

describe('payment provider errors', () => {
  it('a refusal by the provider is a 502 that says nothing was charged, and no checkout is stored', async () => {
    const body = await refusedWith(502, checkout);
    expect(body.message).toMatch(/payment provider refused.*Nothing was charged/);
  });

  it('an unreachable provider is a 503, for checkout and for linking a payout account, and nothing is stored', async () => {
    await fake.close();
    expect((await refusedWith(503, checkout)).message).toMatch(/cannot be reached/);
    expect((await refusedWith(503, linkPayout)).message).toMatch(/cannot be reached/);
  });
});
