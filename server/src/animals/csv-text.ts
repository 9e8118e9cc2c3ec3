import { BadRequestException, UnsupportedMediaTypeException } from '@nestjs/common';
import type { Request } from 'express';
import { CSV_MAX_BYTES } from './animals-csv.columns';

/** The CSV text of an import: a multipart `file`, or the body itself when sent as text/csv. */
export async function csvText(req: Request, file: { buffer?: Buffer } | undefined): Promise<string> {
  if (file?.buffer) return decode(file.buffer);
  if (!req.is('text/csv') && !req.is('text/plain')) {
    throw new UnsupportedMediaTypeException({ message: 'Send the CSV as the form field "file", or as the body with Content-Type text/csv.' });
  }
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of req as AsyncIterable<Buffer>) {
    size += chunk.length;
    if (size > CSV_MAX_BYTES) throw new BadRequestException({ message: 'The file is larger than 5 MB; import it in parts.' });
    chunks.push(chunk);
  }
  return decode(Buffer.concat(chunks));
}

function decode(bytes: Buffer): string {
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    throw new BadRequestException({ message: 'The file is not UTF-8 text. Save it as "CSV UTF-8" and try again.' });
  }
}
