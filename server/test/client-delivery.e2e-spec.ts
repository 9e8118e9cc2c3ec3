import { clientDist } from './support/built-client';
import { request as httpRequest, type IncomingHttpHeaders } from 'node:http';
import type { AddressInfo } from 'node:net';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { brotliDecompressSync, gunzipSync } from 'node:zlib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { firstPageScripts } from '../../scripts/bench/client.mjs';
import { createTestApp, type TestApp } from './support/test-app';

/**
 * The production build of the client as the server sends it. Sources: RFC 9110 §8.4 (Content-Encoding)
 * and §12.5.3 (Accept-Encoding), RFC 7932 (brotli), RFC 1952 (gzip), RFC 9111 §5.2.2.4 (no-cache) and
 * §5.2.2.1 (max-age), RFC 8246 (immutable).
 */
let t: TestApp;
let port: number;

interface Answer {
  status: number;
  headers: IncomingHttpHeaders;
  body: Buffer;
}

/** A plain HTTP GET that leaves the body as sent (fetch and supertest would decompress it). */
function get(path: string, acceptEncoding?: string): Promise<Answer> {
  return new Promise((resolve, reject) => {
    const req = httpRequest({ port, path, headers: acceptEncoding ? { 'Accept-Encoding': acceptEncoding } : {} }, (res) => {
      const chunks: Buffer[] = [];
      res.on('data', (chunk: Buffer) => chunks.push(chunk));
      res.on('end', () => resolve({ status: res.statusCode!, headers: res.headers, body: Buffer.concat(chunks) }));
    });
    req.on('error', reject);
    req.end();
  });
}

const onDisk = (file: string) => readFileSync(join(clientDist, file));
const indexHtml = () => onDisk('index.html').toString('utf8');
/** The hashed entry script and stylesheet index.html names. */
const entryAsset = (ext: 'js' | 'css') => indexHtml().match(new RegExp(`"/(assets/[^"]+\\.${ext})"`))![1];

beforeAll(async () => {
  t = await createTestApp();
  await t.app.listen(0, '127.0.0.1');
  port = (t.app.getHttpServer().address() as AddressInfo).port;
});
afterAll(async () => {
  await t.close();
});

describe('the built client is sent compressed and cached by content hash', () => {
  it('sends a hashed script as brotli when the browser accepts it, cached for a year as immutable', async () => {
    const script = entryAsset('js');
    const res = await get(`/${script}`, 'gzip, deflate, br');
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.headers['content-type']).toMatch(/^(text|application)\/javascript/);
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(res.headers.vary).toMatch(/Accept-Encoding/i);
    expect(brotliDecompressSync(res.body).equals(onDisk(script))).toBe(true);
    expect(res.body.length).toBeLessThan(onDisk(script).length / 2);
  });

  it('sends a hashed stylesheet as gzip to a browser without brotli', async () => {
    const sheet = entryAsset('css');
    const res = await get(`/${sheet}`, 'gzip');
    expect(res.headers['content-encoding']).toBe('gzip');
    expect(res.headers['content-type']).toMatch(/^text\/css/);
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(gunzipSync(res.body).equals(onDisk(sheet))).toBe(true);
  });

  it('sends the plain file to a client that accepts no encoding', async () => {
    const script = entryAsset('js');
    const res = await get(`/${script}`);
    expect(res.headers['content-encoding']).toBeUndefined();
    expect(res.body.equals(onDisk(script))).toBe(true);
  });

  it('keeps index.html revalidated on every visit, at / and at any page path, compressed too', async () => {
    for (const path of ['/', '/collection', '/projects/0b7c6a1e-0000-4000-8000-000000000000']) {
      const res = await get(path, 'gzip, br');
      expect(res.status, path).toBe(200);
      expect(res.headers['cache-control'], path).toBe('no-cache');
      expect(res.headers['content-type'], path).toMatch(/^text\/html/);
      expect(res.headers['content-encoding'], path).toBe('br');
      expect(brotliDecompressSync(res.body).toString('utf8'), path).toBe(indexHtml());
      // The page keeps the security headers the API has (helmet runs first).
      expect(res.headers['content-security-policy'], path).toContain("script-src 'self'");
    }
  });

  it('answers a hashed file of an older build with 404, not with the page', async () => {
    const res = await get('/assets/index-00000000.js', 'gzip');
    expect(res.status).toBe(404);
  });

  it('leaves /api to the API', async () => {
    const res = await get('/api/health', 'gzip');
    expect(res.headers['content-type']).toMatch(/^application\/json/);
    const missing = await get('/api/no-such-route');
    expect(missing.status).toBe(404);
    expect(missing.headers['content-type']).toMatch(/^application\/json/);
  });
});

describe('the first page loads only what sign-in and Today need', () => {
  it('carries no date-picker or file-drop code (those travel with the pages that use them)', () => {
    const { files } = firstPageScripts(clientDist);
    expect(files.length).toBeGreaterThan(3);
    for (const file of files) {
      const code = onDisk(file).toString('utf8');
      expect(code, file).not.toContain('@mantine/dates/');
      expect(code, file).not.toContain('@mantine/dropzone/');
    }
  });

  it('those modules do exist in the build, so the check above can fail', () => {
    const all = Object.values(JSON.parse(onDisk('.vite/manifest.json').toString('utf8')) as Record<string, { file: string }>).map((c) => c.file);
    const code = all.filter((f) => f.endsWith('.js')).map((f) => onDisk(f).toString('utf8'));
    expect(code.some((c) => c.includes('@mantine/dates/'))).toBe(true);
    expect(code.some((c) => c.includes('@mantine/dropzone/'))).toBe(true);
  });
});
