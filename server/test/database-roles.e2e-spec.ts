/**
 * The app runs as a role that reads and writes rows but owns nothing: the owner migrates (and
 * creates pg-boss's schema and queues), then grants the runtime role its rights. With the runtime
 * connection the app boots, signs a keeper up, writes a record and queues a job, while every
 * schema change (ALTER, TRUNCATE, DROP, CREATE) is refused with PostgreSQL's
 * `insufficient_privilege` (SQLSTATE 42501, PostgreSQL manual, Appendix A "Error Codes"; the rights
 * themselves: PostgreSQL manual §5.8 "Privileges" and the GRANT / ALTER DEFAULT PRIVILEGES pages).
 */
import request from 'supertest';
import { Client } from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper } from './support/users';
import { createAnimal, speciesId } from './support/fixtures/collection';
import { migrateDatabase } from '../src/cli/migrate-database';
import { databaseUrls, roleOf } from '../src/database/database-urls';
import { JOBS_SCHEMA } from '../src/jobs/job-queues';
import { COMPOSE_QUEUE } from '../src/mail/mail-outbox.service';

const RUNTIME_ROLE = 'broodsilk_runtime_test';
const ownerUrl = process.env.DATABASE_URL!;
const asRole = (role: string) => {
  const u = new URL(ownerUrl);
  u.username = role;
  u.password = '';
  return u.toString();
};
const runtimeUrl = asRole(RUNTIME_ROLE);

/** Creating a role takes a superuser: the test clusters (scripts/lib.sh) have `postgres` with trust on loopback. */
async function ensureRuntimeRole(): Promise<void> {
  const admin = new Client({ connectionString: asRole('postgres') });
  await admin.connect();
  try {
    const found = await admin.query('select 1 from pg_roles where rolname = $1', [RUNTIME_ROLE]);
    if (!found.rowCount) await admin.query(`create role ${RUNTIME_ROLE} login`);
  } finally {
    await admin.end();
  }
}

let owner: TestApp;
let runtime: TestApp;
let asRuntime: Client;

const ownerSql = <T>(sql: string, params: unknown[] = []) => owner.orm.em.getConnection().execute<T[]>(sql, params);

beforeAll(async () => {
  owner = await createTestApp(); // as the owner: drops the schema and migrates up from nothing
  await ensureRuntimeRole();
  const report = await migrateDatabase(owner.orm, { owner: ownerUrl, runtime: runtimeUrl });
  expect(report).toEqual({ applied: [], grantedTo: RUNTIME_ROLE });
  runtime = await createTestApp({ runtimeUrl });
  asRuntime = new Client({ connectionString: runtimeUrl });
  await asRuntime.connect();
});
afterAll(async () => {
  await asRuntime?.end();
  await runtime?.close();
  await owner?.close();
});

/** The SQLSTATE a statement run as the runtime role fails with (null when it succeeds). */
async function refusal(sql: string): Promise<string | null> {
  try {
    await asRuntime.query(sql);
    return null;
  } catch (e) {
    return (e as { code?: string }).code ?? String(e);
  }
}

describe('database roles', () => {
  it('reads the owner from DATABASE_OWNER_URL and the app from DATABASE_URL; without an owner URL both are one role', () => {
    expect(databaseUrls({ DATABASE_URL: 'postgres://broodsilk_app@db/b', DATABASE_OWNER_URL: 'postgres://app@db/b' })).toEqual({
      owner: 'postgres://app@db/b',
      runtime: 'postgres://broodsilk_app@db/b',
    });
    expect(databaseUrls({ DATABASE_URL: 'postgres://app@db/b' })).toEqual({ owner: 'postgres://app@db/b', runtime: 'postgres://app@db/b' });
    expect(roleOf('postgres://broodsilk%5Fapp:secret@db/b')).toBe('broodsilk_app');
    expect(roleOf(runtimeUrl)).toBe(RUNTIME_ROLE);
  });

  it('the app runs as the runtime role: it signs a keeper up, writes a record and queues the welcome mail', async () => {
    const [{ current_user }] = (await asRuntime.query<{ current_user: string }>('select current_user')).rows;
    expect(current_user).toBe(RUNTIME_ROLE);
    const keeper = await registerKeeper(runtime.app, 'Ilse');
    const animal = await createAnimal(runtime.app, keeper, {
      speciesId: await speciesId(owner.orm, 'Tliltocatl vagans'),
      label: 'Role check female',
      sex: 'female',
    });
    expect((await ownerSql<{ label: string }>(`select label from animals where id = ?`, [animal.id])).map((r) => r.label)).toEqual(['Role check female']);
    const listed = await request(runtime.app.getHttpServer()).get('/api/animals').set('Authorization', keeper.bearer).expect(200);
    expect(JSON.stringify(listed.body)).toContain('Role check female');
    // The sign-up queued its mail job through pg-boss as the runtime role.
    const jobs = await ownerSql<{ n: number }>(`select count(*)::int as n from ${JOBS_SCHEMA}.job where name = ?`, [COMPOSE_QUEUE]);
    expect(jobs[0]!.n).toBeGreaterThan(0);
  });

  it('refuses ALTER TABLE, TRUNCATE, DROP TABLE and CREATE TABLE to the runtime role (42501 insufficient_privilege)', async () => {
    expect(await refusal('alter table users add column sneaky text')).toBe('42501');
    expect(await refusal('truncate table ledger_entries')).toBe('42501');
    expect(await refusal('drop table animals')).toBe('42501');
    expect(await refusal('create table public.sneaky (id int)')).toBe('42501');
    expect(await refusal('create index sneaky_index on animals (label)')).toBe('42501');
    expect(await refusal(`truncate table ${JOBS_SCHEMA}.job`)).toBe('42501');
    expect(await refusal(`create table ${JOBS_SCHEMA}.sneaky (id int)`)).toBe('42501');
    expect(await refusal('create schema sneaky')).toBe('42501');
    // Nothing changed: the column is not there and the tables still are.
    const columns = await ownerSql(`select 1 from information_schema.columns where table_name = 'users' and column_name = 'sneaky'`);
    expect(columns).toEqual([]);
    expect((await asRuntime.query('select count(*) from animals')).rowCount).toBe(1);
  });

  it('a table a later migration creates (as the owner) is readable and writable by the runtime role without a grant of its own', async () => {
    await ownerSql('create table later_feature (id int primary key, note text)');
    try {
      await asRuntime.query(`insert into later_feature values (1, 'written by the app')`);
      expect((await asRuntime.query('select note from later_feature')).rows).toEqual([{ note: 'written by the app' }]);
      expect(await refusal('truncate table later_feature')).toBe('42501');
    } finally {
      await ownerSql('drop table later_feature');
    }
  });

  it('migrating again changes nothing and grants again without error', async () => {
    expect(await migrateDatabase(owner.orm, { owner: ownerUrl, runtime: runtimeUrl })).toEqual({ applied: [], grantedTo: RUNTIME_ROLE });
    expect(await migrateDatabase(owner.orm, { owner: ownerUrl, runtime: ownerUrl })).toEqual({ applied: [], grantedTo: null });
  });
});
