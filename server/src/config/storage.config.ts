import { registerAs } from '@nestjs/config';

/** S3-compatible object storage for photos; a real bucket or a local fake differ only by these variables. */
export const storageConfig = registerAs('storage', () => ({
  endpoint: process.env.S3_ENDPOINT || undefined,
  region: process.env.S3_REGION ?? 'us-east-1',
  bucket: process.env.S3_BUCKET ?? 'broodsilk-photos',
  accessKeyId: process.env.S3_ACCESS_KEY_ID ?? '',
  secretAccessKey: process.env.S3_SECRET_ACCESS_KEY ?? '',
  forcePathStyle: process.env.S3_FORCE_PATH_STYLE === 'true',
  /** Create the bucket at start when it is missing (handy for a fake; harmless for a real one you own). */
  createBucket: process.env.S3_CREATE_BUCKET !== 'false',
  maxPhotoBytes: Number(process.env.PHOTO_MAX_BYTES ?? 15 * 1024 * 1024),
}));

export type StorageConfig = ReturnType<typeof storageConfig>;
