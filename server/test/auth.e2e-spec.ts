import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CSRF_HEADER, SESSION_COOKIE, type ApiErrorBody } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { confirmationToken, confirmEmail, login, registerAndConfirm, registerKeeper } from './support/users';
import { makeAdmin } from './support/admins';
import { waitForMail } from './support/mail-sink';

let t: TestApp;
const http = () => request(t.app.getHttpServer());

beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

function cookieFrom(res: request.Response, name: string): string | undefined {
  const raw = res.headers['set-cookie'] as unknown as string[] | undefined;
  return raw?.find((c) => c.startsWith(`${name}=`));
}

describe('register → login → me → logout', () => {
  it('walks the whole session life and refuses the old token afterwards', async () => {
    const reg = await http()
      .post('/api/auth/register')
      .send({ email: '  Ada.Keeper@Example.test ', password: 'long enough pass', displayName: 'Ada', timeZone: 'Europe/Vienna' })
      .expect(202);
    expect(cookieFrom(reg, SESSION_COOKIE)).toBeUndefined();
    const { session } = await confirmEmail(t.app, await confirmationToken(t.app, 'ada.keeper@example.test'));
    expect(session!.user).toMatchObject({
      email: 'ada.keeper@example.test',
      displayName: 'Ada',
      role: 'keeper',
      timeZone: 'Europe/Vienna',
      temperatureUnit: 'C',
      language: 'en',
      stageNumbering: 'us',
    });

    const res = await http().post('/api/auth/login').send({ email: 'ada.keeper@example.test', password: 'long enough pass' }).expect(200);
    const cookie = cookieFrom(res, SESSION_COOKIE)!;
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).toMatch(/Max-Age=43200/); // 12 hours
    const token = res.body.accessToken as string;

    const me = await http().get('/api/auth/me').set('Authorization', `Bearer ${token}`).expect(200);
    expect(me.body).toEqual({
      id: session!.user.id,
      email: 'ada.keeper@example.test',
      displayName: 'Ada',
      role: 'keeper',
      timeZone: 'Europe/Vienna',
      temperatureUnit: 'C',
      secondFactorEnabled: false,
      secondFactorRequired: false,
      language: 'en',
      stageNumbering: 'us',
    });

    await http().post('/api/auth/logout').set('Authorization', `Bearer ${token}`).expect(204);
    const after = await http().get('/api/auth/me').set('Authorization', `Bearer ${token}`).expect(401);
    expect((after.body as ApiErrorBody).message).toBe('Please sign in to continue.');
  });

  it('keeps the language given at registration and lets the user change language, unit and stage numbering; unknown values are 400 with the allowed ones', async () => {
    const reg = await registerAndConfirm(t.app, { email: 'de.keeper@example.test', password: 'long enough pass', displayName: 'Dora', language: 'de' });
    expect(reg.user).toMatchObject({ language: 'de', stageNumbering: 'us' });
    const bad = await http()
      .post('/api/auth/register')
      .send({ email: 'x.keeper@example.test', password: 'long enough pass', displayName: 'X', language: 'fr' })
      .expect(400);
    expect(JSON.stringify(bad.body)).toContain('Choose one of the languages en, de.');

    const bearer = reg.bearer;
    const ok = await http()
      .patch('/api/users/me')
      .set('Authorization', bearer)
      .send({ language: 'en', temperatureUnit: 'F', stageNumbering: 'de' })
      .expect(200);
    expect(ok.body).toMatchObject({ language: 'en', temperatureUnit: 'F', stageNumbering: 'de' });
    for (const [field, value, allowed] of [
      ['language', 'fr', 'en, de'],
      ['temperatureUnit', 'K', 'C, F'],
      ['stageNumbering', 'uk', 'us, de'],
    ] as const) {
      const refused = await http()
        .patch('/api/users/me')
        .set('Authorization', bearer)
        .send({ [field]: value })
        .expect(400);
      expect(JSON.stringify(refused.body)).toContain(allowed);
    }
    const me = await http().get('/api/auth/me').set('Authorization', bearer).expect(200);
    expect(me.body).toMatchObject({ language: 'en', temperatureUnit: 'F', stageNumbering: 'de' });
  });

  it('a session cookie works on its own, and a cookie write needs the CSRF header', async () => {
    const k = await registerKeeper(t.app);
    const agent = request.agent(t.app.getHttpServer());
    const res = await agent.post('/api/auth/login').send({ email: k.user.email, password: k.password }).expect(200);
    await agent.get('/api/auth/me').expect(200);
    const refused = await agent.patch('/api/users/me').send({ displayName: 'Forged' }).expect(403);
    expect(refused.body.message).toMatch(/out of date/);
    await agent.patch('/api/users/me').set(CSRF_HEADER, 'not-the-token').send({ displayName: 'Forged' }).expect(403);
    const ok = await agent.patch('/api/users/me').set(CSRF_HEADER, res.body.csrfToken).send({ displayName: 'Real' }).expect(200);
    expect(ok.body.displayName).toBe('Real');
  });
});

describe('refusals', () => {
  it('wrong password is 401 and says nothing about whether the e-mail exists', async () => {
    const k = await registerKeeper(t.app);
    const wrong = await http().post('/api/auth/login').send({ email: k.user.email, password: 'not the password' }).expect(401);
    const unknown = await http().post('/api/auth/login').send({ email: 'nobody@example.test', password: 'not the password' }).expect(401);
    expect(wrong.body).toEqual(unknown.body);
    expect(wrong.body).toEqual({ statusCode: 401, error: 'Unauthorized', message: 'The e-mail or password is not right.' });
  });

  it('a taken address gets the same 202 and body as a new one, and neither signs in (fails on a 201 session or a 409)', async () => {
    // OWASP ASVS 5.0 V6.3.8 and the OWASP Authentication Cheat Sheet ("Authentication and Error Messages"): registration must not tell whether an address has an account.
    const k = await registerKeeper(t.app);
    const body = (email: string) => ({ email, password: 'another long one', displayName: 'Twin' });
    const taken = await http().post('/api/auth/register').send(body(k.user.email.toUpperCase()));
    const fresh = await http()
      .post('/api/auth/register')
      .send(body(`fresh.${Date.now()}@example.test`));
    expect([taken.status, fresh.status]).toEqual([202, 202]);
    expect(taken.body).toEqual(fresh.body);
    expect(taken.body).toEqual({ message: 'Check your e-mail: we have sent a message to this address with the next step.' });
    expect(cookieFrom(taken, SESSION_COOKIE)).toBeUndefined();
    expect(cookieFrom(fresh, SESSION_COOKIE)).toBeUndefined();
    // The owner's password still works, and the attempt changed nothing of theirs.
    await login(t.app, k.user.email, k.password);
  });

  it('a weak password is 400 with a field message', async () => {
    const res = await http().post('/api/auth/register').send({ email: 'weak@example.test', password: 'short', displayName: 'W' }).expect(400);
    expect(res.body.details).toEqual([{ field: 'password', message: 'Use a password of at least 10 characters.' }]);
  });

  it('an unknown field is 400 and named', async () => {
    const res = await http()
      .post('/api/auth/register')
      .send({ email: 'x@example.test', password: 'long enough pass', displayName: 'X', role: 'admin' })
      .expect(400);
    expect(res.body).toMatchObject({
      statusCode: 400,
      error: 'Bad Request',
      details: [{ field: 'role', message: '"role" is not a field this form accepts.' }],
    });
  });

  it('an admin-only route refuses a keeper (403) and an anonymous caller (401), and lets an admin in', async () => {
    const k = await registerKeeper(t.app);
    await http().get('/api/admin/users').expect(401);
    const forbidden = await http().get('/api/admin/users').set('Authorization', k.bearer).expect(403);
    expect(forbidden.body.message).toBe('Your account is not allowed to do this.');

    const a = await registerKeeper(t.app, 'Admin');
    await makeAdmin(t, a);
    const list = await http().get('/api/admin/users').set('Authorization', a.bearer).expect(200);
    expect(list.body.total).toBeGreaterThanOrEqual(2);
    expect(list.body.items[0]).not.toHaveProperty('passwordHash');
  });
});

describe('password change and reset', () => {
  it('changing the password needs the current one and ends older sessions', async () => {
    const k = await registerKeeper(t.app);
    await http()
      .patch('/api/auth/password')
      .set('Authorization', k.bearer)
      .send({ currentPassword: 'wrong wrong wrong', newPassword: 'brand new password' })
      .expect(400);
    const res = await http()
      .patch('/api/auth/password')
      .set('Authorization', k.bearer)
      .send({ currentPassword: k.password, newPassword: 'brand new password' })
      .expect(200);
    await http().get('/api/auth/me').set('Authorization', k.bearer).expect(401);
    await http().get('/api/auth/me').set('Authorization', `Bearer ${res.body.accessToken}`).expect(200);
    await login(t.app, k.user.email, 'brand new password');
  });

  it('the reset e-mail arrives in the sink and its link works once', async () => {
    const k = await registerKeeper(t.app);
    const asked = await http().post('/api/auth/password-reset').send({ email: k.user.email }).expect(202);
    const unknown = await http().post('/api/auth/password-reset').send({ email: 'ghost@example.test' }).expect(202);
    expect(asked.body).toEqual(unknown.body);

    const mail = await waitForMail(k.user.email, /Reset your Broodsilk password/);
    const link = /https?:\/\/\S+\/reset-password\?token=([A-Za-z0-9_-]+)/.exec(mail.text ?? '');
    expect(link).not.toBeNull();
    const token = link![1];

    await http().post('/api/auth/password-reset/confirm').send({ token, password: 'reset and renewed' }).expect(204);
    await http().get('/api/auth/me').set('Authorization', k.bearer).expect(401);
    await login(t.app, k.user.email, 'reset and renewed');
    const again = await http().post('/api/auth/password-reset/confirm').send({ token, password: 'second use attempt' }).expect(400);
    expect(again.body.message).toMatch(/expired or was already used/);
  });
});
