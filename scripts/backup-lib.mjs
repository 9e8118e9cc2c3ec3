// Shared by backup.mjs and restore.mjs: where the database and the photo store are, as `npm start` sets them.
import { S3Client } from '@aws-sdk/client-s3';

export function settings(env = process.env) {
  return {
    // The owner's connection: it reads every table and may create them again when restoring.
    databaseUrl: env.DATABASE_OWNER_URL || env.DATABASE_URL || 'postgres://app@127.0.0.1:54329/broodsilk',
    bucket: env.S3_BUCKET ?? 'broodsilk-photos',
    s3: new S3Client({
      endpoint: env.S3_ENDPOINT ?? 'http://127.0.0.1:4569',
      region: env.S3_REGION ?? 'us-east-1',
      forcePathStyle: (env.S3_FORCE_PATH_STYLE ?? 'true') === 'true',
      credentials: { accessKeyId: env.S3_ACCESS_KEY_ID ?? 'S3RVER', secretAccessKey: env.S3_SECRET_ACCESS_KEY ?? 'S3RVER' },
    }),
  };
}

export const DUMP_FILE = 'database.dump';
export const PHOTOS_DIR = 'photos';
export const MANIFEST = 'manifest.json';
