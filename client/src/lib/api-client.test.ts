import { afterEach, describe, expect, it, vi } from 'vitest';
import { CSRF_OUT_OF_DATE } from '@broodsilk/shared';
import { api, setCsrfToken } from './api-client';
import { i18next } from './i18n';

afterEach(() => vi.unstubAllGlobals());

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/; // RFC 9562 version 4

function recordFetch(responses: Response[]) {
  const calls: Headers[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (_url: string, init: RequestInit) => {
      calls.push(new Headers(init.headers));
      return responses.shift()!;
    }),
  );
  return calls;
}
const json = (status: number, body: unknown) => new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });

describe('Idempotency-Key', () => {
  it('each POST carries a fresh UUID key; reads and other writes carry none', async () => {
    setCsrfToken('t');
    const calls = recordFetch([json(201, {}), json(201, {}), json(200, {}), json(200, {})]);
    await api.post('/sacs/s1/log', { kind: 'roll' });
    await api.post('/sacs/s1/log', { kind: 'roll' });
    await api.get('/sacs/s1');
    await api.patch('/sacs/s1', { notes: 'x' });
    const keys = calls.map((h) => h.get('Idempotency-Key'));
    expect(keys[0]).toMatch(UUID);
    expect(keys[1]).toMatch(UUID);
    expect(keys[0]).not.toBe(keys[1]);
    expect(keys.slice(2)).toEqual([null, null]);
  });

  it('the retry after a stale CSRF token sends the same key', async () => {
    setCsrfToken('old');
    const calls = recordFetch([
      json(403, { statusCode: 403, error: 'Forbidden', message: 'The form is out of date.', reason: CSRF_OUT_OF_DATE }),
      json(200, { csrfToken: 'new' }),
      json(201, {}),
    ]);
    await api.post('/sacs/s1/log', { kind: 'roll' });
    expect(calls).toHaveLength(3);
    expect(calls[2]!.get('Idempotency-Key')).toBe(calls[0]!.get('Idempotency-Key'));
  });
});

describe('Accept-Language', () => {
  it('every request names the language the interface shows now, so refusals come back in it', async () => {
    setCsrfToken('t');
    const calls = recordFetch([json(200, {}), json(201, {})]);
    await i18next.changeLanguage('de');
    await api.get('/animals');
    await i18next.changeLanguage('en');
    await api.post('/animals', { label: 'x' });
    expect(calls.map((h) => h.get('Accept-Language'))).toEqual(['de', 'en']);
  });
});
