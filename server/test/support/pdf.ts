import { PDFParse } from 'pdf-parse';
import type request from 'supertest';

/** supertest's parser for a binary answer (a PDF): the body as one Buffer. */
export const binary: Parameters<request.Test['parse']>[0] = (r, cb) => {
  const chunks: Buffer[] = [];
  r.on('data', (c: Buffer) => chunks.push(c));
  r.on('end', () => cb(null, Buffer.concat(chunks)));
};

/** The text of a PDF, read back with pdf-parse. */
export async function pdfText(data: Buffer): Promise<string> {
  const parser = new PDFParse({ data });
  try {
    return (await parser.getText()).text;
  } finally {
    await parser.destroy();
  }
}
