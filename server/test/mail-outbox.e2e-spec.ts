/**
 * Mail that belongs to a write is queued in the write's transaction and sent by a pg-boss worker
 * after commit; mail sent while the request waits (statements) answers 502/503 when the mail
 * server refuses or is away, and writes nothing. Runs against a fake SMTP server that can refuse.
 */
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ApiErrorBody } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { createProject } from './support/projects';
import { startFakeSmtp, type FakeSmtp } from './support/fake-smtp';
import { rowCounts } from './support/row-counts';
import { accountScenario, type AccountScenario } from './accounts.fixtures';
import { MailOutbox, MAIL_QUEUE } from '../src/mail/mail-outbox.service';
import { JOBS_SCHEMA } from '../src/jobs/jobs.service';
import { PasswordResetToken } from '../src/auth/password-reset-token.entity';
import { Invitation } from '../src/invitations/invitation.entity';

let smtp: FakeSmtp;
let t: TestApp;
let owner: SignedIn;
let s: AccountScenario;
const saved = { host: process.env.SMTP_HOST, port: process.env.SMTP_PORT };
const http = () => request(t.app.getHttpServer());

beforeAll(async () => {
  smtp = await startFakeSmtp();
  // The mail settings are read when the app is made.
  process.env.SMTP_HOST = '127.0.0.1';
  process.env.SMTP_PORT = String(smtp.port);
  t = await createTestApp();
  owner = await registerKeeper(t.app, 'Outbox Owner');
  s = await accountScenario(t.app, t.orm);
});
afterAll(async () => {
  await t?.close();
  await smtp?.close();
  for (const [k, v] of [
    ['SMTP_HOST', saved.host],
    ['SMTP_PORT', saved.port],
  ] as const) {
    if (v === undefined) delete process.env[k];
    else process.env[k] = v;
  }
});

async function queuedFor(address: string): Promise<number> {
  const rows = await t.orm.em
    .getConnection()
    .execute<{ n: number }[]>(`select count(*)::int as n from ${JOBS_SCHEMA}.job where name = ? and data->>'to' = ?`, [MAIL_QUEUE, address]);
  return rows[0].n;
}

async function until(check: () => boolean, ms = 8_000): Promise<void> {
  const end = Date.now() + ms;
  while (!check()) {
    if (Date.now() > end) throw new Error('timed out');
    await new Promise((r) => setTimeout(r, 100));
  }
}

describe('password reset', () => {
  it('stores the link and queues its mail together; the worker sends it', async () => {
    smtp.mode = 'accept';
    const k = await registerKeeper(t.app, 'Reset Keeper');
    await http().post('/api/auth/password-reset').send({ email: k.user.email }).expect(202);
    expect(await queuedFor(k.user.email)).toBe(1);
    await until(() => smtp.accepted.includes(k.user.email));
  });

  it('with the mail server away, still answers 202 and keeps the mail queued instead of failing', async () => {
    smtp.mode = 'down';
    const k = await registerKeeper(t.app, 'Reset Keeper Two');
    await http().post('/api/auth/password-reset').send({ email: k.user.email }).expect(202);
    expect(await t.orm.em.fork().count(PasswordResetToken, { user: k.user.id })).toBe(1);
    expect(await queuedFor(k.user.email)).toBe(1);
    smtp.mode = 'accept';
  });
});

describe('invitations', () => {
  it('a refused invitation writes no row and queues no mail', async () => {
    const project = await createProject(t.app, t.orm, owner);
    const before = await rowCounts(t.orm);
    const res = await http()
      .post(`/api/projects/${project.id}/invitations`)
      .set('Authorization', owner.bearer)
      .send({ email: owner.user.email, role: 'caretaker' })
      .expect(409);
    expect((res.body as ApiErrorBody).message).toMatch(/already a member/);
    expect(await rowCounts(t.orm)).toEqual(before);
    expect(await queuedFor(owner.user.email)).toBe(0);
  });

  it('with the mail server away, the invitation is made (201) and its mail waits in the queue', async () => {
    smtp.mode = 'down';
    const project = await createProject(t.app, t.orm, owner);
    const email = `queued-${Date.now()}@example.test`;
    await http().post(`/api/projects/${project.id}/invitations`).set('Authorization', owner.bearer).send({ email, role: 'caretaker' }).expect(201);
    expect(await t.orm.em.fork().count(Invitation, { email })).toBe(1);
    expect(await queuedFor(email)).toBe(1);
    smtp.mode = 'accept';
  });
});

describe('the queue is part of the write’s transaction', () => {
  it('a rolled-back transaction leaves no queued mail', async () => {
    const outbox = t.app.get(MailOutbox);
    const to = `rolled-back-${Date.now()}@example.test`;
    await expect(
      t.orm.em.fork().transactional(async (tx) => {
        await outbox.enqueue(tx, { to, subject: 'never', text: 'never' });
        throw new Error('refused after queueing');
      }),
    ).rejects.toThrow('refused after queueing');
    expect(await queuedFor(to)).toBe(0);
  });
});

describe('statement e-mails (sent while the request waits)', () => {
  const email = (memberId: string) => http().post(`/api/projects/${s.projectId}/statements/${memberId}/email`).set('Authorization', s.mira.bearer);

  it('an address the mail server refuses is a 502 naming the address, and nothing is written', async () => {
    smtp.mode = 'accept';
    smtp.refuse.add(s.tomasz.user.email.toLowerCase());
    const before = await rowCounts(t.orm);
    const res = await email(s.tomaszId).expect(502);
    expect((res.body as ApiErrorBody).message).toContain(s.tomasz.user.email);
    expect(await rowCounts(t.orm)).toEqual(before);
    smtp.refuse.clear();
  });

  it('a mail server that is away is a 503, and nothing is written', async () => {
    smtp.mode = 'down';
    const before = await rowCounts(t.orm);
    const res = await email(s.tomaszId).expect(503);
    expect((res.body as ApiErrorBody).message).toMatch(/mail server cannot be reached/);
    expect(await rowCounts(t.orm)).toEqual(before);
    smtp.mode = 'accept';
  });
});
