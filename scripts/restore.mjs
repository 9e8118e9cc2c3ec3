// npm run restore -- <backup folder>: restores a folder written by `npm run backup` into the database
// at DATABASE_OWNER_URL (else DATABASE_URL), which must be empty (no tables), and puts the photos
// back into the bucket. Privileges are not restored: `npm run migrate -w server` grants the runtime role again.
import { execFileSync } from 'node:child_process';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, resolve } from 'node:path';
import { CreateBucketCommand, HeadBucketCommand, PutObjectCommand } from '@aws-sdk/client-s3';
import { DUMP_FILE, MANIFEST, PHOTOS_DIR, settings } from './backup-lib.mjs';

const folder = process.argv[2] && resolve(process.argv[2]);
if (!folder) {
  console.error('Usage: npm run restore -- <backup folder>');
  process.exit(2);
}
const manifest = JSON.parse(readFileSync(join(folder, MANIFEST), 'utf8'));
const { databaseUrl, bucket, s3 } = settings();

const tables = execFileSync('psql', ['-tAc', "select count(*) from pg_tables where schemaname not in ('pg_catalog','information_schema')", databaseUrl], {
  encoding: 'utf8',
});
if (Number(tables.trim()) !== 0) {
  console.error(`Refusing to restore: the database to restore into already has ${tables.trim()} tables. Restore into an empty database.`);
  process.exit(1);
}
// One transaction: a restore that fails part-way leaves the database empty, not half-filled.
execFileSync('pg_restore', ['--no-owner', '--no-privileges', '--exit-on-error', '--single-transaction', `--dbname=${databaseUrl}`, join(folder, DUMP_FILE)], {
  stdio: 'inherit',
});

try {
  await s3.send(new HeadBucketCommand({ Bucket: bucket }));
} catch {
  await s3.send(new CreateBucketCommand({ Bucket: bucket }));
}
const files = (dir) => readdirSync(dir).flatMap((n) => (statSync(join(dir, n)).isDirectory() ? files(join(dir, n)) : [join(dir, n)]));
const photoRoot = join(folder, PHOTOS_DIR);
let photos = 0;
for (const file of files(photoRoot)) {
  await s3.send(new PutObjectCommand({ Bucket: bucket, Key: relative(photoRoot, file), Body: readFileSync(file), ContentType: 'image/jpeg' }));
  photos += 1;
}
console.log(`Restored ${manifest.database} taken ${manifest.takenAt}: database and ${photos} of ${manifest.photos} photos.`);
console.log('Next: npm run migrate -w server (as the owner) gives the runtime role its rights again.');
if (photos !== manifest.photos) process.exit(1);
