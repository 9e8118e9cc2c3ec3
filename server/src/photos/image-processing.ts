import { UnsupportedMediaTypeException } from '@nestjs/common';
import sharp from 'sharp';

/** Formats we take, as sharp reads them from the bytes (the file name and declared type are not trusted). */
const ACCEPTED = new Set(['jpeg', 'png', 'webp', 'heif', 'avif', 'tiff']);
const MAX_SIDE = 2560;
const THUMB_SIDE = 320;

export interface ProcessedImage {
  full: Buffer;
  thumb: Buffer;
  width: number;
  height: number;
  contentType: 'image/jpeg';
}

const refuse = () => new UnsupportedMediaTypeException({ message: 'That file is not a photo we can read: upload a JPEG, PNG, WebP or HEIF/AVIF image.' });

/**
 * Turns an upload into a JPEG and a thumbnail. `.rotate()` applies the EXIF orientation first, and
 * re-encoding writes no metadata at all, so GPS position, camera and times are gone.
 */
export async function processImage(input: Buffer): Promise<ProcessedImage> {
  let format: string | undefined;
  try {
    format = (await sharp(input).metadata()).format;
  } catch {
    throw refuse();
  }
  if (!format || !ACCEPTED.has(format)) throw refuse();
  try {
    const upright = sharp(input, { failOn: 'error' }).rotate().flatten({ background: '#ffffff' });
    const { data: full, info } = await upright
      .clone()
      .resize({ width: MAX_SIDE, height: MAX_SIDE, fit: 'inside', withoutEnlargement: true })
      .jpeg({ quality: 85, mozjpeg: true })
      .toBuffer({ resolveWithObject: true });
    const thumb = await upright
      .clone()
      .resize({ width: THUMB_SIDE, height: THUMB_SIDE, fit: 'inside', withoutEnlargement: true })
      .jpeg({ quality: 75 })
      .toBuffer();
    return { full, thumb, width: info.width, height: info.height, contentType: 'image/jpeg' };
  } catch {
    throw refuse();
  }
}
