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
 * Everything lives in memory and is lost on close.
 */
import { createServer } from 'node:http';
import { createHmac, randomBytes, timingSafeEqual } from 'node:crypto';
import { FormError, parseFormBody } from './form.mjs';
import { messagePage, onboardingPage, payPage } from './pages.mjs';

export { parseFormBody } from './form.mjs';

const ID_ALPHABET = '0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz';
const MAX_BODY_BYTES = 1024 * 1024;
/** Lifetime of an onboarding link, seconds (the provider's links are short-lived too). */
const ACCOUNT_LINK_TTL_S = 300;
/** Lifetime of an open checkout session, seconds. */
const CHECKOUT_TTL_S = 24 * 3600;

/**
 * @param {string} prefix
 * @param {number} [length]
 */
export function makeId(prefix, length = 24) {
  let out = prefix;
  for (const byte of randomBytes(length)) out += ID_ALPHABET[byte % ID_ALPHABET.length];
  return out;
}

const nowSeconds = () => Math.floor(Date.now() / 1000);

/** decodeURIComponent that yields '' instead of throwing on a malformed escape. @param {string} text */
function decodePart(text) {
  try {
    return decodeURIComponent(text);
  } catch {
    return '';
  }
}

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

/** An error answered as the provider's error object. */
class ApiError extends Error {
  /**
   * @param {number} status
   * @param {string} message
   * @param {{ type?: string, code?: string, param?: string }} [extra]
   */
  constructor(status, message, extra = {}) {
    super(message);
    this.status = status;
    this.type = extra.type ?? 'invalid_request_error';
    this.code = extra.code;
    this.param = extra.param;
  }

  toJSON() {
    /** @type {Record<string, string>} */
    const error = { type: this.type, message: this.message };
    if (this.code) error.code = this.code;
    if (this.param) error.param = this.param;
    return { error };
  }
}

/** @param {string} kind @param {string} id @param {string} [param] */
const missing = (kind, id, param = 'id') => new ApiError(404, `No such ${kind}: '${id}'`, { code: 'resource_missing', param });

/** @param {string} param @param {string} message */
const invalid = (param, message) => new ApiError(400, message, { code: 'parameter_invalid', param });

/** @param {string} param */
const required = (param) => new ApiError(400, `Missing required param: ${param}.`, { code: 'parameter_missing', param });

/**
 * @param {unknown} value
 * @param {string} param
 * @param {{ min?: number, optional?: boolean }} [opts]
 * @returns {number | null}
 */
function integerParam(value, param, { min = 0, optional = false } = {}) {
  if (value === undefined || value === '') {
    if (optional) return null;
    throw required(param);
  }
  if (typeof value !== 'string' || !/^-?\d+$/.test(value)) throw invalid(param, `Invalid integer: ${String(value)}`);
  const n = Number(value);
  if (!Number.isSafeInteger(n)) throw invalid(param, `Invalid integer: ${value}`);
  if (n < min) throw invalid(param, `This value must be greater than or equal to ${min}.`);
  return n;
}

/**
 * @param {unknown} value
 * @param {string} param
 * @param {{ optional?: boolean, max?: number }} [opts]
 * @returns {string | null}
 */
function stringParam(value, param, { optional = true, max = 5000 } = {}) {
  if (value === undefined || value === '') {
    if (optional) return null;
    throw required(param);
  }
  if (typeof value !== 'string') throw invalid(param, `Invalid string: ${param} must be a string.`);
  if (value.length > max) throw invalid(param, `Invalid string: ${param} must be at most ${max} characters.`);
  return value;
}

/**
 * @param {unknown} value
 * @param {string} param
 * @param {{ optional?: boolean }} [opts]
 */
function urlParam(value, param, opts = {}) {
  const text = stringParam(value, param, { ...opts, max: 5000 });
  if (text === null) return null;
  let url;
  try {
    url = new URL(text);
  } catch {
    throw invalid(param, `Not a valid URL: ${param}`);
  }
  if (url.protocol !== 'http:' && url.protocol !== 'https:') throw invalid(param, `Not a valid URL: ${param}`);
  return text;
}

/**
 * Metadata as the provider limits it: up to 50 keys, keys ≤ 40 characters,
 * values ≤ 500 characters, all strings. Empty values are dropped.
 * @param {unknown} value
 * @param {string} param
 * @returns {Record<string, string>}
 */
function metadataParam(value, param = 'metadata') {
  if (value === undefined || value === '') return {};
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    throw invalid(param, `Invalid object: ${param} must be a set of key-value pairs.`);
  }
  /** @type {Record<string, string>} */
  const out = {};
  for (const [k, v] of Object.entries(value)) {
    if (typeof v !== 'string') throw invalid(`${param}[${k}]`, 'Metadata values must be strings.');
    if (k.length > 40) throw invalid(`${param}[${k}]`, 'Metadata keys can be at most 40 characters long.');
    if (v.length > 500) throw invalid(`${param}[${k}]`, 'Metadata values can be at most 500 characters long.');
    if (v !== '') out[k] = v;
  }
  if (Object.keys(out).length > 50) throw invalid(param, 'Metadata can have at most 50 keys.');
  return out;
}

/** @param {unknown} value @param {string} param */
function objectParam(value, param) {
  if (value === undefined || value === '') return /** @type {Record<string, any>} */ ({});
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    throw invalid(param, `Invalid object: ${param}.`);
  }
  return /** @type {Record<string, any>} */ (value);
}

/** @param {unknown} value @param {string} param */
function currencyParam(value, param) {
  const text = stringParam(value, param, { optional: false, max: 3 });
  const code = /** @type {string} */ (text).toLowerCase();
  if (!/^[a-z]{3}$/.test(code)) throw invalid(param, `Invalid currency: ${text}. Use a three-letter ISO 4217 code.`);
  return code;
}

const EURO_COUNTRIES = new Set(['AT', 'BE', 'CY', 'DE', 'EE', 'ES', 'FI', 'FR', 'GR', 'HR', 'IE', 'IT', 'LT', 'LU', 'LV', 'MT', 'NL', 'PT', 'SI', 'SK']);
const COUNTRY_CURRENCY = /** @type {Record<string, string>} */ ({
  US: 'usd',
  GB: 'gbp',
  CH: 'chf',
  CA: 'cad',
  AU: 'aud',
  SE: 'sek',
  DK: 'dkk',
  NO: 'nok',
  PL: 'pln',
  CZ: 'czk',
  JP: 'jpy',
});

/** @param {string} country */
const currencyForCountry = (country) => (EURO_COUNTRIES.has(country) ? 'eur' : (COUNTRY_CURRENCY[country] ?? 'usd'));

/** @param {string} a @param {string} b */
function safeEqual(a, b) {
  const x = Buffer.from(a);
  const y = Buffer.from(b);
  return x.length === y.length && timingSafeEqual(x, y);
}

/** @param {string} key */
function redactKey(key) {
  if (key.length <= 12) return '*'.repeat(key.length);
  return `${key.slice(0, 8)}${'*'.repeat(Math.max(4, key.length - 12))}${key.slice(-4)}`;
}

/**
 * @typedef {object} PaymentFakeOptions
 * @property {number} [port] TCP port; 0 (the default) picks a free one.
 * @property {string} [host] interface to bind; default 127.0.0.1.
 * @property {string} secretKey the only API key accepted (`sk_…`).
 * @property {string} webhookSecret signing secret for webhook deliveries (`whsec_…`).
 * @property {string} [webhookUrl] where events are POSTed; without it events are only logged.
 * @property {string} [publicUrl] base URL put in onboarding and pay links; default `http://host:port`.
 * @property {string} [apiVersion] `api_version` of events; default: the version the SDK sent.
 * @property {number[]} [retryDelaysMs] waits before each retry of a failed delivery; default [250, 1000].
 * @property {number} [attemptTimeoutMs] per delivery attempt; default 1500.
 * @property {number} [responseBudgetMs] how long a page waits for a delivery before answering; default 2000.
 */

/**
 * @typedef {object} DeliveryRecord
 * @property {string} eventId
 * @property {string} type
 * @property {string | null} url
 * @property {number} attempt 1 for the first try of a send
 * @property {boolean} redelivery true when asked for through /_fake/redeliver
 * @property {number | null} signedAt the `t` of the signature header
 * @property {number | null} status HTTP status the target answered
 * @property {boolean} ok
 * @property {string | null} error
 * @property {string} at ISO time of the attempt
 */

/**
 * Starts the fake.
 * @param {PaymentFakeOptions} options
 */
export async function startPaymentFake(options) {
  const { port = 0, host = '127.0.0.1', secretKey, webhookSecret, retryDelaysMs = [250, 1000], attemptTimeoutMs = 1500, responseBudgetMs = 2000 } = options;
  if (typeof secretKey !== 'string' || !secretKey.startsWith('sk_')) {
    throw new Error('startPaymentFake: secretKey must be a secret API key starting with "sk_"');
  }
  if (typeof webhookSecret !== 'string' || webhookSecret.length < 8) {
    throw new Error('startPaymentFake: webhookSecret must be set (for example "whsec_…")');
  }
  let webhookUrl = options.webhookUrl || null;
  let publicUrl = options.publicUrl?.replace(/\/+$/, '') ?? '';
  let apiVersion = options.apiVersion ?? null;

  const state = {
    /** @type {Map<string, Record<string, any>>} connected accounts by id */
    accounts: new Map(),
    /** @type {Map<string, { token: string, account: string, refresh_url: string, return_url: string, expires_at: number, used: boolean }>} onboarding links by token */
    accountLinks: new Map(),
    /** @type {Map<string, Record<string, any>>} Checkout Sessions by id */
    checkoutSessions: new Map(),
    /** @type {Map<string, Record<string, any>>} PaymentIntents by id */
    paymentIntents: new Map(),
    /** @type {Record<string, any>[]} every event, oldest first */
    events: [],
    /** @type {DeliveryRecord[]} every delivery attempt, oldest first */
    deliveries: [],
  };
  /** Details of a session that its public object does not show. */
  /** @type {Map<string, { lineItems: { name: string, unitAmount: number, quantity: number }[], destination: string | null, applicationFeeAmount: number | null, paymentIntentMetadata: Record<string, string>, customerEmail: string | null }>} */
  const sessionDetails = new Map();
  /** Raw bodies of events, so a redelivery sends the same bytes. */
  /** @type {Map<string, string>} */
  const eventPayloads = new Map();
  /** Versions the SDK sent when creating an object, for the events about it. */
  /** @type {Map<string, string>} */
  const apiVersions = new Map();
  /** Replies to POSTs by idempotency key. */
  /** @type {Map<string, { status: number, body: string }>} */
  const idempotent = new Map();

  // ---- delivery machinery -------------------------------------------------

  let closed = false;
  const closing = new AbortController();
  /** @type {Set<Promise<unknown>>} */
  const pending = new Set();
  /** @type {Set<{ timer: NodeJS.Timeout, resolve: () => void }>} */
  const sleepers = new Set();

  /** A wait that close() cuts short. @param {number} ms */
  function sleep(ms) {
    return new Promise((resolve) => {
      const entry = {
        timer: setTimeout(() => {
          sleepers.delete(entry);
          resolve(undefined);
        }, ms),
        resolve: () => resolve(undefined),
      };
      sleepers.add(entry);
    });
  }

  /** Waits for a promise at most `ms`; never rejects. @param {Promise<unknown>} p @param {number} ms */
  async function within(p, ms) {
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
   * Sends an event to the webhook URL, retrying a failed attempt after each
   * of `retryDelaysMs`. Resolves with the last attempt's record.
   * @param {Record<string, any>} event
   * @param {boolean} redelivery
   * @returns {Promise<DeliveryRecord>}
   */
  function deliver(event, redelivery) {
    const payload = /** @type {string} */ (eventPayloads.get(event.id));
    const url = webhookUrl;
    const job = (async () => {
      /** @type {DeliveryRecord} */
      let record = {
        eventId: event.id,
        type: event.type,
        url,
        attempt: 0,
        redelivery,
        signedAt: null,
        status: null,
        ok: false,
        error: 'no webhook URL configured',
        at: new Date().toISOString(),
      };
      if (!url) {
        state.deliveries.push(record);
        return record;
      }
      for (let attempt = 1; attempt <= retryDelaysMs.length + 1 && !closed; attempt++) {
        const signedAt = nowSeconds();
        record = {
          eventId: event.id,
          type: event.type,
          url,
          attempt,
          redelivery,
          signedAt,
          status: null,
          ok: false,
          error: null,
          at: new Date().toISOString(),
        };
        state.deliveries.push(record);
        try {
          const res = await fetch(url, {
            method: 'POST',
            redirect: 'manual',
            headers: {
              'content-type': 'application/json; charset=utf-8',
              'stripe-signature': signatureHeader(payload, webhookSecret, signedAt),
              'user-agent': 'BroodsilkPaymentFake/1 (local test stand-in)',
            },
            body: payload,
            signal: AbortSignal.any([closing.signal, AbortSignal.timeout(attemptTimeoutMs)]),
          });
          record.status = res.status;
          record.ok = res.status >= 200 && res.status < 300;
          if (!record.ok) record.error = `webhook target answered ${res.status}`;
          await res.arrayBuffer().catch(() => undefined);
        } catch (err) {
          record.error = err instanceof Error ? err.message : String(err);
        }
        if (record.ok) break;
        if (attempt <= retryDelaysMs.length && !closed) await sleep(retryDelaysMs[attempt - 1]);
      }
      return record;
    })();
    pending.add(job);
    job.finally(() => pending.delete(job)).catch(() => undefined);
    return job;
  }

  /**
   * Records an event and starts its delivery.
   * @param {string} type
   * @param {Record<string, any>} object snapshot of the object the event is about
   * @param {{ account?: string, previousAttributes?: Record<string, any>, apiVersion?: string | null }} [extra]
   */
  function emit(type, object, extra = {}) {
    /** @type {Record<string, any>} */
    const event = {
      id: makeId('evt_'),
      object: 'event',
      ...(extra.account ? { account: extra.account } : {}),
      api_version: apiVersion ?? extra.apiVersion ?? null,
      created: nowSeconds(),
      data: {
        object: structuredClone(object),
        ...(extra.previousAttributes ? { previous_attributes: extra.previousAttributes } : {}),
      },
      livemode: false,
      pending_webhooks: webhookUrl ? 1 : 0,
      request: { id: null, idempotency_key: null },
      type,
    };
    state.events.push(event);
    eventPayloads.set(event.id, JSON.stringify(event, null, 2));
    return { event, delivery: deliver(event, false) };
  }

  // ---- API handlers ---------------------------------------------------------

  /** @param {import('node:http').IncomingMessage} req */
  function checkApiKey(req) {
    const header = req.headers.authorization ?? '';
    let key = '';
    const bearer = /^Bearer\s+(\S+)$/i.exec(header);
    const basic = /^Basic\s+(\S+)$/i.exec(header);
    if (bearer) key = bearer[1];
    else if (basic) key = Buffer.from(basic[1], 'base64').toString('utf8').split(':')[0];
    if (!key) {
      throw new ApiError(401, 'You did not provide an API key. Send it as a Bearer token in the Authorization header.');
    }
    if (!safeEqual(key, secretKey)) throw new ApiError(401, `Invalid API Key provided: ${redactKey(key)}`);
  }

  /** @param {Record<string, any>} params @param {string | null} version */
  function createAccount(params, version) {
    const type = stringParam(params.type, 'type') ?? 'express';
    if (type !== 'express') throw invalid('type', `This local fake creates only express accounts, not '${type}'.`);
    const country = (stringParam(params.country, 'country', { max: 2 }) ?? 'US').toUpperCase();
    if (!/^[A-Z]{2}$/.test(country)) throw invalid('country', `Invalid country: ${country}`);
    const email = stringParam(params.email, 'email', { max: 800 });
    const businessType = stringParam(params.business_type, 'business_type');
    const requested = Object.keys(objectParam(params.capabilities, 'capabilities'));
    const capabilityNames = requested.length ? requested : ['card_payments', 'transfers'];
    const due = ['business_type', 'external_account', 'tos_acceptance.date', 'tos_acceptance.ip'];
    const account = {
      id: makeId('acct_', 16),
      object: 'account',
      business_profile: { mcc: null, name: null, product_description: null, support_email: null, url: null },
      business_type: businessType,
      capabilities: Object.fromEntries(capabilityNames.map((c) => [c, 'inactive'])),
      charges_enabled: false,
      controller: { type: 'application', is_controller: true },
      country,
      created: nowSeconds(),
      default_currency: currencyForCountry(country),
      details_submitted: false,
      email,
      external_accounts: { object: 'list', data: [], has_more: false, total_count: 0, url: '' },
      metadata: metadataParam(params.metadata),
      payouts_enabled: false,
      requirements: {
        currently_due: [...due],
        eventually_due: [...due],
        past_due: [...due],
        pending_verification: [],
        disabled_reason: 'requirements.past_due',
        current_deadline: null,
        errors: [],
      },
      settings: { payouts: { schedule: { interval: 'daily' } } },
      tos_acceptance: { date: null },
      type,
    };
    account.external_accounts.url = `/v1/accounts/${account.id}/external_accounts`;
    state.accounts.set(account.id, account);
    if (!apiVersion && version) apiVersions.set(account.id, version);
    return account;
  }

  /** @param {Record<string, any>} params */
  function createAccountLink(params) {
    const accountId = stringParam(params.account, 'account', { optional: false });
    const account = state.accounts.get(/** @type {string} */ (accountId));
    if (!account) throw missing('account', /** @type {string} */ (accountId), 'account');
    const type = stringParam(params.type, 'type', { optional: false });
    if (type !== 'account_onboarding') {
      throw invalid('type', `This local fake supports only type=account_onboarding links, not '${type}'.`);
    }
    const refreshUrl = /** @type {string} */ (urlParam(params.refresh_url, 'refresh_url', { optional: false }));
    const returnUrl = /** @type {string} */ (urlParam(params.return_url, 'return_url', { optional: false }));
    const created = nowSeconds();
    const token = makeId('', 32);
    const link = { token, account: account.id, refresh_url: refreshUrl, return_url: returnUrl, expires_at: created + ACCOUNT_LINK_TTL_S, used: false };
    state.accountLinks.set(token, link);
    return {
      object: 'account_link',
      created,
      expires_at: link.expires_at,
      url: `${publicUrl}/onboarding/${encodeURIComponent(account.id)}?link=${token}`,
    };
  }

  /** @param {Record<string, any>} params @param {string | null} version */
  function createCheckoutSession(params, version) {
    const mode = stringParam(params.mode, 'mode', { optional: false });
    if (mode !== 'payment') throw invalid('mode', `This local fake supports only mode=payment, not '${mode}'.`);
    const items = params.line_items;
    if (items === undefined || items === '') throw required('line_items');
    if (!Array.isArray(items) || items.length === 0) throw invalid('line_items', 'line_items must be a non-empty list.');
    /** @type {string | null} */
    let currency = null;
    const lineItems = items.map((raw, i) => {
      const item = objectParam(raw, `line_items[${i}]`);
      if (item.price !== undefined) {
        throw invalid(`line_items[${i}][price]`, 'This local fake supports only price_data line items, not saved prices.');
      }
      const priceData = objectParam(item.price_data, `line_items[${i}][price_data]`);
      if (!Object.keys(priceData).length) throw required(`line_items[${i}][price_data]`);
      const itemCurrency = currencyParam(priceData.currency, `line_items[${i}][price_data][currency]`);
      if (currency && itemCurrency !== currency) {
        throw invalid(`line_items[${i}][price_data][currency]`, 'All line items must use the same currency.');
      }
      currency = itemCurrency;
      const unitAmount = /** @type {number} */ (integerParam(priceData.unit_amount, `line_items[${i}][price_data][unit_amount]`));
      const productData = objectParam(priceData.product_data, `line_items[${i}][price_data][product_data]`);
      const name = /** @type {string} */ (stringParam(productData.name, `line_items[${i}][price_data][product_data][name]`, { optional: false }));
      const quantity = /** @type {number} */ (integerParam(item.quantity, `line_items[${i}][quantity]`, { min: 1 }));
      return { name, unitAmount, quantity };
    });
    const amountTotal = lineItems.reduce((sum, li) => sum + li.unitAmount * li.quantity, 0);
    if (!Number.isSafeInteger(amountTotal)) throw invalid('line_items', 'The total amount is too large.');

    const pid = objectParam(params.payment_intent_data, 'payment_intent_data');
    const transferData = objectParam(pid.transfer_data, 'payment_intent_data[transfer_data]');
    const destination = stringParam(transferData.destination, 'payment_intent_data[transfer_data][destination]');
    if (destination) {
      const account = state.accounts.get(destination);
      if (!account) {
        throw new ApiError(400, `No such destination: '${destination}'`, {
          code: 'resource_missing',
          param: 'payment_intent_data[transfer_data][destination]',
        });
      }
      if (!account.charges_enabled || !account.details_submitted) {
        throw invalid(
          'payment_intent_data[transfer_data][destination]',
          `The destination account ${destination} has not completed onboarding, so it cannot receive transfers yet.`,
        );
      }
    }
    const applicationFeeAmount = integerParam(pid.application_fee_amount, 'payment_intent_data[application_fee_amount]', { optional: true });
    if (applicationFeeAmount !== null) {
      if (!destination) {
        throw invalid(
          'payment_intent_data[application_fee_amount]',
          'An application fee needs a connected account (payment_intent_data[transfer_data][destination]).',
        );
      }
      if (applicationFeeAmount > amountTotal) {
        throw invalid('payment_intent_data[application_fee_amount]', 'The application fee cannot be greater than the amount of the payment.');
      }
    }
    const created = nowSeconds();
    const id = makeId('cs_test_', 40);
    const session = {
      id,
      object: 'checkout.session',
      amount_subtotal: amountTotal,
      amount_total: amountTotal,
      cancel_url: urlParam(params.cancel_url, 'cancel_url'),
      client_reference_id: stringParam(params.client_reference_id, 'client_reference_id', { max: 200 }),
      created,
      currency,
      customer: null,
      customer_details: null,
      customer_email: stringParam(params.customer_email, 'customer_email', { max: 800 }),
      expires_at: created + CHECKOUT_TTL_S,
      livemode: false,
      metadata: metadataParam(params.metadata),
      mode: 'payment',
      payment_intent: null,
      payment_method_types: ['card'],
      payment_status: 'unpaid',
      status: 'open',
      success_url: urlParam(params.success_url, 'success_url'),
      url: `${publicUrl}/pay/${id}`,
    };
    state.checkoutSessions.set(id, session);
    sessionDetails.set(id, {
      lineItems,
      destination,
      applicationFeeAmount,
      paymentIntentMetadata: metadataParam(pid.metadata, 'payment_intent_data[metadata]'),
      customerEmail: session.customer_email,
    });
    if (!apiVersion && version) apiVersions.set(id, version);
    return session;
  }

  /** @param {string} id */
  function expireCheckoutSession(id) {
    const session = state.checkoutSessions.get(id);
    if (!session) throw missing('checkout.session', id);
    if (session.status !== 'open') {
      throw new ApiError(400, `Only open checkout sessions can be expired; this one is ${session.status}.`, { code: 'checkout_session_not_open' });
    }
    session.status = 'expired';
    session.url = null;
    return { session, ...emit('checkout.session.expired', session, { apiVersion: apiVersions.get(id) }) };
  }

  /**
   * Routes a /v1 call. Returns [status, body].
   * @param {string} method
   * @param {string} path
   * @param {Record<string, any>} params
   * @param {string | null} version Stripe-Version the SDK sent
   * @returns {Promise<[number, unknown]>}
   */
  async function api(method, path, params, version) {
    let m;
    if (method === 'POST' && path === '/v1/accounts') return [200, createAccount(params, version)];
    if (method === 'GET' && (m = /^\/v1\/accounts\/([^/]+)$/.exec(path))) {
      const account = state.accounts.get(decodePart(m[1]));
      if (!account) throw missing('account', decodePart(m[1]));
      return [200, account];
    }
    if (method === 'POST' && path === '/v1/account_links') return [200, createAccountLink(params)];
    if (method === 'POST' && path === '/v1/checkout/sessions') return [200, createCheckoutSession(params, version)];
    if (method === 'GET' && (m = /^\/v1\/checkout\/sessions\/([^/]+)$/.exec(path))) {
      const id = decodePart(m[1]);
      const session = state.checkoutSessions.get(id);
      if (!session) throw missing('checkout.session', id);
      return [200, session];
    }
    if (method === 'POST' && (m = /^\/v1\/checkout\/sessions\/([^/]+)\/expire$/.exec(path))) {
      const { session, delivery } = expireCheckoutSession(decodePart(m[1]));
      await within(delivery, responseBudgetMs);
      return [200, session];
    }
    if (method === 'GET' && (m = /^\/v1\/payment_intents\/([^/]+)$/.exec(path))) {
      const id = decodePart(m[1]);
      const intent = state.paymentIntents.get(id);
      if (!intent) throw missing('payment_intent', id);
      return [200, intent];
    }
    if (method === 'GET' && (m = /^\/v1\/events\/([^/]+)$/.exec(path))) {
      const id = decodePart(m[1]);
      const event = state.events.find((e) => e.id === id);
      if (!event) throw missing('event', id);
      return [200, event];
    }
    if (method === 'GET' && path === '/v1/events') {
      const type = typeof params.type === 'string' ? params.type : null;
      const data = state.events.filter((e) => !type || e.type === type).reverse();
      return [200, { object: 'list', data, has_more: false, url: '/v1/events' }];
    }
    throw new ApiError(
      404,
      `Unrecognized request URL (${method}: ${path}). This local fake answers only the calls Broodsilk makes; see scripts/payment-fake/README.md.`,
    );
  }

  // ---- pages ------------------------------------------------------------------

  /**
   * @param {import('node:http').ServerResponse} res
   * @param {number} status
   * @param {string} html
   */
  function sendHtml(res, status, html) {
    res.writeHead(status, { 'content-type': 'text/html; charset=utf-8', 'cache-control': 'no-store' });
    res.end(html);
  }

  /** @param {import('node:http').ServerResponse} res @param {string} location */
  function redirect(res, location) {
    res.writeHead(303, { location, 'cache-control': 'no-store' });
    res.end();
  }

  /**
   * @param {string} method
   * @param {string} accountId
   * @param {URLSearchParams} query
   * @param {Record<string, any>} form
   * @param {import('node:http').ServerResponse} res
   */
  async function onboarding(method, accountId, query, form, res) {
    const token = method === 'GET' ? (query.get('link') ?? '') : typeof form.link === 'string' ? form.link : '';
    const link = state.accountLinks.get(token);
    const account = state.accounts.get(accountId);
    if (!link || !account || link.account !== accountId) {
      return sendHtml(res, 404, messagePage('Link not found', 'This onboarding link is not known to the local payment stand-in.'));
    }
    if (link.used || link.expires_at < nowSeconds()) return redirect(res, link.refresh_url);
    if (method === 'GET') return sendHtml(res, 200, onboardingPage({ account, linkToken: token }));

    link.used = true;
    if (form.action === 'complete') {
      const before = { charges_enabled: account.charges_enabled, payouts_enabled: account.payouts_enabled, details_submitted: account.details_submitted };
      if (!account.charges_enabled || !account.payouts_enabled || !account.details_submitted) {
        account.charges_enabled = true;
        account.payouts_enabled = true;
        account.details_submitted = true;
        account.business_type ??= 'individual';
        account.capabilities = Object.fromEntries(Object.keys(account.capabilities).map((c) => [c, 'active']));
        account.requirements = {
          currently_due: [],
          eventually_due: [],
          past_due: [],
          pending_verification: [],
          disabled_reason: null,
          current_deadline: null,
          errors: [],
        };
        account.tos_acceptance = { date: nowSeconds() };
        const { delivery } = emit('account.updated', account, {
          account: account.id,
          previousAttributes: before,
          apiVersion: apiVersions.get(account.id),
        });
        await within(delivery, responseBudgetMs);
      }
    }
    return redirect(res, link.return_url);
  }

  /** @param {string} url @param {string} id */
  const fillSessionId = (url, id) => url.replaceAll('{CHECKOUT_SESSION_ID}', id);

  /**
   * @param {string} method
   * @param {string} sessionId
   * @param {string | undefined} action
   * @param {import('node:http').ServerResponse} res
   */
  async function pay(method, sessionId, action, res) {
    const session = state.checkoutSessions.get(sessionId);
    const details = sessionDetails.get(sessionId);
    if (!session || !details) {
      return sendHtml(res, 404, messagePage('Checkout not found', 'This checkout session is not known to the local payment stand-in.'));
    }
    if (method === 'GET' && !action) {
      return sendHtml(
        res,
        200,
        payPage({ session, lineItems: details.lineItems, destination: details.destination, applicationFeeAmount: details.applicationFeeAmount }),
      );
    }
    if (method !== 'POST') return sendHtml(res, 405, messagePage('Not allowed', 'Use the buttons on the pay page.'));
    if (action === 'cancel') {
      if (session.cancel_url && session.status === 'open') return redirect(res, fillSessionId(session.cancel_url, session.id));
      return sendHtml(res, 200, messagePage('Payment cancelled', 'Nothing was paid.'));
    }
    if (session.status === 'complete') {
      // A second press of "Pay": nothing new happens, as with the provider.
      if (session.success_url) return redirect(res, fillSessionId(session.success_url, session.id));
      return sendHtml(res, 200, messagePage('Already paid', 'This checkout session was already paid.'));
    }
    if (session.status !== 'open') {
      return sendHtml(res, 410, messagePage('Checkout closed', `This checkout session is ${session.status}; it cannot be paid.`));
    }
    const intent = {
      id: makeId('pi_'),
      object: 'payment_intent',
      amount: session.amount_total,
      amount_received: session.amount_total,
      application_fee_amount: details.applicationFeeAmount,
      created: nowSeconds(),
      currency: session.currency,
      latest_charge: makeId('ch_'),
      livemode: false,
      metadata: details.paymentIntentMetadata,
      payment_method_types: ['card'],
      status: 'succeeded',
      transfer_data: details.destination ? { destination: details.destination } : null,
    };
    state.paymentIntents.set(intent.id, intent);
    session.status = 'complete';
    session.payment_status = 'paid';
    session.payment_intent = intent.id;
    session.customer_details = { email: details.customerEmail, name: null };
    session.url = null;
    const { delivery } = emit('checkout.session.completed', session, { apiVersion: apiVersions.get(session.id) });
    await within(delivery, responseBudgetMs);
    if (session.success_url) return redirect(res, fillSessionId(session.success_url, session.id));
    return sendHtml(res, 200, messagePage('Payment complete', 'The test payment went through.'));
  }

  // ---- HTTP plumbing ------------------------------------------------------------

  /** @param {import('node:http').IncomingMessage} req @returns {Promise<string>} */
  function readBody(req) {
    return new Promise((resolve, reject) => {
      /** @type {Buffer[]} */
      const chunks = [];
      let size = 0;
      req.on('data', (chunk) => {
        size += chunk.length;
        if (size > MAX_BODY_BYTES) {
          reject(new ApiError(413, 'Request body too large.'));
          req.destroy();
          return;
        }
        chunks.push(chunk);
      });
      req.on('end', () => resolve(Buffer.concat(chunks).toString('utf8')));
      req.on('error', reject);
    });
  }

  /** @param {import('node:http').IncomingMessage} req @param {string} body */
  function parseParams(req, body, query = '') {
    const type = (req.headers['content-type'] ?? '').split(';')[0].trim().toLowerCase();
    if (body && type && type !== 'application/x-www-form-urlencoded') {
      throw new ApiError(400, `Unsupported Content-Type ${type}: send application/x-www-form-urlencoded.`);
    }
    try {
      return { ...parseFormBody(query), ...parseFormBody(body) };
    } catch (err) {
      if (err instanceof FormError) throw new ApiError(400, err.message, { code: 'parameter_invalid', param: err.param });
      throw err;
    }
  }

  /**
   * @param {import('node:http').ServerResponse} res
   * @param {number} status
   * @param {unknown} body
   * @param {Record<string, string>} [headers]
   */
  function sendJson(res, status, body, headers = {}) {
    const text = typeof body === 'string' ? body : JSON.stringify(body, null, 2);
    res.writeHead(status, { 'content-type': 'application/json', 'cache-control': 'no-store', ...headers });
    res.end(text);
  }

  /** @param {import('node:http').IncomingMessage} req @param {import('node:http').ServerResponse} res */
  async function handle(req, res) {
    const method = req.method ?? 'GET';
    const url = new URL(req.url ?? '/', 'http://fake.invalid');
    const path = url.pathname;
    let m;

    if (path.startsWith('/v1/')) {
      const requestId = makeId('req_', 14);
      const version = typeof req.headers['stripe-version'] === 'string' ? req.headers['stripe-version'] : null;
      /** @type {Record<string, string>} */
      const headers = { 'request-id': requestId, ...(version ? { 'stripe-version': version } : {}) };
      try {
        checkApiKey(req);
        const body = await readBody(req);
        const params = parseParams(req, body, method === 'GET' ? url.search.slice(1) : '');
        const key = method === 'POST' && typeof req.headers['idempotency-key'] === 'string' ? `${path}\n${req.headers['idempotency-key']}` : null;
        const earlier = key ? idempotent.get(key) : undefined;
        if (earlier) return sendJson(res, earlier.status, earlier.body, { ...headers, 'idempotent-replayed': 'true' });
        const [status, result] = await api(method, path, params, version);
        const text = JSON.stringify(result, null, 2);
        if (key) idempotent.set(key, { status, body: text });
        return sendJson(res, status, text, headers);
      } catch (err) {
        if (err instanceof ApiError) return sendJson(res, err.status, err.toJSON(), headers);
        throw err;
      }
    }

    if ((m = /^\/onboarding\/([^/]+)$/.exec(path)) && (method === 'GET' || method === 'POST')) {
      let form = {};
      try {
        if (method === 'POST') form = parseFormBody(await readBody(req));
      } catch (err) {
        if (err instanceof FormError || err instanceof ApiError) return sendHtml(res, 400, messagePage('Bad request', err.message));
        throw err;
      }
      return onboarding(method, decodePart(m[1]), url.searchParams, form, res);
    }
    if ((m = /^\/pay\/([^/]+?)(?:\/(cancel))?$/.exec(path))) {
      if (method === 'POST') {
        try {
          await readBody(req);
        } catch (err) {
          if (err instanceof ApiError) return sendHtml(res, err.status, messagePage('Bad request', err.message));
          throw err;
        }
      }
      return pay(method, decodePart(m[1]), m[2], res);
    }
    if (method === 'GET' && path === '/_fake/events') {
      return sendJson(res, 200, { events: state.events, deliveries: state.deliveries });
    }
    if (method === 'POST' && (m = /^\/_fake\/redeliver\/([^/]+)$/.exec(path))) {
      const event = state.events.find((e) => e.id === decodePart(m[1]));
      if (!event) return sendJson(res, 404, new ApiError(404, `No such event: '${decodePart(m[1])}'`, { code: 'resource_missing' }).toJSON());
      /** @type {DeliveryRecord | null} */
      let record = null;
      const job = deliver(event, true);
      job.then(
        (r) => {
          record = r;
        },
        () => undefined,
      );
      await within(job, responseBudgetMs);
      return sendJson(res, 202, { event: event.id, delivery: record ?? 'still trying' });
    }
    if (method === 'GET' && path === '/') {
      return sendHtml(
        res,
        200,
        messagePage(
          'Payment provider stand-in',
          `Running. ${state.accounts.size} connected account(s), ${state.checkoutSessions.size} checkout session(s), ${state.events.length} event(s). API at /v1, event log at /_fake/events.`,
        ),
      );
    }
    return sendHtml(res, 404, messagePage('Not found', `Nothing at ${method} ${path} on the local payment stand-in.`));
  }

  const server = createServer((req, res) => {
    handle(req, res).catch((err) => {
      if (res.headersSent) {
        res.destroy();
        return;
      }
      sendJson(res, 500, { error: { type: 'api_error', message: `Local payment fake failed: ${err instanceof Error ? err.message : String(err)}` } });
    });
  });

  await new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => {
      server.off('error', reject);
      resolve(undefined);
    });
  });
  const address = server.address();
  const boundPort = typeof address === 'object' && address ? address.port : port;
  const url = `http://${host.includes(':') ? `[${host}]` : host}:${boundPort}`;
  if (!publicUrl) publicUrl = url;

  return {
    port: boundPort,
    url,
    state,
    /** Changes where later events are delivered (null: log only). @param {string | null} next */
    setWebhookUrl(next) {
      webhookUrl = next || null;
    },
    /** Resolves once no delivery (or retry) is in flight. */
    async whenDeliveriesSettled() {
      while (pending.size) await Promise.allSettled([...pending]);
    },
    /** Stops listening, cancels retries and waits for the server to close. */
    async close() {
      closed = true;
      closing.abort();
      for (const s of sleepers) {
        clearTimeout(s.timer);
        s.resolve();
      }
      sleepers.clear();
      await Promise.allSettled([...pending]);
      await new Promise((resolve) => {
        server.close(() => resolve(undefined));
        server.closeAllConnections();
      });
    },
  };
}
