// @ts-check
/** Checkout Sessions in payment mode with a destination charge: creating, expiring and paying them. */
import { emit } from './delivery.mjs';
import { makeId, nowSeconds } from './ids.mjs';
import { ApiError, currencyParam, integerParam, invalid, metadataParam, missing, objectParam, required, stringParam, urlParam } from './params.mjs';

/**
 * @typedef {import('./context.mjs').FakeContext} FakeContext
 * @typedef {import('./context.mjs').LineItem} LineItem
 * @typedef {import('./context.mjs').SessionDetails} SessionDetails
 */

/** Lifetime of an open checkout session, seconds. */
const CHECKOUT_TTL_S = 24 * 3600;
const DESTINATION = 'payment_intent_data[transfer_data][destination]';
const FEE = 'payment_intent_data[application_fee_amount]';

/**
 * `line_items`: price_data items only, all in one currency.
 * @param {unknown} items
 * @returns {{ lineItems: LineItem[], currency: string, amountTotal: number }}
 */
function lineItemsParam(items) {
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
  // The first item set the currency (the list is not empty); the checker cannot see into the callback.
  return { lineItems, currency: /** @type {string} */ (/** @type {unknown} */ (currency)), amountTotal };
}

/**
 * The connected account paid, if any: it must exist and have completed onboarding.
 * @param {FakeContext} ctx
 * @param {Record<string, any>} pid payment_intent_data
 */
function destinationParam(ctx, pid) {
  const transferData = objectParam(pid.transfer_data, 'payment_intent_data[transfer_data]');
  const destination = stringParam(transferData.destination, DESTINATION);
  if (!destination) return destination;
  const account = ctx.state.accounts.get(destination);
  if (!account) throw new ApiError(400, `No such destination: '${destination}'`, { code: 'resource_missing', param: DESTINATION });
  if (!account.charges_enabled || !account.details_submitted) {
    throw invalid(DESTINATION, `The destination account ${destination} has not completed onboarding, so it cannot receive transfers yet.`);
  }
  return destination;
}

/**
 * The platform's fee: only with a destination, at most the total.
 * @param {Record<string, any>} pid payment_intent_data
 * @param {string | null} destination
 * @param {number} amountTotal
 */
function applicationFeeParam(pid, destination, amountTotal) {
  const fee = integerParam(pid.application_fee_amount, FEE, { optional: true });
  if (fee === null) return fee;
  if (!destination) throw invalid(FEE, `An application fee needs a connected account (${DESTINATION}).`);
  if (fee > amountTotal) throw invalid(FEE, 'The application fee cannot be greater than the amount of the payment.');
  return fee;
}

/** `POST /v1/checkout/sessions`. @param {FakeContext} ctx @param {Record<string, any>} params @param {string | null} version */
export function createCheckoutSession(ctx, params, version) {
  const mode = stringParam(params.mode, 'mode', { optional: false });
  if (mode !== 'payment') throw invalid('mode', `This local fake supports only mode=payment, not '${mode}'.`);
  const { lineItems, currency, amountTotal } = lineItemsParam(params.line_items);
  const pid = objectParam(params.payment_intent_data, 'payment_intent_data');
  const destination = destinationParam(ctx, pid);
  const applicationFeeAmount = applicationFeeParam(pid, destination, amountTotal);
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
    url: `${ctx.config.publicUrl}/pay/${id}`,
  };
  ctx.state.checkoutSessions.set(id, session);
  ctx.internal.sessionDetails.set(id, {
    lineItems,
    destination,
    applicationFeeAmount,
    paymentIntentMetadata: metadataParam(pid.metadata, 'payment_intent_data[metadata]'),
    customerEmail: session.customer_email,
  });
  if (!ctx.config.apiVersion && version) ctx.internal.apiVersions.set(id, version);
  return session;
}

/** `POST /v1/checkout/sessions/:id/expire`. @param {FakeContext} ctx @param {string} id */
export function expireCheckoutSession(ctx, id) {
  const session = ctx.state.checkoutSessions.get(id);
  if (!session) throw missing('checkout.session', id);
  if (session.status !== 'open') {
    throw new ApiError(400, `Only open checkout sessions can be expired; this one is ${session.status}.`, { code: 'checkout_session_not_open' });
  }
  session.status = 'expired';
  session.url = null;
  return { session, ...emit(ctx, 'checkout.session.expired', session, { apiVersion: ctx.internal.apiVersions.get(id) }) };
}

/**
 * Pays an open session: a succeeded PaymentIntent to the destination, the
 * session complete and paid, and a `checkout.session.completed` event.
 * Returns that event's delivery.
 * @param {FakeContext} ctx
 * @param {Record<string, any>} session
 * @param {SessionDetails} details
 */
export function payCheckoutSession(ctx, session, details) {
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
  ctx.state.paymentIntents.set(intent.id, intent);
  session.status = 'complete';
  session.payment_status = 'paid';
  session.payment_intent = intent.id;
  session.customer_details = { email: details.customerEmail, name: null };
  session.url = null;
  return emit(ctx, 'checkout.session.completed', session, { apiVersion: ctx.internal.apiVersions.get(session.id) }).delivery;
}
