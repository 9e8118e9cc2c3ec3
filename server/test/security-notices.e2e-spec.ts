/**
 * Notices after a change to how an account signs in (OWASP ASVS 5.0 V6.3.7), read from the mail
 * sink; and registration and password reset doing the same work whether or not the address has
 * an account (OWASP ASVS 5.0 V6.3.8; OWASP Authentication Cheat Sheet, "Authentication and Error
 * Messages"), shown by counting SQL statements, argon2 runs and queued jobs, never by timing.
 */
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper } from './support/users';
import { waitForMail, mailsTo, readableText } from './support/mail-sink';
import { argon2Runs } from '../src/auth/password-hasher';
import { COMPOSE_QUEUE } from '../src/mail/mail-outbox.service';
import { JOBS_SCHEMA } from '../src/jobs/jobs.service';

/** The app whose statements are counted: its job workers are off, so only requests run SQL on it. */
let t: TestApp;
/** A second app on the same database whose workers send the queued mail. */
let worker: TestApp;
let statements: string[] = [];
const http = () => request(t.app.getHttpServer());

beforeAll(async () => {
  const jobs = process.env.JOBS_ENABLED;
  process.env.JOBS_ENABLED = 'false';
  t = await createTestApp();
  if (jobs === undefined) delete process.env.JOBS_ENABLED;
  else process.env.JOBS_ENABLED = jobs;
  worker = await createTestApp({ fresh: false });
  t.orm.em
    .getConnection()
    .getKnex()
    .on('query', (q: { sql: string }) => {
      statements.push(q.sql);
    });
});
afterAll(async () => {
  await worker?.close();
  await t?.close();
});

const composedJobs = async (kind: string, email: string) =>
  (
    await t.orm.em
      .getConnection()
      .execute<{ n: number }[]>(`select count(*)::int as n from ${JOBS_SCHEMA}.job where name = ? and data->>'kind' = ? and data->'data'->>'email' = ?`, [
        COMPOSE_QUEUE,
        kind,
        email,
      ])
  )[0].n;

/** What one request does: its SQL statements (text, in order) and argon2 runs. */
async function workOf(send: () => Promise<unknown>): Promise<{ sql: string[]; argon2: number }> {
  statements = [];
  const before = argon2Runs.count;
  await send();
  // The driver log shows each statement with its values inlined; the values (addresses, ids, hashes) differ by nature.
  const shape = (sql: string) => sql.replace(/'(?:[^']|'')*'/g, "'…'");
  return { sql: statements.map(shape), argon2: argon2Runs.count - before };
}

describe('notices', () => {
  it('a password change mails the owner a notice', async () => {
    const k = await registerKeeper(t.app, 'Changing Keeper');
    await http()
      .patch('/api/auth/password')
      .set('Authorization', k.bearer)
      .send({ currentPassword: k.password, newPassword: 'a brand new passphrase' })
      .expect(200);
    const mail = await waitForMail(k.user.email, /password was changed/);
    expect(mail.text).toContain('every other session was signed out');
  });

  it('a password reset through the mailed link mails a notice after it', async () => {
    const k = await registerKeeper(t.app, 'Resetting Keeper');
    await http().post('/api/auth/password-reset').send({ email: k.user.email }).expect(202);
    const link = await waitForMail(k.user.email, /Reset your Broodsilk password/);
    const token = /reset-password\?token=([\w-]+)/.exec(link.text ?? '')![1];
    await http().post('/api/auth/password-reset/confirm').send({ token, password: 'another fresh passphrase' }).expect(204);
    await waitForMail(k.user.email, /password was reset/);
  });
});

describe('the same work whether or not the address has an account', () => {
  it('password reset: same answer, same SQL, no argon2, one queued job each; only the known address gets a link', async () => {
    const k = await registerKeeper(t.app, 'Known Reset');
    const unknown = `nobody.${Date.now()}@example.test`;
    const known = await workOf(() => http().post('/api/auth/password-reset').send({ email: k.user.email }).expect(202));
    const stranger = await workOf(() => http().post('/api/auth/password-reset').send({ email: unknown }).expect(202));
    expect(stranger).toEqual(known);
    expect(known.argon2).toBe(0);
    expect(await composedJobs('password-reset-link', k.user.email)).toBe(1);
    expect(await composedJobs('password-reset-link', unknown)).toBe(1);
    await waitForMail(k.user.email, /Reset your Broodsilk password/);
    // The job for the unknown address finishes without sending anything.
    await new Promise((r) => setTimeout(r, 1500));
    expect(await mailsTo(unknown)).toHaveLength(0);
  });

  it('registration: a taken and a new address cost the same SQL, one argon2 hash and one queued job; the owner of the taken one is told, the new one gets its link', async () => {
    const owner = await registerKeeper(t.app, 'Address Owner');
    const fresh = `fresh.${Date.now()}@example.test`;
    const body = (email: string) => ({ email, password: 'yet another passphrase', displayName: 'Someone' });
    const ownersJobs = await composedJobs('registration-attempt', owner.user.email);
    const taken = await workOf(() => http().post('/api/auth/register').send(body(owner.user.email)).expect(202));
    const created = await workOf(() => http().post('/api/auth/register').send(body(fresh)).expect(202));
    expect(created.sql).toEqual(taken.sql);
    expect([created.argon2, taken.argon2]).toEqual([1, 1]);
    expect(await composedJobs('registration-attempt', owner.user.email)).toBe(ownersJobs + 1);
    expect(await composedJobs('registration-attempt', fresh)).toBe(1);
    const notice = await waitForMail(owner.user.email, /Someone tried to register/);
    expect(notice.text).toContain('No new account was made');
    // The new address gets its confirmation link instead, and nothing about an attempt.
    await waitForMail(fresh, /Confirm your e-mail address/);
    expect((await mailsTo(fresh)).map((m) => m.subject)).toEqual(['Confirm your e-mail address for Broodsilk']);
  });
});

/**
 * The same mails in the reader's language: the account's `language` (for a new account the one it
 * registered with). Expected words are the catalogue's German `mail` section (shared/src/i18n/mail.ts);
 * the count words follow CLDR plural rules ("45 Minuten", "24 Stunden"; Unicode CLDR, de plurals).
 */
describe("in the reader's language", () => {
  it('a German keeper gets the password-changed notice in German, with the reset address filled in', async () => {
    const k = await registerKeeper(t.app, 'Kerstin', 'de');
    await http()
      .patch('/api/auth/password')
      .set('Authorization', k.bearer)
      .send({ currentPassword: k.password, newPassword: 'eine ganz neue Passphrase' })
      .expect(200);
    const mail = await waitForMail(k.user.email, /Passwort wurde geändert/);
    const text = readableText(mail);
    expect(mail.subject).toBe('Dein Broodsilk-Passwort wurde geändert');
    expect(text).toContain('Hallo Kerstin,');
    expect(text).toContain('alle anderen Sitzungen wurden abgemeldet');
    expect(text).toMatch(/setze sofort dein Passwort unter http\S+\/forgot-password zurück/);
    expect(text).not.toMatch(/Hello|password was/);
  });

  it('a German keeper gets the reset link and the notice after it in German', async () => {
    const k = await registerKeeper(t.app, 'Karl', 'de');
    await http().post('/api/auth/password-reset').send({ email: k.user.email }).expect(202);
    const link = await waitForMail(k.user.email, /Setze dein Broodsilk-Passwort zurück/);
    expect(readableText(link)).toContain('öffne diesen Link innerhalb von 45 Minuten:');
    expect(link.text).toContain('Der Link funktioniert nur einmal.');
    const token = /reset-password\?token=([\w-]+)/.exec(link.text ?? '')![1];
    await http().post('/api/auth/password-reset/confirm').send({ token, password: 'noch eine frische Passphrase' }).expect(204);
    const notice = await waitForMail(k.user.email, /Passwort wurde zurückgesetzt/);
    expect(readableText(notice)).toContain('über einen per E-Mail geschickten Link zurückgesetzt');
  });

  it('a German account registers in German: its link, and the notice to the owner of a taken German address', async () => {
    const owner = await registerKeeper(t.app, 'Greta', 'de');
    const fresh = `neu.${Date.now()}@example.test`;
    const body = (email: string) => ({ email, password: 'noch eine Passphrase', displayName: 'Jemand', language: 'de' });
    await http().post('/api/auth/register').send(body(fresh)).expect(202);
    await http().post('/api/auth/register').send(body(owner.user.email)).expect(202);
    const confirm = await waitForMail(fresh, /Bestätige deine E-Mail-Adresse/);
    const text = readableText(confirm);
    expect(confirm.subject).toBe('Bestätige deine E-Mail-Adresse für Broodsilk');
    expect(text).toContain('Hallo Jemand,');
    expect(text).toContain('innerhalb von 24 Stunden');
    expect(text).toMatch(/\/confirm-email\?token=[\w-]+/);
    const notice = await waitForMail(owner.user.email, /registrieren/);
    expect(notice.subject).toBe('Jemand wollte sich mit deiner E-Mail-Adresse registrieren');
    expect(readableText(notice)).toMatch(/melde dich unter http\S+\/sign-in an/);
  });

  it('English stays as it was, with the values filled in', async () => {
    const fresh = `fresh.en.${Date.now()}@example.test`;
    await http().post('/api/auth/register').send({ email: fresh, password: 'yet another passphrase', displayName: 'Sam' }).expect(202);
    const mail = await waitForMail(fresh, /Confirm your e-mail address/);
    expect(readableText(mail)).toMatch(
      /^Confirm your e-mail address for Broodsilk\nHello Sam,\n\nTo finish creating your Broodsilk account, open this link within 24 hours and confirm the address:\n\nhttp\S+\/confirm-email\?token=[\w-]+\n\nThe link works once\./,
    );
  });
});
