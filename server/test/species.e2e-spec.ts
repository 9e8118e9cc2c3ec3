import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/test-app';

let t: TestApp;

beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

describe('collection schema', () => {
  it('migrates the species and animals tables up from empty', async () => {
    const rows = await t.orm.em.getConnection().execute<{ table_name: string }[]>(
      `select table_name from information_schema.tables where table_schema = 'public' and table_name in ('species', 'animals', 'molts', 'photos') order by table_name`,
    );
    expect(rows.map((r) => r.table_name)).toEqual(['animals', 'molts', 'photos', 'species']);
  });
});
