// @ts-check
/**
 * Form-body parsing for the payment fake.
 *
 * The provider's SDK sends request parameters form-encoded, with nested
 * objects as bracket keys (`a[b][c]=v`) and arrays as numbered keys
 * (`a[0][b]=v`) or as `a[]=v`. This module turns such a body back into
 * plain objects and arrays.
 */

/** Raised for a body the fake cannot make sense of. */
export class FormError extends Error {
  /** @param {string} message @param {string} [param] */
  constructor(message, param) {
    super(message);
    this.name = 'FormError';
    this.param = param;
  }
}

/** Keys that must never become object properties (prototype pollution). */
const FORBIDDEN = new Set(['__proto__', 'constructor', 'prototype']);

/**
 * Splits `a[b][0][]` into `['a', 'b', '0', '']`. Returns null for a key that
 * is not of that form.
 * @param {string} key
 * @returns {string[] | null}
 */
export function splitKey(key) {
  const match = /^([^[\]]+)((?:\[[^[\]]*\])*)$/.exec(key);
  if (!match) return null;
  const parts = [match[1]];
  for (const m of match[2].matchAll(/\[([^[\]]*)\]/g)) parts.push(m[1]);
  return parts;
}

/**
 * @typedef {string | FormObject | FormValue[]} FormValue
 * @typedef {{ [key: string]: FormValue }} FormObject
 */

/**
 * Parses an `application/x-www-form-urlencoded` body (or query string) into
 * nested objects; objects whose keys are exactly 0..n-1 become arrays.
 * @param {string} text
 * @returns {FormObject}
 */
export function parseFormBody(text) {
  /** @type {Record<string, any>} */
  const root = {};
  for (const [key, value] of new URLSearchParams(text)) {
    const path = splitKey(key);
    if (!path) throw new FormError(`Invalid parameter name: ${key}`, key);
    if (path.some((p) => FORBIDDEN.has(p))) throw new FormError(`Invalid parameter name: ${key}`, key);
    /** @type {Record<string, any>} */
    let node = root;
    for (let i = 0; i < path.length; i++) {
      // `a[]` appends: the next free index of that node.
      const segment = path[i] === '' ? String(Object.keys(node).length) : path[i];
      const last = i === path.length - 1;
      if (last) {
        if (Object.hasOwn(node, segment) && typeof node[segment] !== 'string') {
          throw new FormError(`Parameter ${key} is given both as a value and as an object`, key);
        }
        node[segment] = value;
      } else {
        if (!Object.hasOwn(node, segment)) node[segment] = {};
        else if (typeof node[segment] === 'string') {
          throw new FormError(`Parameter ${key} is given both as a value and as an object`, key);
        }
        node = node[segment];
      }
    }
  }
  return /** @type {FormObject} */ (arrayify(root));
}

/**
 * @param {any} node
 * @returns {FormValue}
 */
function arrayify(node) {
  if (typeof node === 'string') return node;
  const keys = Object.keys(node);
  const isList = keys.length > 0 && keys.every((k) => /^(0|[1-9]\d*)$/.test(k)) && keys.every((_, i) => Object.hasOwn(node, String(i)));
  if (isList) return keys.map((_, i) => arrayify(node[String(i)]));
  /** @type {FormObject} */
  const out = {};
  for (const k of keys) out[k] = arrayify(node[k]);
  return out;
}
