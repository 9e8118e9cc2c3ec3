import { CSRF_HEADER, CSRF_OUT_OF_DATE, type ApiErrorBody, type CsrfResponse } from '@broodsilk/shared';
import { ApiError } from './api-error';
import { i18next } from './i18n';

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

export interface RequestOptions {
  body?: unknown;
  query?: Record<string, string | number | boolean | undefined | null>;
  signal?: AbortSignal;
  /** Do not send the user to sign-in on a 401 (the session probe itself). */
  allowAnonymous?: boolean;
  /** The write's Idempotency-Key; each POST gets a fresh one, kept across this client's own retry. */
  idempotencyKey?: string;
}

let csrfToken: string | null = null;
let onUnauthorized: () => void = () => undefined;

/** Set by the app layer: where a 401 sends the user. */
export function setUnauthorizedHandler(handler: () => void): void {
  onUnauthorized = handler;
}

/** Login and password change hand out a token for the new session. */
export function setCsrfToken(token: string | null): void {
  csrfToken = token;
}

async function ensureCsrfToken(): Promise<string> {
  if (csrfToken) return csrfToken;
  const res = await fetch('/api/auth/csrf', { credentials: 'same-origin' });
  csrfToken = ((await res.json()) as CsrfResponse).csrfToken;
  return csrfToken;
}

function buildUrl(path: string, query?: RequestOptions['query']): string {
  const url = new URL(`/api${path}`, window.location.origin);
  for (const [k, v] of Object.entries(query ?? {})) if (v !== undefined && v !== null && v !== '') url.searchParams.set(k, String(v));
  return url.pathname + url.search;
}

async function toError(res: Response): Promise<ApiError> {
  try {
    const body = (await res.json()) as ApiErrorBody;
    if (typeof body?.message === 'string') return new ApiError(body);
  } catch {
    /* not JSON */
  }
  return new ApiError({ statusCode: res.status, error: res.statusText, message: 'The server could not be reached. Check your connection and try again.' });
}

async function send<T>(method: Method, path: string, options: RequestOptions = {}, retried = false): Promise<T> {
  // The server says its refusals in the language the interface shows now.
  const headers: Record<string, string> = { Accept: 'application/json', 'Accept-Language': i18next.language };
  let body: BodyInit | undefined;
  if (options.body instanceof FormData) body = options.body;
  else if (options.body !== undefined) {
    headers['Content-Type'] = 'application/json';
    body = JSON.stringify(options.body);
  }
  if (method !== 'GET') headers[CSRF_HEADER] = await ensureCsrfToken();
  // A repeated tap or retry of the same write is then written once by the server.
  const idempotencyKey = options.idempotencyKey ?? (method === 'POST' ? crypto.randomUUID() : undefined);
  if (idempotencyKey) headers['Idempotency-Key'] = idempotencyKey;
  const res = await fetch(buildUrl(path, options.query), { method, headers, body, credentials: 'same-origin', signal: options.signal });
  if (res.ok) {
    if (res.status === 204) return undefined as T;
    const type = res.headers.get('content-type') ?? '';
    return (type.includes('application/json') ? await res.json() : await res.text()) as T;
  }
  const error = await toError(res);
  // A stale CSRF token (after a reload or a new session): fetch a fresh one once.
  if (res.status === 403 && method !== 'GET' && !retried && error.reason === CSRF_OUT_OF_DATE) {
    csrfToken = null;
    return send<T>(method, path, { ...options, idempotencyKey }, true);
  }
  if (res.status === 401 && !options.allowAnonymous) onUnauthorized();
  throw error;
}

export interface Download {
  blob: Blob;
  /** The name the server gave the file (Content-Disposition), if any. */
  filename: string | null;
}

/** A GET of a file that may be large and whose length may be unknown: reports the bytes received so far. */
async function download(path: string, onBytes: (received: number) => void, signal?: AbortSignal): Promise<Download> {
  const res = await fetch(buildUrl(path), { credentials: 'same-origin', signal });
  if (!res.ok || !res.body) {
    const error = await toError(res);
    if (res.status === 401) onUnauthorized();
    throw error;
  }
  const chunks: Uint8Array<ArrayBuffer>[] = [];
  let received = 0;
  const reader = res.body.getReader();
  for (let step = await reader.read(); !step.done; step = await reader.read()) {
    chunks.push(step.value);
    received += step.value.length;
    onBytes(received);
  }
  const filename = /filename="([^"]+)"/.exec(res.headers.get('content-disposition') ?? '')?.[1] ?? null;
  return { blob: new Blob(chunks, { type: res.headers.get('content-type') ?? 'application/octet-stream' }), filename };
}

/** The one API client: unwraps JSON, turns failures into ApiError, sends a 401 to sign-in. */
export const api = {
  get: <T>(path: string, options?: RequestOptions) => send<T>('GET', path, options),
  post: <T>(path: string, body?: unknown, options?: RequestOptions) => send<T>('POST', path, { ...options, body }),
  patch: <T>(path: string, body?: unknown, options?: RequestOptions) => send<T>('PATCH', path, { ...options, body }),
  put: <T>(path: string, body?: unknown, options?: RequestOptions) => send<T>('PUT', path, { ...options, body }),
  delete: <T>(path: string, options?: RequestOptions) => send<T>('DELETE', path, options),
  download,
};
