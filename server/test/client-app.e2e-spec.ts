import './support/serve-client';
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/test-app';

/** The built client as production serves it: its pages 200, other paths 404 (RFC 9110 §15.5.5), never a 200 for an unknown address. */
let t: TestApp;
const http = () => request(t.app.getHttpServer());

beforeAll(async () => {
  mkdirSync(join(process.env.CLIENT_DIST!, 'assets'), { recursive: true });
  writeFileSync(join(process.env.CLIENT_DIST!, 'assets', 'app.js'), 'console.log(1)');
  t = await createTestApp({ fresh: false });
});
afterAll(async () => t?.close());

describe('the client pages and the 404 rule', () => {
  it('answers each client page with the client and 200', async () => {
    for (const path of ['/', '/collection', '/collection/4b1d7f2e', '/projects/new', '/projects/p1/account', '/invitations/abc.def', '/settings/payouts'])
      expect((await http().get(path).expect(200)).text, path).toContain('<title>Broodsilk</title>');
  });

  it('answers any other path outside the API with the client (its not-found page) and 404', async () => {
    for (const path of ['/nope', '/wp-login.php', '/projects/p1/terms', '/collection/a/b'])
      expect((await http().get(path).expect(404)).text, path).toContain('<title>Broodsilk</title>');
  });

  it('serves the built files as they are; a missing one is a plain 404', async () => {
    expect((await http().get('/assets/app.js').expect(200)).text).toBe('console.log(1)');
    await http().get('/assets/missing.js').expect(404);
  });

  it('sends /login on to the sign-in page', async () => {
    await http().get('/login').expect(302).expect('Location', '/sign-in');
  });

  it('leaves unknown API paths to the API: a JSON 404', async () => {
    const res = await http().get('/api/nope').expect(404);
    expect(res.body).toMatchObject({ statusCode: 404 });
  });
});
