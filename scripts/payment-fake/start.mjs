#!/usr/bin/env node
// @ts-check
/**
 * Runs the local payment provider fake as a process:
 *   node scripts/payment-fake/start.mjs
 * Environment: PAYMENT_FAKE_PORT (default 12111, the STRIPE_API_PORT the server expects; 0 picks a free port),
 * PAYMENT_FAKE_HOST (default 127.0.0.1), PAYMENT_FAKE_PUBLIC_URL (optional),
 * STRIPE_SECRET_KEY and STRIPE_WEBHOOK_SECRET (required),
 * PAYMENT_WEBHOOK_URL (optional; without it events are only logged).
 * Prints one line "payment fake listening on http://HOST:PORT" when ready.
 */
import { startPaymentFake } from './server.mjs';

const env = process.env;
const port = Number(env.PAYMENT_FAKE_PORT ?? 12111);
if (!Number.isInteger(port) || port < 0 || port > 65535) {
  console.error(`payment fake: PAYMENT_FAKE_PORT must be a port number, not "${env.PAYMENT_FAKE_PORT}"`);
  process.exit(2);
}
const missing = ['STRIPE_SECRET_KEY', 'STRIPE_WEBHOOK_SECRET'].filter((k) => !env[k]);
if (missing.length) {
  console.error(`payment fake: set ${missing.join(' and ')} (the same values the server uses)`);
  process.exit(2);
}

let fake;
try {
  fake = await startPaymentFake({
    port,
    host: env.PAYMENT_FAKE_HOST || '127.0.0.1',
    publicUrl: env.PAYMENT_FAKE_PUBLIC_URL || undefined,
    secretKey: /** @type {string} */ (env.STRIPE_SECRET_KEY),
    webhookSecret: /** @type {string} */ (env.STRIPE_WEBHOOK_SECRET),
    webhookUrl: env.PAYMENT_WEBHOOK_URL || undefined,
  });
} catch (err) {
  console.error(`payment fake: could not start: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
}
console.log(`payment fake listening on ${fake.url}`);

let stopping = false;
for (const signal of /** @type {const} */ (['SIGINT', 'SIGTERM'])) {
  process.on(signal, () => {
    if (stopping) return;
    stopping = true;
    fake.close().then(
      () => process.exit(0),
      () => process.exit(1),
    );
  });
}
