/**
 * `npm run backup` then `npm run restore` into an empty database give back the demo scenario:
 * the same row count in every table, the same ledger to the byte (an md5 over every ledger row),
 * and the stored photos in the bucket again.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import sharp from 'sharp';
import request from 'supertest';
import { DeleteObjectCommand, HeadObjectCommand, S3Client } from '@aws-sdk/client-s3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper } from './support/users';
import { createAnimal, speciesId } from './support/fixtures/collection';
import { seedDemo } from '../src/seed/demo-seed';
import { DEMO_SEEDERS } from '../src/seed/demo-seeders';
import { Photo } from '../src/photos/photo.entity';

const ROOT = join(__dirname, '..', '..');
const restoreUrl = () => {
  const u = new URL(process.env.DATABASE_URL!);
  u.pathname = '/broodsilk_restore_test';
  return u.toString();
};
let t: TestApp;
let photoKey: string;
const s3 = () =>
  new S3Client({
    endpoint: process.env.S3_ENDPOINT,
    region: process.env.S3_REGION,
    forcePathStyle: true,
    credentials: { accessKeyId: process.env.S3_ACCESS_KEY_ID!, secretAccessKey: process.env.S3_SECRET_ACCESS_KEY! },
  });

/** Rows per table and an md5 over the whole ledger, read with psql from the database at `url`. */
function fingerprint(url: string): { counts: Record<string, number>; ledger: string } {
  const sql = `select json_build_object(
      'counts', (select json_object_agg(table_name, (xpath('/row/n/text()', query_to_xml(format('select count(*) as n from %I', table_name), false, true, '')))[1]::text::int)
                 from information_schema.tables where table_schema = 'public' and table_type = 'BASE TABLE'),
      'ledger', (select md5(coalesce(string_agg(row_to_json(l)::text, '|' order by l.id), '')) from ledger_entries l))`;
  return JSON.parse(execFileSync('psql', ['-tAc', sql, url], { encoding: 'utf8' })) as { counts: Record<string, number>; ledger: string };
}

const run = (script: string, args: string[], env: NodeJS.ProcessEnv = {}) =>
  spawnSync('node', [join(ROOT, 'scripts', script), ...args], { env: { ...process.env, ...env }, encoding: 'utf8' });

beforeAll(async () => {
  t = await createTestApp();
  expect(await seedDemo(t.orm.em.fork(), DEMO_SEEDERS, new Date('2026-06-15T10:00:00Z'))).toBe(true);
  const keeper = await registerKeeper(t.app, 'Backup Keeper');
  const animal = await createAnimal(t.app, keeper, {
    speciesId: await speciesId(t.orm, 'Tliltocatl vagans'),
    label: 'BK-1',
    sex: 'female',
    maturity: 'mature',
  });
  const png = await sharp({ create: { width: 16, height: 16, channels: 3, background: '#335577' } })
    .png()
    .toBuffer();
  const photo = await request(t.app.getHttpServer())
    .post(`/api/animals/${animal.id}/photos`)
    .set('Authorization', keeper.bearer)
    .attach('file', png, 'p.png')
    .expect(201);
  photoKey = (await t.orm.em.fork().findOneOrFail(Photo, photo.body.id as string)).storageKey;
  const conn = t.orm.em.getConnection();
  await conn.execute('drop database if exists broodsilk_restore_test');
  await conn.execute('create database broodsilk_restore_test');
}, 120_000);
afterAll(async () => {
  await t.orm.em.getConnection().execute('drop database if exists broodsilk_restore_test');
  await t.close();
});

describe('backup and restore', () => {
  it('round-trips the demo: equal row counts, the same ledger checksum, and the photos back in the bucket', async () => {
    const parent = mkdtempSync(join(tmpdir(), 'broodsilk-backup-'));
    const backup = run('backup.mjs', [parent]);
    expect(backup.status, backup.stderr).toBe(0);
    const folder = backup.stdout.trim().split('\n').pop()!;
    expect(folder).toMatch(/broodsilk-\d{4}-\d{2}-\d{2}T/);

    await s3().send(new DeleteObjectCommand({ Bucket: process.env.S3_BUCKET, Key: photoKey }));
    const restore = run('restore.mjs', [folder], { DATABASE_URL: restoreUrl() });
    expect(restore.status, restore.stderr).toBe(0);

    const original = fingerprint(process.env.DATABASE_URL!);
    const restored = fingerprint(restoreUrl());
    expect(original.counts.ledger_entries).toBeGreaterThan(0);
    expect(original.counts.photos).toBeGreaterThan(0);
    expect(restored).toEqual(original);
    await s3().send(new HeadObjectCommand({ Bucket: process.env.S3_BUCKET, Key: photoKey }));
  }, 120_000);

  it('refuses to restore into a database that is not empty', () => {
    const parent = mkdtempSync(join(tmpdir(), 'broodsilk-backup-'));
    const folder = run('backup.mjs', [parent]).stdout.trim().split('\n').pop()!;
    const again = run('restore.mjs', [folder], { DATABASE_URL: restoreUrl() });
    expect(again.status).toBe(1);
    expect(again.stderr).toMatch(/Restore into an empty database/);
  }, 120_000);
});
