/**
 * Every route the app registers (read from the Express router, so a new route cannot be missed):
 * without a session it is 401 unless listed as public, and a keeper reaching for another
 * keeper's record gets 404, by Bearer token and by session cookie with its CSRF token alike.
 * Row counts per table before and after prove the refused requests wrote nothing.
 */
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CSRF_HEADER, addDays, todayIn } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { registeredRoutes, type RegisteredRoute } from './support/route-list';
import { ownedRecords, urlFor } from './support/owned-records';
import { rowCounts } from './support/row-counts';

/** Routes anyone may call: signing in and up, password reset, health, and links that carry their own secret. */
const PUBLIC = new Set([
  'POST /api/auth/register',
  'POST /api/auth/login',
  'POST /api/auth/login/second-factor',
  'GET /api/auth/csrf',
  'POST /api/auth/password-reset',
  'POST /api/auth/password-reset/confirm',
  'POST /api/auth/confirm-email',
  'POST /api/auth/confirm-email/resend',
  'GET /api/health',
  'GET /api/invitations/:token',
  'GET /api/calendar/:token.ics',
  'POST /api/webhooks/payments',
  'GET /api/unsubscribe/:token',
  'POST /api/unsubscribe/:token',
  'GET /api/progress/:token',
  'GET /api/progress/:token/photos/:photoId',
  'GET /api/progress/:token/photos/:photoId/thumb',
]);
/** The shared species catalogue: every keeper reads it, only an admin edits it. */
const CATALOGUE: Record<string, number> = { 'GET /api/species/:id': 200, 'PATCH /api/species/:id': 403 };
/** Bodies that pass validation, so the refusal shown is the ownership check and not a missing field. */
const VALID_BODY: Record<string, () => object> = {
  'POST /api/animals/:animalId/molts': () => ({ moltedOn: addDays(todayIn('UTC', new Date()), -1) }),
  'POST /api/animals/:animalId/feedings': () => ({ fedOn: addDays(todayIn('UTC', new Date()), -1), prey: 'cricket', taken: true }),
  ...Object.fromEntries(
    ['premolt', 'premolt/end', 'sperm-web', 'return', 'death'].map((step) => [
      `POST /api/animals/:id/${step}`,
      () => ({ on: addDays(todayIn('UTC', new Date()), -1) }),
    ]),
  ),
};
/** The owner's GET answers 404 by design: no opening (so no kept-back batch) is recorded for the fixture sac yet. */
const EMPTY_FOR_OWNER = new Set(['GET /api/sacs/:id/opening', 'GET /api/sacs/:id/kept-back']);
/** Accepting an invitation: the token in the link is the permission, whoever holds it (see invitations spec). */
const BY_TOKEN = new Set(['POST /api/invitations/:token/accept']);

let t: TestApp;
let owner: SignedIn;
let stranger: SignedIn & { password: string };
let strangerCookie: { agent: ReturnType<typeof request.agent>; csrf: string };
/** A record of `owner` for each kind of path parameter. */
const ids: Record<string, string> = {};
let routes: RegisteredRoute[];
const key = (r: RegisteredRoute) => `${r.method} ${r.path}`;

beforeAll(async () => {
  t = await createTestApp();
  owner = await registerKeeper(t.app, 'Table Owner');
  stranger = await registerKeeper(t.app, 'Table Stranger');
  const agent = request.agent(t.app.getHttpServer());
  const login = await agent.post('/api/auth/login').send({ email: stranger.user.email, password: stranger.password }).expect(200);
  strangerCookie = { agent, csrf: login.body.csrfToken as string };

  Object.assign(ids, await ownedRecords(t, owner));
  routes = registeredRoutes(t.app).filter((r) => r.path !== '/api' && !r.path.includes('{*'));
});
afterAll(async () => {
  await t.close();
});

const call = (r: RegisteredRoute, http: ReturnType<typeof request> | ReturnType<typeof request.agent>) =>
  http[r.method.toLowerCase() as 'get'](urlFor(r, ids)).set('Content-Type', 'application/json');

describe('the route table', () => {
  it('has the routes this spec names (public and special cases exist)', () => {
    const all = new Set(routes.map(key));
    for (const k of [...PUBLIC, ...Object.keys(CATALOGUE), ...BY_TOKEN]) expect(all.has(k), k).toBe(true);
    expect(routes.length).toBeGreaterThan(60);
  });

  it('without a session every route but the public ones is 401, and nothing is written', async () => {
    const before = await rowCounts(t.orm);
    const wrong: string[] = [];
    for (const r of routes) {
      const res = await call(r, request(t.app.getHttpServer())).send('{}');
      const ok = PUBLIC.has(key(r)) ? res.status < 500 && res.status !== 401 : res.status === 401;
      if (!ok) wrong.push(`${key(r)} → ${res.status}`);
    }
    expect(wrong).toEqual([]);
    expect(await rowCounts(t.orm)).toEqual(before);
  });

  const withParams = () => routes.filter((r) => r.path.includes('/:') && !PUBLIC.has(key(r)) && !BY_TOKEN.has(key(r)));

  it.each([
    ['a Bearer token', (r: RegisteredRoute) => call(r, request(t.app.getHttpServer())).set('Authorization', stranger.bearer)],
    ['the session cookie and its CSRF token', (r: RegisteredRoute) => call(r, strangerCookie.agent).set(CSRF_HEADER, strangerCookie.csrf)],
  ])('another keeper gets 404 for every record of someone else, with %s, and nothing is written', async (_how, send) => {
    const before = await rowCounts(t.orm);
    const wrong: string[] = [];
    for (const r of withParams()) {
      const res = await send(r).send(JSON.stringify(VALID_BODY[key(r)]?.() ?? {}));
      const expected = CATALOGUE[key(r)] ?? 404;
      if (res.status !== expected) wrong.push(`${key(r)} → ${res.status} (expected ${expected}) ${JSON.stringify(res.body).slice(0, 120)}`);
    }
    expect(wrong).toEqual([]);
    expect(await rowCounts(t.orm)).toEqual(before);
  });

  it('the same requests by the owner are not 404 (the fixtures name real records)', async () => {
    const missing: string[] = [];
    for (const r of withParams().filter((x) => x.method === 'GET' && !EMPTY_FOR_OWNER.has(key(x)))) {
      const res = await call(r, request(t.app.getHttpServer())).set('Authorization', owner.bearer);
      if (res.status === 404) missing.push(key(r));
    }
    expect(missing).toEqual([]);
  });
});
