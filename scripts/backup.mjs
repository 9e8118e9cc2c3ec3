// npm run backup [-- <parent folder>]: a consistent pg_dump of the whole database (one snapshot, every
// schema, job queues included) and then every stored photo, into <parent>/broodsilk-<UTC time>/.
// The dump comes first: a photo stored after it is extra in the folder, never missing for a row.
import { execFileSync } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { GetObjectCommand, ListObjectsV2Command } from '@aws-sdk/client-s3';
import { DUMP_FILE, MANIFEST, PHOTOS_DIR, settings } from './backup-lib.mjs';

const { databaseUrl, bucket, s3 } = settings();
const parent = resolve(process.argv[2] ?? process.env.BACKUP_DIR ?? 'backups');
const stamp = new Date().toISOString().replace(/[:.]/g, '-');
const folder = join(parent, `broodsilk-${stamp}`);
mkdirSync(join(folder, PHOTOS_DIR), { recursive: true });

// Custom format: compressed, restorable table by table; --no-owner so it restores under any role.
execFileSync('pg_dump', ['--format=custom', '--no-owner', '--no-privileges', `--file=${join(folder, DUMP_FILE)}`, databaseUrl], { stdio: 'inherit' });

let photos = 0;
let token;
do {
  const page = await s3.send(new ListObjectsV2Command({ Bucket: bucket, ContinuationToken: token }));
  for (const { Key } of page.Contents ?? []) {
    const obj = await s3.send(new GetObjectCommand({ Bucket: bucket, Key }));
    const file = join(folder, PHOTOS_DIR, Key);
    mkdirSync(dirname(file), { recursive: true });
    writeFileSync(file, await obj.Body.transformToByteArray());
    photos += 1;
  }
  token = page.IsTruncated ? page.NextContinuationToken : undefined;
} while (token);

const database = new URL(databaseUrl).pathname.slice(1);
writeFileSync(join(folder, MANIFEST), `${JSON.stringify({ takenAt: new Date().toISOString(), database, bucket, photos }, null, 2)}\n`);
console.log(folder);
