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
import { waitForMail, mailsTo } from './support/mail-sink';
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
