/**
 * Sign-up with a confirmed address: registration gives no session, a right password is refused
 * (403) until the e-mailed link is opened, and the link is single-use and expires after
 * EMAIL_CONFIRMATION_HOURS (docs/product.md, "Sign-up"; OWASP ASVS 5.0 V6.4.1 for single-use,
 * time-limited links sent by e-mail). Mails are read from the mail sink.
 */
import request from 'supertest';
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { EMAIL_CONFIRMATION_HOURS, EMAIL_NOT_CONFIRMED, SESSION_COOKIE } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { confirmationToken, confirmEmail } from './support/users';
import { mailsTo, waitForMail } from './support/mail-sink';
import { Clock } from '../src/common/clock';
import { EmailConfirmationToken } from '../src/auth/email-confirmation-token.entity';

let t: TestApp;
const http = () => request(t.app.getHttpServer());
const password = 'a fresh long passphrase';
let n = 0;

beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});
afterEach(() => vi.restoreAllMocks());

/** Registers a new address and returns it; nothing is confirmed yet. */
async function register(): Promise<string> {
  n += 1;
  const email = `confirm${n}.${Date.now()}@example.test`;
  await http()
    .post('/api/auth/register')
    .send({ email, password, displayName: `Reader ${n}` })
    .expect(202);
  return email;
}

const LINK = /\/confirm-email\?token=([A-Za-z0-9_-]{43})\b/;
const linksIn = async (email: string) => (await mailsTo(email)).map((m) => LINK.exec(m.text ?? '')?.[1]).filter((x): x is string => !!x);

describe('signing in before the address is confirmed', () => {
  it('a right password is refused with 403 and the reason the client offers "send it again" for; a wrong one stays the plain 401', async () => {
    const email = await register();
    const refused = await http().post('/api/auth/login').send({ email, password }).expect(403);
    expect(refused.body).toEqual({
      statusCode: 403,
      error: 'Forbidden',
      message: 'Confirm your e-mail address first: open the link we sent when you registered. No e-mail? Send it again.',
      reason: EMAIL_NOT_CONFIRMED,
    });
    expect(refused.headers['set-cookie']).toBeUndefined();
    const wrong = await http().post('/api/auth/login').send({ email, password: 'not the password at all' }).expect(401);
    const unknown = await http()
      .post('/api/auth/login')
      .send({ email: `nobody.${Date.now()}@example.test`, password: 'not the password at all' })
      .expect(401);
    expect(wrong.body).toEqual(unknown.body);
  });

  it('the e-mailed link confirms the address and signs in; afterwards the password works', async () => {
    const email = await register();
    const mail = await waitForMail(email, /Confirm your e-mail address/);
    expect(mail.text).toContain(`within ${EMAIL_CONFIRMATION_HOURS} hours`);
    const token = LINK.exec(mail.text ?? '')![1];
    // Only the SHA-256 of the token is stored (as for reset links).
    const rows = await t.orm.em.fork().find(EmailConfirmationToken, { user: { email } });
    expect(rows.length).toBeGreaterThan(0);
    expect(rows.every((r) => !r.tokenHash.includes(token))).toBe(true);

    const res = await http().post('/api/auth/confirm-email').send({ token }).expect(200);
    expect(res.body.session.user.email).toBe(email);
    expect(res.body.invitation).toBeNull();
    const cookies = res.headers['set-cookie'] as unknown as string[];
    expect(cookies.some((c) => c.startsWith(`${SESSION_COOKIE}=`))).toBe(true);
    await http()
      .get('/api/auth/me')
      .set('Authorization', `Bearer ${res.body.session.accessToken as string}`)
      .expect(200);
    await http().post('/api/auth/login').send({ email, password }).expect(200);
  });

  it('"send the e-mail again" answers the same for an unconfirmed, an unknown and a confirmed address; only the unconfirmed one gets a link', async () => {
    const waiting = await register();
    const unknown = `nobody.${Date.now()}@example.test`;
    const confirmed = await register();
    await waitForMail(confirmed, /Confirm your e-mail address/);
    await confirmEmail(t.app, await confirmationToken(t.app, confirmed));
    await waitForMail(waiting, /Confirm your e-mail address/);
    const before = (await linksIn(waiting)).length;
    const answers = await Promise.all(
      [waiting, unknown, confirmed].map(async (email) => (await http().post('/api/auth/confirm-email/resend').send({ email }).expect(202)).body as unknown),
    );
    expect(answers[1]).toEqual(answers[0]);
    expect(answers[2]).toEqual(answers[0]);
    for (let i = 0; i < 60 && (await linksIn(waiting)).length === before; i += 1) await new Promise((r) => setTimeout(r, 150));
    const links = await linksIn(waiting);
    expect(links).toHaveLength(before + 1);
    await new Promise((r) => setTimeout(r, 1000));
    expect(await mailsTo(unknown)).toHaveLength(0);
    expect(await linksIn(confirmed)).toHaveLength(1); // the registration's own mail, none after confirming
    await http()
      .post('/api/auth/confirm-email')
      .send({ token: links.at(-1) })
      .expect(200);
  });
});

describe('the confirmation link', () => {
  it('works once; the second use, and any other open link of the account, are refused with 400', async () => {
    const email = await register();
    const first = await confirmationToken(t.app, email);
    const second = await confirmationToken(t.app, email);
    await http().post('/api/auth/confirm-email').send({ token: first }).expect(200);
    const again = await http().post('/api/auth/confirm-email').send({ token: first }).expect(400);
    expect(again.body.message).toBe('This confirmation link has expired or was already used. Sign in to have a new one sent.');
    await http().post('/api/auth/confirm-email').send({ token: second }).expect(400);
    await http()
      .post('/api/auth/confirm-email')
      .send({ token: 'x'.repeat(43) })
      .expect(400);
  });

  it(`works for ${EMAIL_CONFIRMATION_HOURS} hours and not a moment after (controlled clock)`, async () => {
    const clock = t.app.get(Clock);
    const issued = new Date('2026-03-14T10:00:00Z');
    const email = await register();
    vi.spyOn(clock, 'now').mockReturnValue(issued);
    const late = await confirmationToken(t.app, email);
    const inTime = await confirmationToken(t.app, email);
    const deadline = issued.getTime() + EMAIL_CONFIRMATION_HOURS * 3600_000;
    vi.spyOn(clock, 'now').mockReturnValue(new Date(deadline));
    await http().post('/api/auth/confirm-email').send({ token: late }).expect(400);
    await http().post('/api/auth/login').send({ email, password }).expect(403);
    vi.spyOn(clock, 'now').mockReturnValue(new Date(deadline - 1000));
    await http().post('/api/auth/confirm-email').send({ token: inTime }).expect(200);
  });
});
