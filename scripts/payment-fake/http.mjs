// @ts-check
/** HTTP plumbing of the payment fake: reading requests and writing answers. */
import { FormError, parseFormBody } from './form.mjs';
import { ApiError } from './params.mjs';

/**
 * @typedef {import('node:http').IncomingMessage} IncomingMessage
 * @typedef {import('node:http').ServerResponse} ServerResponse
 */

const MAX_BODY_BYTES = 1024 * 1024;

/** decodeURIComponent that yields '' instead of throwing on a malformed escape. @param {string} text */
export function decodePart(text) {
  try {
    return decodeURIComponent(text);
  } catch {
    return '';
  }
}

/** @param {IncomingMessage} req @returns {Promise<string>} */
export function readBody(req) {
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

/**
 * The parameters of an API call: its query string and its form-encoded body.
 * @param {IncomingMessage} req
 * @param {string} body
 */
export function parseParams(req, body, query = '') {
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
 * @param {ServerResponse} res
 * @param {number} status
 * @param {unknown} body
 * @param {Record<string, string>} [headers]
 */
export function sendJson(res, status, body, headers = {}) {
  const text = typeof body === 'string' ? body : JSON.stringify(body, null, 2);
  res.writeHead(status, { 'content-type': 'application/json', 'cache-control': 'no-store', ...headers });
  res.end(text);
}

/**
 * @param {ServerResponse} res
 * @param {number} status
 * @param {string} html
 */
export function sendHtml(res, status, html) {
  res.writeHead(status, { 'content-type': 'text/html; charset=utf-8', 'cache-control': 'no-store' });
  res.end(html);
}

/** @param {ServerResponse} res @param {string} location */
export function redirect(res, location) {
  res.writeHead(303, { location, 'cache-control': 'no-store' });
  res.end();
}
