// @ts-check
/**
 * Request parameters of the payment fake's API: the provider's error object
 * and the checks that turn form values into typed ones or refuse them with
 * that error, as the provider does.
 */

/** An error answered as the provider's error object. */
export class ApiError extends Error {
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
export const missing = (kind, id, param = 'id') => new ApiError(404, `No such ${kind}: '${id}'`, { code: 'resource_missing', param });

/** @param {string} param @param {string} message */
export const invalid = (param, message) => new ApiError(400, message, { code: 'parameter_invalid', param });

/** @param {string} param */
export const required = (param) => new ApiError(400, `Missing required param: ${param}.`, { code: 'parameter_missing', param });

/**
 * @param {unknown} value
 * @param {string} param
 * @param {{ min?: number, optional?: boolean }} [opts]
 * @returns {number | null}
 */
export function integerParam(value, param, { min = 0, optional = false } = {}) {
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
export function stringParam(value, param, { optional = true, max = 5000 } = {}) {
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
export function urlParam(value, param, opts = {}) {
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
export function metadataParam(value, param = 'metadata') {
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
export function objectParam(value, param) {
  if (value === undefined || value === '') return /** @type {Record<string, any>} */ ({});
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    throw invalid(param, `Invalid object: ${param}.`);
  }
  return /** @type {Record<string, any>} */ (value);
}

/** @param {unknown} value @param {string} param */
export function currencyParam(value, param) {
  const text = stringParam(value, param, { optional: false, max: 3 });
  const code = /** @type {string} */ (text).toLowerCase();
  if (!/^[a-z]{3}$/.test(code)) throw invalid(param, `Invalid currency: ${text}. Use a three-letter ISO 4217 code.`);
  return code;
}

/** A new account's `default_currency`: the euro in the euro area (20 members since 2023), else its national currency; usd for the rest. */
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
export const currencyForCountry = (country) => (EURO_COUNTRIES.has(country) ? 'eur' : (COUNTRY_CURRENCY[country] ?? 'usd'));
