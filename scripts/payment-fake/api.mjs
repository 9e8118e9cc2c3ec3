// @ts-check
/**
 * The `/v1` API: the API key check, idempotent replays and the router over
 * the calls Broodsilk makes.
 */
import { timingSafeEqual } from 'node:crypto';
import { createAccount, createAccountLink } from './accounts.mjs';
import { createCheckoutSession, expireCheckoutSession } from './checkout.mjs';
import { within } from './delivery.mjs';
import { decodePart, parseParams, readBody, sendJson } from './http.mjs';
import { makeId } from './ids.mjs';
import { ApiError, missing } from './params.mjs';

/**
 * @typedef {import('./context.mjs').FakeContext} FakeContext
 * @typedef {import('node:http').IncomingMessage} IncomingMessage
 * @typedef {import('node:http').ServerResponse} ServerResponse
 */

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

/** The key as the SDK sends it: a Bearer token, or Basic auth with the key as user name. @param {string} secretKey @param {IncomingMessage} req */
function checkApiKey(secretKey, req) {
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

/**
 * The object looked up, or the provider's 404.
 * @template T
 * @param {T | undefined} value
 * @param {string} kind
 * @param {string} id
 * @returns {T}
 */
function orMissing(value, kind, id) {
  if (!value) throw missing(kind, id);
  return value;
}

/**
 * Routes a /v1 call. Returns [status, body].
 * @param {FakeContext} ctx
 * @param {string} method
 * @param {string} path
 * @param {Record<string, any>} params
 * @param {string | null} version Stripe-Version the SDK sent
 * @returns {Promise<[number, unknown]>}
 */
async function route(ctx, method, path, params, version) {
  const { state } = ctx;
  /** @type {RegExpExecArray | null} */
  let m;
  if (method === 'POST' && path === '/v1/accounts') return [200, createAccount(ctx, params, version)];
  if (method === 'GET' && (m = /^\/v1\/accounts\/([^/]+)$/.exec(path))) {
    const id = decodePart(m[1]);
    return [200, orMissing(state.accounts.get(id), 'account', id)];
  }
  if (method === 'POST' && path === '/v1/account_links') return [200, createAccountLink(ctx, params)];
  if (method === 'POST' && path === '/v1/checkout/sessions') return [200, createCheckoutSession(ctx, params, version)];
  if (method === 'GET' && (m = /^\/v1\/checkout\/sessions\/([^/]+)$/.exec(path))) {
    const id = decodePart(m[1]);
    return [200, orMissing(state.checkoutSessions.get(id), 'checkout.session', id)];
  }
  if (method === 'POST' && (m = /^\/v1\/checkout\/sessions\/([^/]+)\/expire$/.exec(path))) {
    const { session, delivery } = expireCheckoutSession(ctx, decodePart(m[1]));
    await within(delivery, ctx.config.responseBudgetMs);
    return [200, session];
  }
  if (method === 'GET' && (m = /^\/v1\/payment_intents\/([^/]+)$/.exec(path))) {
    const id = decodePart(m[1]);
    return [200, orMissing(state.paymentIntents.get(id), 'payment_intent', id)];
  }
  if (method === 'GET' && (m = /^\/v1\/events\/([^/]+)$/.exec(path))) {
    const id = decodePart(m[1]);
    return [
      200,
      orMissing(
        state.events.find((e) => e.id === id),
        'event',
        id,
      ),
    ];
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

/**
 * Answers a `/v1` request: API key, parameters, a replay of an earlier reply
 * to the same Idempotency-Key, else the call; errors as the provider's error object.
 * @param {FakeContext} ctx
 * @param {IncomingMessage} req
 * @param {ServerResponse} res
 * @param {string} method
 * @param {URL} url
 */
export async function handleApi(ctx, req, res, method, url) {
  const path = url.pathname;
  const requestId = makeId('req_', 14);
  const version = typeof req.headers['stripe-version'] === 'string' ? req.headers['stripe-version'] : null;
  /** @type {Record<string, string>} */
  const headers = { 'request-id': requestId, ...(version ? { 'stripe-version': version } : {}) };
  try {
    checkApiKey(ctx.config.secretKey, req);
    const body = await readBody(req);
    const params = parseParams(req, body, method === 'GET' ? url.search.slice(1) : '');
    const key = method === 'POST' && typeof req.headers['idempotency-key'] === 'string' ? `${path}\n${req.headers['idempotency-key']}` : null;
    const earlier = key ? ctx.internal.idempotent.get(key) : undefined;
    if (earlier) return sendJson(res, earlier.status, earlier.body, { ...headers, 'idempotent-replayed': 'true' });
    const [status, result] = await route(ctx, method, path, params, version);
    const text = JSON.stringify(result, null, 2);
    if (key) ctx.internal.idempotent.set(key, { status, body: text });
    return sendJson(res, status, text, headers);
  } catch (err) {
    if (err instanceof ApiError) return sendJson(res, err.status, err.toJSON(), headers);
    throw err;
  }
}
