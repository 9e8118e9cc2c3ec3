// @ts-check
/** The payment fake's front door: which part answers which request. */
import { handleApi } from './api.mjs';
import { deliver, within } from './delivery.mjs';
import { decodePart, sendHtml, sendJson } from './http.mjs';
import { onboarding, pay } from './page-handlers.mjs';
import { messagePage } from './pages.mjs';
import { ApiError } from './params.mjs';

/**
 * @typedef {import('./context.mjs').FakeContext} FakeContext
 * @typedef {import('./context.mjs').DeliveryRecord} DeliveryRecord
 * @typedef {import('node:http').IncomingMessage} IncomingMessage
 * @typedef {import('node:http').ServerResponse} ServerResponse
 */

/**
 * `POST /_fake/redeliver/:eventId`: the same event again (same bytes, fresh
 * signature); answers with the delivery if it ends within the response budget.
 * @param {FakeContext} ctx
 * @param {ServerResponse} res
 * @param {string} eventId
 */
async function redeliver(ctx, res, eventId) {
  const event = ctx.state.events.find((e) => e.id === eventId);
  if (!event) return sendJson(res, 404, new ApiError(404, `No such event: '${eventId}'`, { code: 'resource_missing' }).toJSON());
  /** @type {DeliveryRecord | null} */
  let record = null;
  const job = deliver(ctx, event, true);
  job.then(
    (r) => {
      record = r;
    },
    () => undefined,
  );
  await within(job, ctx.config.responseBudgetMs);
  return sendJson(res, 202, { event: event.id, delivery: record ?? 'still trying' });
}

/** @param {FakeContext} ctx */
function statusPage({ state }) {
  return messagePage(
    'Payment provider stand-in',
    `Running. ${state.accounts.size} connected account(s), ${state.checkoutSessions.size} checkout session(s), ${state.events.length} event(s). API at /v1, event log at /_fake/events.`,
  );
}

/**
 * @param {FakeContext} ctx
 * @param {IncomingMessage} req
 * @param {ServerResponse} res
 */
export async function handle(ctx, req, res) {
  const method = req.method ?? 'GET';
  const url = new URL(req.url ?? '/', 'http://fake.invalid');
  const path = url.pathname;
  /** @type {RegExpExecArray | null} */
  let m;
  if (path.startsWith('/v1/')) return handleApi(ctx, req, res, method, url);
  if ((m = /^\/onboarding\/([^/]+)$/.exec(path)) && (method === 'GET' || method === 'POST')) {
    return onboarding(ctx, req, res, decodePart(m[1]), url.searchParams);
  }
  if ((m = /^\/pay\/([^/]+?)(?:\/(cancel))?$/.exec(path))) return pay(ctx, req, res, decodePart(m[1]), m[2]);
  if (method === 'GET' && path === '/_fake/events') {
    return sendJson(res, 200, { events: ctx.state.events, deliveries: ctx.state.deliveries });
  }
  if (method === 'POST' && (m = /^\/_fake\/redeliver\/([^/]+)$/.exec(path))) return redeliver(ctx, res, decodePart(m[1]));
  if (method === 'GET' && path === '/') return sendHtml(res, 200, statusPage(ctx));
  return sendHtml(res, 404, messagePage('Not found', `Nothing at ${method} ${path} on the local payment stand-in.`));
}
