// @ts-check
/** Connected accounts (express) and their onboarding links and completion. */
import { emit } from './delivery.mjs';
import { makeId, nowSeconds } from './ids.mjs';
import { currencyForCountry, invalid, metadataParam, missing, objectParam, stringParam, urlParam } from './params.mjs';

/** @typedef {import('./context.mjs').FakeContext} FakeContext */

/** Lifetime of an onboarding link, seconds (the provider's links are short-lived too). */
const ACCOUNT_LINK_TTL_S = 300;

/** What the provider asks of a new express account before it may take charges. */
const DUE_AT_START = ['business_type', 'external_account', 'tos_acceptance.date', 'tos_acceptance.ip'];

/** `POST /v1/accounts`. @param {FakeContext} ctx @param {Record<string, any>} params @param {string | null} version */
export function createAccount(ctx, params, version) {
  const type = stringParam(params.type, 'type') ?? 'express';
  if (type !== 'express') throw invalid('type', `This local fake creates only express accounts, not '${type}'.`);
  const country = (stringParam(params.country, 'country', { max: 2 }) ?? 'US').toUpperCase();
  if (!/^[A-Z]{2}$/.test(country)) throw invalid('country', `Invalid country: ${country}`);
  const email = stringParam(params.email, 'email', { max: 800 });
  const businessType = stringParam(params.business_type, 'business_type');
  const requested = Object.keys(objectParam(params.capabilities, 'capabilities'));
  const capabilityNames = requested.length ? requested : ['card_payments', 'transfers'];
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
      currently_due: [...DUE_AT_START],
      eventually_due: [...DUE_AT_START],
      past_due: [...DUE_AT_START],
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
  ctx.state.accounts.set(account.id, account);
  if (!ctx.config.apiVersion && version) ctx.internal.apiVersions.set(account.id, version);
  return account;
}

/** `POST /v1/account_links`. @param {FakeContext} ctx @param {Record<string, any>} params */
export function createAccountLink(ctx, params) {
  const accountId = stringParam(params.account, 'account', { optional: false });
  const account = ctx.state.accounts.get(/** @type {string} */ (accountId));
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
  ctx.state.accountLinks.set(token, link);
  return {
    object: 'account_link',
    created,
    expires_at: link.expires_at,
    url: `${ctx.config.publicUrl}/onboarding/${encodeURIComponent(account.id)}?link=${token}`,
  };
}

/**
 * Finishes onboarding: the account may take charges and receive payouts, and
 * an `account.updated` event goes out. Returns that event's delivery, or null
 * when the account was already onboarded (nothing changes then).
 * @param {FakeContext} ctx
 * @param {Record<string, any>} account
 */
export function completeOnboarding(ctx, account) {
  const before = { charges_enabled: account.charges_enabled, payouts_enabled: account.payouts_enabled, details_submitted: account.details_submitted };
  if (account.charges_enabled && account.payouts_enabled && account.details_submitted) return null;
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
  const { delivery } = emit(ctx, 'account.updated', account, {
    account: account.id,
    previousAttributes: before,
    apiVersion: ctx.internal.apiVersions.get(account.id),
  });
  return delivery;
}
