// @ts-check
/** Ids and timestamps the payment fake stamps on the objects it makes. */
import { randomBytes } from 'node:crypto';

const ID_ALPHABET = '0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz';

/**
 * @param {string} prefix
 * @param {number} [length]
 */
export function makeId(prefix, length = 24) {
  let out = prefix;
  for (const byte of randomBytes(length)) out += ID_ALPHABET[byte % ID_ALPHABET.length];
  return out;
}

/** Unix seconds, as the provider's `created` and `expires_at` fields count. */
export const nowSeconds = () => Math.floor(Date.now() / 1000);
