import { PayloadTooLargeException, UnsupportedMediaTypeException } from '@nestjs/common';
import sharp, { type Metadata } from 'sharp';
import { refusal } from '../common/refusal';

/** Formats we take, as sharp reads them from the bytes (the file name and declared type are not trusted). */
const ACCEPTED = new Set(['jpeg', 'png', 'webp', 'heif', 'avif', 'tiff']);
const MAX_SIDE = 2560;
const THUMB_SIDE = 320;
/** Far above any phone camera's photo; a larger one is refused from its header, before it is decoded (a decompression bomb would fill memory). */
export const MAX_PHOTO_PIXELS = 40_000_000;

export interface ProcessedImage {
  full: Buffer;
  thumb: Buffer;
  width: number;
  height: number;
  contentType: 'image/jpeg';
}

const refuse = () => new UnsupportedMediaTypeException(refusal('photo.unreadable'));

/**
 * Turns an upload into a JPEG and a thumbnail. `.rotate()` applies the EXIF orientation first, and
 * re-encoding writes no metadata at all, so GPS position, camera and times are gone.
 */
export async function processImage(input: Buffer): Promise<ProcessedImage> {
  let meta: Metadata;
  try {
    meta = await sharp(input).metadata();
  } catch {
    throw refuse();
  }
  if (!meta.format || !ACCEPTED.has(meta.format)) throw refuse();
  if (meta.width * meta.height > MAX_PHOTO_PIXELS) {
    const values = { megapixels: ((meta.width * meta.height) / 1e6).toFixed(1), width: meta.width, height: meta.height, max: MAX_PHOTO_PIXELS / 1e6 };
    throw new PayloadTooLargeException(refusal('photo.tooManyPixels', values));
  }
  try {
    // The same bound inside the decoder too, should a header understate the size.
    const upright = sharp(input, { failOn: 'error', limitInputPixels: MAX_PHOTO_PIXELS }).rotate().flatten({ background: '#ffffff' });
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
