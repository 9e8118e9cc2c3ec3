import type { Response } from 'superagent';

/** A supertest parser that keeps a binary body (zip, image) as one Buffer: `.buffer(true).parse(binaryBody)`. */
export function binaryBody(res: Response, done: (err: Error | null, body: Buffer) => void): void {
  const chunks: Buffer[] = [];
  res.on('data', (chunk: Buffer) => chunks.push(chunk));
  res.on('end', () => done(null, Buffer.concat(chunks)));
}
