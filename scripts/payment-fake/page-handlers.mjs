// @ts-check
/**
 * The browser side of the payment fake: the onboarding and pay pages (their
 * HTML is in pages.mjs) and what their buttons do.
 */
import { completeOnboarding } from './accounts.mjs';
import { payCheckoutSession } from './checkout.mjs';
import { within } from './delivery.mjs';
import { FormError, parseFormBody } from './form.mjs';
import { readBody, redirect, sendHtml } from './http.mjs';
import { nowSeconds } from './ids.mjs';
import { messagePage, onboardingPage, payPage } from './pages.mjs';
import { ApiError } from './params.mjs';

/**
 * @typedef {import('./context.mjs').FakeContext} FakeContext
 * @typedef {import('node:http').IncomingMessage} IncomingMessage
 * @typedef {import('node:http').ServerResponse} ServerResponse
 */

/** @param {string} url @param {string} id */
const fillSessionId = (url, id) => url.replaceAll('{CHECKOUT_SESSION_ID}', id);

/**
 * `GET|POST /onboarding/:accountId`: the page, or what its buttons do. A link works once.
 * @param {FakeContext} ctx
 * @param {IncomingMessage} req
 * @param {ServerResponse} res
 * @param {string} accountId
 * @param {URLSearchParams} query
 */
export async function onboarding(ctx, req, res, accountId, query) {
  const method = req.method ?? 'GET';
  /** @type {Record<string, any>} */
  let form = {};
  try {
    if (method === 'POST') form = parseFormBody(await readBody(req));
  } catch (err) {
    if (err instanceof FormError || err instanceof ApiError) return sendHtml(res, 400, messagePage('Bad request', err.message));
    throw err;
  }
  const token = method === 'GET' ? (query.get('link') ?? '') : typeof form.link === 'string' ? form.link : '';
  const link = ctx.state.accountLinks.get(token);
  const account = ctx.state.accounts.get(accountId);
  if (!link || !account || link.account !== accountId) {
    return sendHtml(res, 404, messagePage('Link not found', 'This onboarding link is not known to the local payment stand-in.'));
  }
  if (link.used || link.expires_at < nowSeconds()) return redirect(res, link.refresh_url);
  if (method === 'GET') return sendHtml(res, 200, onboardingPage({ account: /** @type {any} */ (account), linkToken: token }));

  link.used = true;
  if (form.action === 'complete') {
    const delivery = completeOnboarding(ctx, account);
    if (delivery) await within(delivery, ctx.config.responseBudgetMs);
  }
  return redirect(res, link.return_url);
}

/**
 * `GET /pay/:sessionId` shows the session; `POST` pays it, `POST …/cancel` goes back.
 * @param {FakeContext} ctx
 * @param {IncomingMessage} req
 * @param {ServerResponse} res
 * @param {string} sessionId
 * @param {string | undefined} action
 */
export async function pay(ctx, req, res, sessionId, action) {
  const method = req.method ?? 'GET';
  if (method === 'POST') {
    try {
      await readBody(req);
    } catch (err) {
      if (err instanceof ApiError) return sendHtml(res, err.status, messagePage('Bad request', err.message));
      throw err;
    }
  }
  const session = ctx.state.checkoutSessions.get(sessionId);
  const details = ctx.internal.sessionDetails.get(sessionId);
  if (!session || !details) {
    return sendHtml(res, 404, messagePage('Checkout not found', 'This checkout session is not known to the local payment stand-in.'));
  }
  if (method === 'GET' && !action) {
    const { lineItems, destination, applicationFeeAmount } = details;
    return sendHtml(res, 200, payPage({ session: /** @type {any} */ (session), lineItems, destination, applicationFeeAmount }));
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
  await within(payCheckoutSession(ctx, session, details), ctx.config.responseBudgetMs);
  if (session.success_url) return redirect(res, fillSessionId(session.success_url, session.id));
  return sendHtml(res, 200, messagePage('Payment complete', 'The test payment went through.'));
}
