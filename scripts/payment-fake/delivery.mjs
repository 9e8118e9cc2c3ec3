// @ts-check
/**
 * Events and their delivery: each event is recorded, signed the way the
 * provider signs webhooks and POSTed to the webhook URL, with retries that
 * close() cuts short.
 */
import { createHmac } from 'node:crypto';
import { makeId, nowSeconds } from './ids.mjs';

/**
 * @typedef {import('./context.mjs').FakeContext} FakeContext
 * @typedef {import('./context.mjs').FakeFlight} FakeFlight
 * @typedef {import('./context.mjs').DeliveryRecord} DeliveryRecord
 */

/**
 * The provider's webhook signature header: `t=<unix seconds>,v1=<hex HMAC-SHA256>`
 * where the HMAC key is the endpoint's signing secret and the signed text is
 * `<t>.<raw body>`.
 * @param {string} payload raw request body
 * @param {string} secret webhook signing secret (`whsec_…`)
 * @param {number} [timestamp] unix seconds; defaults to now
 */
export function signatureHeader(payload, secret, timestamp = nowSeconds()) {
  const v1 = createHmac('sha256', secret).update(`${timestamp}.${payload}`, 'utf8').digest('hex');
  return `t=${timestamp},v1=${v1}`;
}

/** A wait that close() cuts short. @param {FakeFlight} flight @param {number} ms */
function sleep(flight, ms) {
  return new Promise((resolve) => {
    const entry = {
      timer: setTimeout(() => {
        flight.sleepers.delete(entry);
        resolve(undefined);
      }, ms),
      resolve: () => resolve(undefined),
    };
    flight.sleepers.add(entry);
  });
}

/** Waits for a promise at most `ms`; never rejects. @param {Promise<unknown>} p @param {number} ms */
export async function within(p, ms) {
  /** @type {NodeJS.Timeout | undefined} */
  let timer;
  const limit = new Promise((resolve) => {
    timer = setTimeout(resolve, ms);
  });
  try {
    await Promise.race([p.catch(() => undefined), limit]);
  } finally {
    clearTimeout(timer);
  }
}

/**
 * @param {Record<string, any>} event
 * @param {string | null} url
 * @param {boolean} redelivery
 * @param {{ attempt: number, signedAt: number | null, error: string | null }} fields
 * @returns {DeliveryRecord}
 */
function newRecord(event, url, redelivery, { attempt, signedAt, error }) {
  return { eventId: event.id, type: event.type, url, attempt, redelivery, signedAt, status: null, ok: false, error, at: new Date().toISOString() };
}

/**
 * One POST of the payload; fills in the record's status, ok and error.
 * @param {FakeContext} ctx
 * @param {string} url
 * @param {string} payload
 * @param {DeliveryRecord} record
 */
async function attemptDelivery(ctx, url, payload, record) {
  try {
    const res = await fetch(url, {
      method: 'POST',
      redirect: 'manual',
      headers: {
        'content-type': 'application/json; charset=utf-8',
        'stripe-signature': signatureHeader(payload, ctx.config.webhookSecret, /** @type {number} */ (record.signedAt)),
        'user-agent': 'BroodsilkPaymentFake/1 (local test stand-in)',
      },
      body: payload,
      signal: AbortSignal.any([ctx.flight.closing.signal, AbortSignal.timeout(ctx.config.attemptTimeoutMs)]),
    });
    record.status = res.status;
    record.ok = res.status >= 200 && res.status < 300;
    if (!record.ok) record.error = `webhook target answered ${res.status}`;
    await res.arrayBuffer().catch(() => undefined);
  } catch (err) {
    record.error = err instanceof Error ? err.message : String(err);
  }
}

/**
 * Sends an event to the webhook URL, retrying a failed attempt after each
 * of `retryDelaysMs`. Resolves with the last attempt's record.
 * @param {FakeContext} ctx
 * @param {Record<string, any>} event
 * @param {boolean} redelivery
 * @returns {Promise<DeliveryRecord>}
 */
export function deliver(ctx, event, redelivery) {
  const { flight } = ctx;
  const job = sendWithRetries(ctx, event, redelivery);
  flight.pending.add(job);
  job.finally(() => flight.pending.delete(job)).catch(() => undefined);
  return job;
}

/**
 * @param {FakeContext} ctx
 * @param {Record<string, any>} event
 * @param {boolean} redelivery
 */
async function sendWithRetries(ctx, event, redelivery) {
  const { config, flight, state } = ctx;
  const payload = /** @type {string} */ (ctx.internal.eventPayloads.get(event.id));
  const url = config.webhookUrl;
  let record = newRecord(event, url, redelivery, { attempt: 0, signedAt: null, error: 'no webhook URL configured' });
  if (!url) {
    state.deliveries.push(record);
    return record;
  }
  for (let attempt = 1; attempt <= config.retryDelaysMs.length + 1 && !flight.closed; attempt++) {
    record = newRecord(event, url, redelivery, { attempt, signedAt: nowSeconds(), error: null });
    state.deliveries.push(record);
    await attemptDelivery(ctx, url, payload, record);
    if (record.ok) break;
    if (attempt <= config.retryDelaysMs.length && !flight.closed) await sleep(flight, config.retryDelaysMs[attempt - 1]);
  }
  return record;
}

/**
 * Records an event and starts its delivery.
 * @param {FakeContext} ctx
 * @param {string} type
 * @param {Record<string, any>} object snapshot of the object the event is about
 * @param {{ account?: string, previousAttributes?: Record<string, any>, apiVersion?: string | null }} [extra]
 */
export function emit(ctx, type, object, extra = {}) {
  /** @type {Record<string, any>} */
  const event = {
    id: makeId('evt_'),
    object: 'event',
    ...(extra.account ? { account: extra.account } : {}),
    api_version: ctx.config.apiVersion ?? extra.apiVersion ?? null,
    created: nowSeconds(),
    data: {
      object: structuredClone(object),
      ...(extra.previousAttributes ? { previous_attributes: extra.previousAttributes } : {}),
    },
    livemode: false,
    pending_webhooks: ctx.config.webhookUrl ? 1 : 0,
    request: { id: null, idempotency_key: null },
    type,
  };
  ctx.state.events.push(event);
  ctx.internal.eventPayloads.set(event.id, JSON.stringify(event, null, 2));
  return { event, delivery: deliver(ctx, event, false) };
}

/** Resolves once no delivery (or retry) is in flight. @param {FakeFlight} flight */
export async function whenSettled(flight) {
  while (flight.pending.size) await Promise.allSettled([...flight.pending]);
}

/** Cancels waits and attempts in flight, then lets the deliveries finish. @param {FakeFlight} flight */
export async function stopDeliveries(flight) {
  flight.closed = true;
  flight.closing.abort();
  for (const s of flight.sleepers) {
    clearTimeout(s.timer);
    s.resolve();
  }
  flight.sleepers.clear();
  await Promise.allSettled([...flight.pending]);
}
