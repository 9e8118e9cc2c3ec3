/**
 * The migrations alone build the schema the entities describe: from an empty database up to the
 * latest, MikroORM's schema diff against the entity metadata is empty. Then every down() runs and
 * leaves nothing of ours behind, and up() again gives the same empty diff.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/test-app';

let t: TestApp;

beforeAll(async () => {
  t = await createTestApp(); // drops the public schema and migrates up from nothing
});
afterAll(async () => {
  await t.close();
});

const diff = async () => (await t.orm.getSchemaGenerator().getUpdateSchemaSQL({ wrap: false })).trim();
const tables = async () =>
  (await t.orm.em.getConnection().execute<{ tablename: string }[]>("select tablename from pg_tables where schemaname = 'public' order by 1")).map(
    (r) => r.tablename,
  );

describe('migrations', () => {
  it('from empty to latest match the entities exactly (no schema diff, no migration needed)', async () => {
    expect(await t.orm.getMigrator().getPendingMigrations()).toEqual([]);
    expect(await diff()).toBe('');
    expect(await t.orm.getMigrator().checkMigrationNeeded()).toBe(false);
  });

  it('down() to nothing drops every table of ours, and up() again gives the same schema', async () => {
    const migrator = t.orm.getMigrator();
    const applied = (await migrator.getExecutedMigrations()).length;
    expect(applied).toBeGreaterThan(0);
    await migrator.down({ to: 0 });
    expect(await tables()).toEqual(['mikro_orm_migrations']);
    await migrator.up();
    expect((await migrator.getExecutedMigrations()).length).toBe(applied);
    expect(await diff()).toBe('');
  });
});
