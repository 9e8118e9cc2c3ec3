import { BadRequestException, UnsupportedMediaTypeException } from '@nestjs/common';
import type { Request } from 'express';
import { CSV_MAX_BYTES } from './animals-csv.columns';
import { refusal } from '../common/refusal';

/** The CSV text of an import: a multipart `file`, or the body itself when sent as text/csv. */
export async function csvText(req: Request, file: { buffer?: Buffer } | undefined): Promise<string> {
  if (file?.buffer) return decode(file.buffer);
  if (!req.is('text/csv') && !req.is('text/plain')) {
    throw new UnsupportedMediaTypeException(refusal('csv.howToSend'));
  }
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of req as AsyncIterable<Buffer>) {
    size += chunk.length;
    if (size > CSV_MAX_BYTES) throw new BadRequestException(refusal('csv.tooLarge'));
    chunks.push(chunk);
  }
  return decode(Buffer.concat(chunks));
}

function decode(bytes: Buffer): string {
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    throw new BadRequestException(refusal('csv.notUtf8'));
  }
}
