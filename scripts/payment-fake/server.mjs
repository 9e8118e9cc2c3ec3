// @ts-check
/**
 * A small local fake of the payment provider's HTTP API (Stripe's v1 API
 * shapes), for development and tests. The official SDK talks to it when
 * built with `{ host: '127.0.0.1', port, protocol: 'http' }`.
 *
 * It answers only the calls Broodsilk makes: connected accounts (express),
 * onboarding links, Checkout Sessions in payment mode with a destination
 * charge, and the resulting events, which it delivers to one webhook URL
 * signed the way the provider signs them.
 *
 * Everything lives in memory and is lost on close. This module checks the
 * options, builds the context the other modules share (context.mjs) and
 * serves; params.mjs, delivery.mjs, api.mjs (with accounts.mjs and
 * checkout.mjs), page-handlers.mjs and http.mjs do the rest.
 */
import { createServer } from 'node:http';
import { stopDeliveries, whenSettled } from './delivery.mjs';
import { sendJson } from './http.mjs';
import { handle } from './routes.mjs';

export { parseFormBody } from './form.mjs';
export { signatureHeader } from './delivery.mjs';
export { makeId } from './ids.mjs';

/**
 * @typedef {import('./context.mjs').PaymentFakeOptions} PaymentFakeOptions
 * @typedef {import('./context.mjs').FakeContext} FakeContext
 */

/** Checks the options and builds the context every part shares. @param {PaymentFakeOptions} options @returns {FakeContext} */
function createContext(options) {
  const { secretKey, webhookSecret, retryDelaysMs = [250, 1000], attemptTimeoutMs = 1500, responseBudgetMs = 2000 } = options;
  if (typeof secretKey !== 'string' || !secretKey.startsWith('sk_')) {
    throw new Error('startPaymentFake: secretKey must be a secret API key starting with "sk_"');
  }
  if (typeof webhookSecret !== 'string' || webhookSecret.length < 8) {
    throw new Error('startPaymentFake: webhookSecret must be set (for example "whsec_…")');
  }
  return {
    config: {
      secretKey,
      webhookSecret,
      webhookUrl: options.webhookUrl || null,
      publicUrl: options.publicUrl?.replace(/\/+$/, '') ?? '',
      apiVersion: options.apiVersion ?? null,
      retryDelaysMs,
      attemptTimeoutMs,
      responseBudgetMs,
    },
    state: { accounts: new Map(), accountLinks: new Map(), checkoutSessions: new Map(), paymentIntents: new Map(), events: [], deliveries: [] },
    internal: { sessionDetails: new Map(), eventPayloads: new Map(), apiVersions: new Map(), idempotent: new Map() },
    flight: { closed: false, closing: new AbortController(), pending: new Set(), sleepers: new Set() },
  };
}

/** @param {import('node:http').Server} server @param {number} port @param {string} host */
function listen(server, port, host) {
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => {
      server.off('error', reject);
      resolve(undefined);
    });
  });
}

/**
 * Starts the fake.
 * @param {PaymentFakeOptions} options
 */
export async function startPaymentFake(options) {
  const { port = 0, host = '127.0.0.1' } = options;
  const ctx = createContext(options);
  const server = createServer((req, res) => {
    handle(ctx, req, res).catch((err) => {
      if (res.headersSent) {
        res.destroy();
        return;
      }
      sendJson(res, 500, { error: { type: 'api_error', message: `Local payment fake failed: ${err instanceof Error ? err.message : String(err)}` } });
    });
  });
  await listen(server, port, host);
  const address = server.address();
  const boundPort = typeof address === 'object' && address ? address.port : port;
  const url = `http://${host.includes(':') ? `[${host}]` : host}:${boundPort}`;
  if (!ctx.config.publicUrl) ctx.config.publicUrl = url;

  return {
    port: boundPort,
    url,
    state: ctx.state,
    /** Changes where later events are delivered (null: log only). @param {string | null} next */
    setWebhookUrl(next) {
      ctx.config.webhookUrl = next || null;
    },
    /** Resolves once no delivery (or retry) is in flight. */
    whenDeliveriesSettled: () => whenSettled(ctx.flight),
    /** Stops listening, cancels retries and waits for the server to close. */
    async close() {
      await stopDeliveries(ctx.flight);
      await new Promise((resolve) => {
        server.close(() => resolve(undefined));
        server.closeAllConnections();
      });
    },
  };
}
