/** The sac end state renamed from "hatched" to "emerged": the migration rewrites stored rows both ways. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/test-app';
import { seedDemo } from '../src/seed/demo-seed';
import { DEMO_SEEDERS } from '../src/seed/demo-seeders';

let t: TestApp;
const BEFORE_RENAME = 'Migration20261201214408';

const outcomes = async (): Promise<Record<string, number>> => {
  const rows = await t.orm.em.getConnection().execute<{ outcome: string; n: string }[]>('select outcome::text as outcome, count(*) as n from sacs group by 1');
  return Object.fromEntries(rows.map((r) => [r.outcome, Number(r.n)]));
};

beforeAll(async () => {
  t = await createTestApp();
  expect(await seedDemo(t.orm.em.fork(), DEMO_SEEDERS, new Date('2026-06-15T10:00:00Z'))).toBe(true);
}, 90_000);
afterAll(async () => t?.close());

describe('sac outcome migration', () => {
  it('down() turns stored "emerged" back into "hatched", up() again into "emerged", and leaves the other outcomes alone', async () => {
    const migrated = await outcomes();
    expect(migrated.emerged).toBeGreaterThan(0);
    expect(migrated.hatched).toBeUndefined();

    await t.orm.getMigrator().down({ to: BEFORE_RENAME });
    const reverted = await outcomes();
    expect(reverted).toEqual({ ...Object.fromEntries(Object.entries(migrated).filter(([k]) => k !== 'emerged')), hatched: migrated.emerged });

    await t.orm.getMigrator().up();
    expect(await outcomes()).toEqual(migrated);
  });
});
