/**
 * TOTP second factor (RFC 6238; OWASP ASVS 5.0 V6.5, V6.3.3): enrolment confirmed with a code,
 * the code as a second sign-in step behind a short-lived pending token, single-use recovery codes,
 * removal with password and code, notices by mail, required for administrators of a real install.
 * Codes are generated here with the reference library `otpauth` at a pinned clock.
 */
import request from 'supertest';
import { Secret, TOTP } from 'otpauth';
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Language, RecoveryCodesResponse, SecondFactorChallenge, TotpEnrolment } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { readableText, waitForMail } from './support/mail-sink';
import { Clock } from '../src/common/clock';
import { User } from '../src/users/user.entity';
import { clearSecondFactor } from '../src/auth/second-factor/clear-second-factor';

let t: TestApp;
const http = () => request(t.app.getHttpServer());
/** 2026-03-02T10:00:00Z, the start of a 30-second step. */
const T0 = Date.UTC(2026, 2, 2, 10, 0, 0);
const codeAt = (secret: string, ms: number) =>
  new TOTP({ secret: Secret.fromBase32(secret), algorithm: 'SHA1', digits: 6, period: 30 }).generate({ timestamp: ms });
const pinClock = (ms: number) => vi.spyOn(t.app.get(Clock), 'now').mockReturnValue(new Date(ms));

beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t?.close();
});
afterEach(() => {
  vi.restoreAllMocks();
});

/** A keeper with a confirmed second factor at T0: its secret and recovery codes. */
async function enrolled(name: string, language?: Language): Promise<{ k: SignedIn & { password: string }; secret: string; recoveryCodes: string[] }> {
  const k = await registerKeeper(t.app, name, language);
  pinClock(T0);
  const start = await http().post('/api/auth/second-factor/enrolment').set('Authorization', k.bearer).expect(201);
  const { secret } = start.body as TotpEnrolment;
  const done = await http()
    .post('/api/auth/second-factor/enrolment/confirm')
    .set('Authorization', k.bearer)
    .send({ code: codeAt(secret, T0), password: k.password })
    .expect(200);
  return { k, secret, recoveryCodes: (done.body as RecoveryCodesResponse).recoveryCodes };
}

const signIn = (email: string, password: string) => http().post('/api/auth/login').send({ email, password });
const secondStep = (pendingToken: string, code: string) => http().post('/api/auth/login/second-factor').send({ pendingToken, code });

describe('enrolment', () => {
  it('shows the secret once with an otpauth URI and a QR code, and turns on only after a right code and the password', async () => {
    const k = await registerKeeper(t.app, 'Enrolling Keeper');
    pinClock(T0);
    const start = await http().post('/api/auth/second-factor/enrolment').set('Authorization', k.bearer).expect(201);
    const e = start.body as TotpEnrolment;
    expect(e.secret).toMatch(/^[A-Z2-7]{32}$/);
    // Key URI format of authenticator apps: otpauth://totp/ISSUER:ACCOUNT?secret=…&issuer=…
    expect(e.otpauthUri).toBe(
      `otpauth://totp/Broodsilk:${encodeURIComponent(k.user.email)}?issuer=Broodsilk&secret=${e.secret}&algorithm=SHA1&digits=6&period=30`,
    );
    expect(Buffer.from(e.qrCode.replace('data:image/svg+xml;base64,', ''), 'base64').toString()).toMatch(/^<svg /);

    const wrongCode = await http()
      .post('/api/auth/second-factor/enrolment/confirm')
      .set('Authorization', k.bearer)
      .send({ code: codeAt(e.secret, T0 + 120_000), password: k.password })
      .expect(400);
    expect(wrongCode.body.details).toEqual([expect.objectContaining({ field: 'code' })]);
    await http()
      .post('/api/auth/second-factor/enrolment/confirm')
      .set('Authorization', k.bearer)
      .send({ code: codeAt(e.secret, T0), password: 'not my password' })
      .expect(400);
    expect((await http().get('/api/auth/me').set('Authorization', k.bearer).expect(200)).body.secondFactorEnabled).toBe(false);

    const done = await http()
      .post('/api/auth/second-factor/enrolment/confirm')
      .set('Authorization', k.bearer)
      .send({ code: codeAt(e.secret, T0), password: k.password })
      .expect(200);
    expect((done.body as RecoveryCodesResponse).recoveryCodes).toHaveLength(10);
    expect((await http().get('/api/auth/me').set('Authorization', k.bearer).expect(200)).body.secondFactorEnabled).toBe(true);
    expect((await http().get('/api/auth/second-factor').set('Authorization', k.bearer).expect(200)).body).toEqual({
      enabled: true,
      required: false,
      recoveryCodesLeft: 10,
    });

    // At rest the secret is sealed (AES-256-GCM), never the base32 text; recovery codes only as hashes.
    const row = (await t.orm.em.getConnection().execute('select totp_secret from users where id = ?', [k.user.id]))[0] as { totp_secret: string };
    expect(row.totp_secret).toMatch(/^v1\./);
    expect(row.totp_secret).not.toContain(e.secret);
    const hashes = (await t.orm.em.getConnection().execute('select code_hash from recovery_codes where user_id = ?', [k.user.id])) as { code_hash: string }[];
    expect(hashes).toHaveLength(10);
    for (const code of (done.body as RecoveryCodesResponse).recoveryCodes) expect(hashes.map((h) => h.code_hash)).not.toContain(code);

    // Notice (OWASP ASVS 5.0 V6.3.7) through the mail outbox.
    const mail = await waitForMail(k.user.email, /second factor was added/);
    expect(mail.text).toContain('authenticator app');
    // A second set-up while one is on is refused.
    await http().post('/api/auth/second-factor/enrolment').set('Authorization', k.bearer).expect(409);
  });
});

describe('sign-in with a second factor', () => {
  it('the right password gives a pending token, not a session; the code then gives the session', async () => {
    const { k, secret } = await enrolled('Two Step Keeper');
    pinClock(T0 + 30_000);
    const first = await signIn(k.user.email, k.password).expect(200);
    const challenge = first.body as SecondFactorChallenge;
    expect(challenge.secondFactor).toBe('totp');
    expect(first.headers['set-cookie']).toBeUndefined();
    expect(first.body).not.toHaveProperty('accessToken');
    // The pending token is no session.
    await http().get('/api/auth/me').set('Authorization', `Bearer ${challenge.pendingToken}`).expect(401);

    const wrong = await secondStep(challenge.pendingToken, codeAt(secret, T0 + 300_000)).expect(401);
    expect(wrong.body.details).toEqual([expect.objectContaining({ field: 'code' })]);
    const ok = await secondStep(challenge.pendingToken, codeAt(secret, T0 + 30_000)).expect(200);
    expect(ok.headers['set-cookie']?.[0]).toMatch(/^broodsilk_session=/);
    await http().get('/api/auth/me').set('Authorization', `Bearer ${ok.body.accessToken}`).expect(200);

    // The same code cannot sign in twice (OWASP ASVS 5.0 V6.5.1).
    const again = (await signIn(k.user.email, k.password).expect(200)).body as SecondFactorChallenge;
    await secondStep(again.pendingToken, codeAt(secret, T0 + 30_000)).expect(401);
  });

  it('a forged or expired pending token is refused', async () => {
    const { k, secret } = await enrolled('Expired Step Keeper');
    pinClock(T0 + 30_000);
    const challenge = (await signIn(k.user.email, k.password).expect(200)).body as SecondFactorChallenge;
    await secondStep(`${challenge.pendingToken}x`, codeAt(secret, T0 + 30_000)).expect(401);
    // A session token is not a pending token either.
    await secondStep(k.accessToken, codeAt(secret, T0 + 30_000)).expect(401);
    // Six minutes later (the pending token lasts five), by the app's clock.
    pinClock(T0 + 30_000 + 6 * 60_000);
    const late = await secondStep(challenge.pendingToken, codeAt(secret, T0 + 30_000 + 6 * 60_000)).expect(401);
    expect(late.body.message).toMatch(/expired/);
  });

  it('wrong codes count towards the account lock like wrong passwords: after five, even the right code waits', async () => {
    const { k, secret } = await enrolled('Guessed Code Keeper');
    pinClock(T0 + 30_000);
    const challenge = (await signIn(k.user.email, k.password).expect(200)).body as SecondFactorChallenge;
    for (let i = 0; i < 5; i++) await secondStep(challenge.pendingToken, String(100000 + i)).expect(401);
    await secondStep(challenge.pendingToken, codeAt(secret, T0 + 30_000)).expect(429);
    // The right password does not reopen it either.
    await signIn(k.user.email, k.password).expect(429);
  });

  it('a recovery code signs in once; the second time it is refused', async () => {
    const { k, recoveryCodes } = await enrolled('Recovering Keeper');
    const challenge = (await signIn(k.user.email, k.password).expect(200)).body as SecondFactorChallenge;
    await secondStep(challenge.pendingToken, recoveryCodes[3].toUpperCase()).expect(200);
    const next = (await signIn(k.user.email, k.password).expect(200)).body as SecondFactorChallenge;
    await secondStep(next.pendingToken, recoveryCodes[3]).expect(401);
    expect((await http().get('/api/auth/second-factor').set('Authorization', k.bearer).expect(200)).body.recoveryCodesLeft).toBe(9);
    await waitForMail(k.user.email, /recovery code was used/);
  });
});

describe('renewing the recovery codes', () => {
  const renew = (bearer: string, body: object) => http().post('/api/auth/second-factor/recovery-codes').set('Authorization', bearer).send(body);

  it('needs the password or an app code (not a recovery code); the new codes are shown once and every old one stops working', async () => {
    const { k, secret, recoveryCodes: old } = await enrolled('Renewing Keeper');
    const refused = await renew(k.bearer, {}).expect(400);
    expect(refused.body.details).toEqual([{ field: 'password', message: 'Enter your password or the code your app shows now.' }]);
    await renew(k.bearer, { password: 'not my password' }).expect(400);
    await renew(k.bearer, { code: old[0] }).expect(400);
    await http().post('/api/auth/second-factor/recovery-codes').send({ password: k.password }).expect(401);

    const byPassword = (await renew(k.bearer, { password: k.password }).expect(200)).body as RecoveryCodesResponse;
    expect(byPassword.recoveryCodes).toHaveLength(10);
    expect(byPassword.recoveryCodes.filter((c) => old.includes(c))).toEqual([]);
    expect((await http().get('/api/auth/second-factor').set('Authorization', k.bearer).expect(200)).body.recoveryCodesLeft).toBe(10);
    // An old code no longer signs in; a new one does.
    const first = (await signIn(k.user.email, k.password).expect(200)).body as SecondFactorChallenge;
    await secondStep(first.pendingToken, old[5]).expect(401);
    await secondStep(first.pendingToken, byPassword.recoveryCodes[5]).expect(200);
    await waitForMail(k.user.email, /recovery codes of your Broodsilk account were renewed/);

    // The app's current code (RFC 6238, generated by otpauth at the pinned clock) renews too, once per step.
    pinClock(T0 + 60_000);
    const byCode = (await renew(k.bearer, { code: codeAt(secret, T0 + 60_000) }).expect(200)).body as RecoveryCodesResponse;
    await renew(k.bearer, { code: codeAt(secret, T0 + 60_000) }).expect(400);
    const second = (await signIn(k.user.email, k.password).expect(200)).body as SecondFactorChallenge;
    await secondStep(second.pendingToken, byPassword.recoveryCodes[6]).expect(401);
    await secondStep(second.pendingToken, byCode.recoveryCodes[6]).expect(200);
  });

  it('an account without a second factor has no codes to renew (409)', async () => {
    const k = await registerKeeper(t.app, 'No Factor Keeper');
    await renew(k.bearer, { password: k.password }).expect(409);
  });
});

describe('removal', () => {
  it('needs the password and a code; then sign-in is one step again and a notice is mailed', async () => {
    const { k, secret, recoveryCodes } = await enrolled('Removing Keeper');
    pinClock(T0 + 30_000);
    await http().post('/api/auth/second-factor/removal').set('Authorization', k.bearer).send({ password: k.password, code: '000000' }).expect(400);
    await http()
      .post('/api/auth/second-factor/removal')
      .set('Authorization', k.bearer)
      .send({ password: 'wrong password', code: codeAt(secret, T0 + 30_000) })
      .expect(400);
    await http().post('/api/auth/second-factor/removal').set('Authorization', k.bearer).send({ password: k.password, code: recoveryCodes[0] }).expect(204);
    const plain = await signIn(k.user.email, k.password).expect(200);
    expect(plain.body.accessToken).toEqual(expect.any(String));
    const row = await t.orm.em.fork().findOneOrFail(User, { id: k.user.id }, { populate: ['totpSecret'] });
    expect(row.totpSecret).toBeNull();
    expect(await t.orm.em.getConnection().execute('select 1 from recovery_codes where user_id = ?', [k.user.id])).toHaveLength(0);
    await waitForMail(k.user.email, /second factor .* was removed/);
  });
});

describe('a lost phone and lost recovery codes', () => {
  it('the operator command removes the second factor and ends the sessions; the password alone signs in again', async () => {
    const { k } = await enrolled('Phone Lost Keeper');
    expect(await clearSecondFactor(t.orm.em.fork(), 'nobody@example.test')).toEqual({ ok: false, problem: expect.stringMatching(/No account/) });
    expect(await clearSecondFactor(t.orm.em.fork(), ` ${k.user.email.toUpperCase()} `)).toEqual({ ok: true, email: k.user.email });
    await http().get('/api/auth/me').set('Authorization', k.bearer).expect(401);
    const plain = await signIn(k.user.email, k.password).expect(200);
    expect(plain.body.user.secondFactorEnabled).toBe(false);
    expect(await clearSecondFactor(t.orm.em.fork(), k.user.email)).toEqual({ ok: false, problem: expect.stringMatching(/has no second factor/) });
  });
});

describe('administrators', () => {
  let demo: string | undefined;
  beforeAll(() => {
    demo = process.env.BROODSILK_DEMO;
  });
  afterEach(() => {
    if (demo === undefined) delete process.env.BROODSILK_DEMO;
    else process.env.BROODSILK_DEMO = demo;
  });

  it('an admin of a real install without a second factor is sent to set one up and kept from admin routes until then', async () => {
    delete process.env.BROODSILK_DEMO;
    const a = await registerKeeper(t.app, 'Real Admin');
    await t.orm.em.fork().nativeUpdate(User, { id: a.user.id }, { role: 'admin' });
    const me = (await http().get('/api/auth/me').set('Authorization', a.bearer).expect(200)).body;
    expect(me).toMatchObject({ role: 'admin', secondFactorEnabled: false, secondFactorRequired: true });
    const refused = await http().get('/api/admin/users').set('Authorization', a.bearer).expect(403);
    expect(refused.body.message).toMatch(/second factor/);

    pinClock(T0);
    const { secret } = (await http().post('/api/auth/second-factor/enrolment').set('Authorization', a.bearer).expect(201)).body as TotpEnrolment;
    await http()
      .post('/api/auth/second-factor/enrolment/confirm')
      .set('Authorization', a.bearer)
      .send({ code: codeAt(secret, T0), password: a.password })
      .expect(200);
    await http().get('/api/admin/users').set('Authorization', a.bearer).expect(200);
  });

  it("the local demo's admin (BROODSILK_DEMO with a loopback database) is exempt", async () => {
    process.env.BROODSILK_DEMO = '1';
    const a = await registerKeeper(t.app, 'Demo Admin');
    await t.orm.em.fork().nativeUpdate(User, { id: a.user.id }, { role: 'admin' });
    expect((await http().get('/api/auth/me').set('Authorization', a.bearer).expect(200)).body.secondFactorRequired).toBe(false);
    await http().get('/api/admin/users').set('Authorization', a.bearer).expect(200);
  });
});

/** The notices in the account's language: the catalogue's German `mail.security` words (shared/src/i18n/mail.ts). */
describe('notices to a German account', () => {
  it('says in German that a factor was added, codes renewed, a recovery code used and the factor removed', async () => {
    const { k, recoveryCodes } = await enrolled('Hanna', 'de');
    const added = await waitForMail(k.user.email, /zweiter Faktor hinzugefügt/);
    expect(added.subject).toBe('Deinem Broodsilk-Konto wurde ein zweiter Faktor hinzugefügt');
    expect(readableText(added)).toContain('Hallo Hanna,');
    expect(added.text).toContain('Bewahre deine Wiederherstellungscodes sicher auf.');

    const renewed = (await http().post('/api/auth/second-factor/recovery-codes').set('Authorization', k.bearer).send({ password: k.password }).expect(200))
      .body as RecoveryCodesResponse;
    expect(renewed.recoveryCodes.filter((c) => recoveryCodes.includes(c))).toEqual([]);
    const notice = await waitForMail(k.user.email, /Wiederherstellungscodes .* wurden erneuert/);
    expect(readableText(notice)).toContain('die bisherigen gelten nicht mehr');

    const challenge = (await signIn(k.user.email, k.password).expect(200)).body as SecondFactorChallenge;
    await secondStep(challenge.pendingToken, renewed.recoveryCodes[0]).expect(200);
    const used = await waitForMail(k.user.email, /Wiederherstellungscode wurde zur Anmeldung/);
    expect(readableText(used)).toContain('Dieser Code gilt nicht mehr.');

    await http()
      .post('/api/auth/second-factor/removal')
      .set('Authorization', k.bearer)
      .send({ password: k.password, code: renewed.recoveryCodes[1] })
      .expect(204);
    const removed = await waitForMail(k.user.email, /zweite Faktor .* wurde entfernt/);
    expect(readableText(removed)).toMatch(/Wenn du das warst, musst du nichts tun\. Wenn nicht, setze sofort dein Passwort unter http\S+ zurück/);
    expect(removed.text).not.toMatch(/Hello|If this was you/);
  });
});
