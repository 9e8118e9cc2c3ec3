import type { BrowserContext } from 'playwright-core';
import { BASE_URL, DEMO_PASSWORD } from './browser';

/**
 * Calls the API with the browser context's cookies (its session, plus the CSRF header as the app
 * sends it), to build a test's state without clicking through forms the test is not about.
 */
export async function callApi<T = unknown>(context: BrowserContext, method: 'GET' | 'POST' | 'PATCH', path: string, body?: unknown): Promise<T> {
  const headers: Record<string, string> = {};
  if (method !== 'GET') headers['x-csrf-token'] = ((await (await context.request.get(`${BASE_URL}/api/auth/csrf`)).json()) as { csrfToken: string }).csrfToken;
  const res = await context.request.fetch(`${BASE_URL}/api${path}`, { method, headers, data: body });
  if (!res.ok()) throw new Error(`${method} ${path}: ${res.status()} ${await res.text()}`);
  return (res.status() === 204 ? null : await res.json()) as T;
}

/** Starts a session in the context through the API (a fresh context: no cookie, so no CSRF check yet). */
export async function signInThroughApi(context: BrowserContext, email: string, password = DEMO_PASSWORD): Promise<void> {
  await context.clearCookies();
  await callApi(context, 'POST', '/auth/login', { email, password });
}

/** A calendar date `days` before today in `timeZone` (the server's "today" for that user). */
export function daysAgo(days: number, timeZone = 'Europe/Berlin'): string {
  const today = new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(new Date());
  const d = new Date(`${today}T00:00:00Z`);
  d.setUTCDate(d.getUTCDate() - days);
  return d.toISOString().slice(0, 10);
}
