/**
 * Sign-in limits kept in PostgreSQL hold across API instances: two Nest apps on one database
 * share the per-account lock and the per-address count (OWASP ASVS 5.0 V6.3.1; OWASP
 * Authentication Cheat Sheet, "Account Lockout").
 */
import { Logger } from '@nestjs/common';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { TestApp } from './support/test-app';
import { registerKeeper } from './support/users';

let one: TestApp;
let two: TestApp;
const warnings = vi.spyOn(Logger.prototype, 'warn');

beforeAll(async () => {
  // A low per-address limit for this file only; the config is read when the app module initialises.
  process.env.AUTH_RATE_LIMIT = '9';
  const { createTestApp } = await import('./support/test-app');
  one = await createTestApp();
  two = await createTestApp({ fresh: false });
});
afterAll(async () => {
  await two?.close();
  await one?.close();
});

const loginAt = (t: TestApp, email: string, password: string, ip: string) =>
  request(t.app.getHttpServer()).post('/api/auth/login').set('X-Forwarded-For', ip).send({ email, password });
const events = (name: string) =>
  warnings.mock.calls.map((c) => c[0] as { event?: string; scope?: string }).filter((f) => typeof f === 'object' && f?.event === name);

describe('the per-account lock, across two API processes', () => {
  it('five wrong passwords in a row, spread over both apps, lock the account: the right one is refused on either', async () => {
    const k = await registerKeeper(one.app, 'Locked Keeper');
    const statuses: number[] = [];
    for (let i = 0; i < 5; i++) statuses.push((await loginAt(i % 2 ? two : one, k.user.email, `wrong guess ${i}`, '198.51.100.1')).status);
    expect(statuses).toEqual([401, 401, 401, 401, 401]);
    const right1 = await loginAt(one, k.user.email, k.password, '198.51.100.2');
    const right2 = await loginAt(two, k.user.email, k.password, '198.51.100.3');
    expect([right1.status, right2.status]).toEqual([429, 429]);
    expect(right1.body.message).toMatch(/^Too many wrong passwords for this account\. Wait (5\d|60) seconds and try again\.$/);
    expect(events('security.account_locked')).toHaveLength(1);
    expect(events('security.rate_limited').filter((e) => e.scope === 'account')).toHaveLength(2);
  });

  it('an unknown address is locked the same way, so a lock reveals nothing', async () => {
    const ghost = `ghost.${Date.now()}@example.test`;
    for (let i = 0; i < 5; i++) expect((await loginAt(i % 2 ? one : two, ghost, `guess ${i}`, '198.51.100.4')).status).toBe(401);
    expect((await loginAt(one, ghost, 'guess 5', '198.51.100.4')).status).toBe(429);
  });

  it('the lock doubles each time: the second lock of the day lasts 120 s', async () => {
    const k = await registerKeeper(one.app, 'Twice Locked');
    // Each round from its own address, so the per-address limit stays out of the way.
    const fail5 = async (ip: string) => {
      for (let i = 0; i < 5; i++) expect((await loginAt(one, k.user.email, `nope ${i}`, ip)).status).toBe(401);
    };
    await fail5('198.51.100.5');
    // End the first lock early, as if its minute had passed (the lock count stays).
    await one.orm.em.getConnection().execute(`delete from rate_limits where key = ?`, [`failures:${k.user.email}`]);
    expect((await loginAt(two, k.user.email, k.password, '198.51.100.6')).status).toBe(200);
    await fail5('198.51.100.7');
    const locked = await loginAt(two, k.user.email, k.password, '198.51.100.8');
    expect(locked.status).toBe(429);
    expect(locked.body.message).toMatch(/Wait (11\d|120) seconds/);
  });
});

describe('the per-address limit, across two API processes', () => {
  it('counts one client address on both apps together (9 a minute here)', async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 11; i++) statuses.push((await loginAt(i % 2 ? two : one, `someone${i}@example.test`, 'not it at all', '203.0.113.9')).status);
    expect(statuses).toEqual([401, 401, 401, 401, 401, 401, 401, 401, 401, 429, 429]);
    const refused = await loginAt(one, 'someone@example.test', 'x', '203.0.113.9');
    expect(refused.body).toEqual({ statusCode: 429, error: 'Too Many Requests', message: 'Too many attempts. Wait a minute and try again.' });
    // Another address is not affected.
    expect((await loginAt(two, 'someone@example.test', 'not it at all', '203.0.113.10')).status).toBe(401);
    expect(events('security.rate_limited').some((e) => e.scope === 'address')).toBe(true);
  });
});
