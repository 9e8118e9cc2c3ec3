/**
 * Sessions and links: the cookie's Secure flag follows HTTPS (directly or through the trusted
 * proxy), sign-in and registration refuse what a cross-site form could send, and calendar feed
 * tokens have their own key and die with a password reset.
 */
import { createHmac } from 'node:crypto';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { SESSION_COOKIE, type CalendarFeedResponse } from '@broodsilk/shared';
import { CalendarFeed } from '../src/calendar/calendar-feed.entity';
import { parseTrustProxy } from '../src/config/trust-proxy';
import { User } from '../src/users/user.entity';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper } from './support/users';
import { waitForMail } from './support/mail-sink';

let t: TestApp;
const http = () => request(t.app.getHttpServer());

beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

const sessionCookie = (res: request.Response): string | undefined =>
  (res.headers['set-cookie'] as unknown as string[] | undefined)?.find((c) => c.startsWith(`${SESSION_COOKIE}=`));

describe('the session cookie', () => {
  it('is Secure when the request came over HTTPS through the trusted proxy (loopback), and not over plain HTTP', async () => {
    const k = await registerKeeper(t.app);
    const creds = { email: k.user.email, password: k.password };
    // RFC 6265 §4.1.2.5: a Secure cookie is sent only over secure channels.
    const viaTls = await http().post('/api/auth/login').set('X-Forwarded-Proto', 'https').send(creds).expect(200);
    expect(sessionCookie(viaTls)).toMatch(/;\s*Secure/i);
    const plain = await http().post('/api/auth/login').send(creds).expect(200);
    expect(sessionCookie(plain)).toBeDefined();
    expect(sessionCookie(plain)).not.toMatch(/;\s*Secure/i);
  });

  it('TRUST_PROXY is validated: never "true", only hop counts, addresses, CIDR ranges and the named ranges', () => {
    expect(parseTrustProxy(undefined)).toBe('loopback');
    expect(parseTrustProxy('false')).toBe(false);
    expect(parseTrustProxy('1')).toBe(1);
    expect(parseTrustProxy('10.0.0.0/8, loopback, ::1')).toBe('10.0.0.0/8,loopback,::1');
    for (const bad of ['true', '0', '11', '10.0.0.0/33', 'proxy.example.org', '10.0.0.1/8/2']) expect(() => parseTrustProxy(bad), bad).toThrow(/TRUST_PROXY/);
  });
});

describe('sign-in and registration requests', () => {
  it('refuse a form post (not JSON) with 415 and a foreign Origin with 403; our own Origin and none are fine', async () => {
    const k = await registerKeeper(t.app);
    const form = await http().post('/api/auth/login').type('form').send({ email: k.user.email, password: k.password });
    expect(form.status).toBe(415);
    expect(form.body.message).toBe('Send the form as JSON (Content-Type: application/json).');
    const textPlain = await http()
      .post('/api/auth/login')
      .set('Content-Type', 'text/plain')
      .send(JSON.stringify({ email: k.user.email, password: k.password }));
    expect(textPlain.status).toBe(415);
    const foreign = await http().post('/api/auth/login').set('Origin', 'https://attacker.example').send({ email: k.user.email, password: k.password });
    expect(foreign.status).toBe(403);
    expect(sessionCookie(foreign)).toBeUndefined();
    await http().post('/api/auth/login').set('Origin', 'http://127.0.0.1:3000').send({ email: k.user.email, password: k.password }).expect(200);
    await http().post('/api/auth/login').send({ email: k.user.email, password: k.password }).expect(200);
  });

  it('registration from a foreign Origin creates no account', async () => {
    const email = `foreign.${Date.now()}@example.test`;
    const res = await http().post('/api/auth/register').set('Origin', 'null').send({ email, password: 'a long enough passphrase', displayName: 'Forged' });
    expect(res.status).toBe(403);
    expect(await t.orm.em.fork().count(User, { email })).toBe(0);
  });
});

describe('calendar feed tokens', () => {
  const feedOf = async (bearer: string) => (await http().get('/api/calendar/feed').set('Authorization', bearer).expect(200)).body as CalendarFeedResponse;

  it('are an HMAC-SHA256 (RFC 2104) of the feed id under CALENDAR_SECRET, not under the session key', async () => {
    const k = await registerKeeper(t.app);
    const feed = await feedOf(k.bearer);
    const row = await t.orm.em.fork().findOneOrFail(CalendarFeed, { user: k.user.id, revokedAt: null });
    const under = (key: string) => createHmac('sha256', key).update(`broodsilk calendar feed ${row.id}`).digest('base64url');
    expect(feed.path).toBe(`/api/calendar/${under(process.env.CALENDAR_SECRET!)}.ics`);
    expect(feed.path).not.toContain(under(process.env.JWT_SECRET!));
  });

  it('a password reset rotates the feed: the old URL answers 404', async () => {
    const k = await registerKeeper(t.app);
    const before = await feedOf(k.bearer);
    await http().get(before.path).expect(200);
    await http().post('/api/auth/password-reset').send({ email: k.user.email }).expect(202);
    const mail = await waitForMail(k.user.email, /Reset your Broodsilk password/);
    const token = /reset-password\?token=([A-Za-z0-9_-]+)/.exec(mail.text ?? '')![1];
    await http().post('/api/auth/password-reset/confirm').send({ token, password: 'renewed after the scare' }).expect(204);
    await http().get(before.path).expect(404);
    const signedIn = await http().post('/api/auth/login').send({ email: k.user.email, password: 'renewed after the scare' }).expect(200);
    const after = await feedOf(`Bearer ${signedIn.body.accessToken}`);
    expect(after.path).not.toBe(before.path);
    await http().get(after.path).expect(200);
  });
});

describe('new passwords (OWASP ASVS 5.0 V6.2)', () => {
  it('registration refuses a password on the common-password list and one of blanks only, saying why', async () => {
    const email = `common.${Date.now()}@example.test`;
    // "iloveyou12" is on the list shipped by fxa-common-password-list.
    const common = await http().post('/api/auth/register').send({ email, password: 'iloveyou12', displayName: 'Common' }).expect(400);
    expect(common.body.details).toEqual([{ field: 'password', message: 'This password is on a list of commonly used passwords. Choose another one.' }]);
    const blank = await http().post('/api/auth/register').send({ email, password: ' \t  \u00a0       ', displayName: 'Blank' }).expect(400);
    expect(blank.body.details[0].message).toMatch(/not only spaces or control characters/);
    expect(await t.orm.em.fork().count(User, { email })).toBe(0);
  });
});
