import './support/serve-client';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CSRF_HEADER, SESSION_COOKIE, type ApiErrorBody } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';

let t: TestApp;
let keeper: SignedIn;
const http = () => request(t.app.getHttpServer());

beforeAll(async () => {
  t = await createTestApp();
  keeper = await registerKeeper(t.app, 'Middleware Keeper');
});
afterAll(async () => {
  await t.close();
});

/** Nests `depth` arrays: [[[…]]]. */
const nested = (depth: number) => '['.repeat(depth) + ']'.repeat(depth);

describe('errors raised before a controller keep their status when the client is served too', () => {
  it('serves the client for a page path (the static module is active)', async () => {
    const res = await http().get('/collection').expect(200);
    expect(res.text).toContain('<title>Broodsilk</title>');
  });

  it('a cookie write without the CSRF header is 403 with the reload message', async () => {
    const res = await http().patch('/api/users/me').set('Cookie', `${SESSION_COOKIE}=${keeper.accessToken}`).send({ displayName: 'Changed' }).expect(403);
    expect((res.body as ApiErrorBody).message).toBe('This form is out of date. Reload the page and try again.');
  });

  it('a cookie write with a wrong CSRF header is 403 too', async () => {
    await http()
      .patch('/api/users/me')
      .set('Cookie', `${SESSION_COOKIE}=${keeper.accessToken}`)
      .set(CSRF_HEADER, 'not-the-token')
      .send({ displayName: 'Changed' })
      .expect(403);
  });

  it('malformed JSON is 400', async () => {
    const res = await http()
      .patch('/api/users/me')
      .set('Authorization', keeper.bearer)
      .set('Content-Type', 'application/json')
      .send('{"displayName": ')
      .expect(400);
    expect((res.body as ApiErrorBody).message).toBe('The request body is not valid JSON.');
  });

  it('an oversized body is 413', async () => {
    const res = await http()
      .patch('/api/users/me')
      .set('Authorization', keeper.bearer)
      .send({ displayName: 'x'.repeat(2_000_000) })
      .expect(413);
    expect((res.body as ApiErrorBody).message).toBe('The request is too large.');
  });

  it('JSON nested thousands of levels deep is 400 before it is parsed, even on sign-in', async () => {
    for (const path of ['/api/auth/login', '/api/users/me']) {
      const res = await http()
        .post(path)
        .set('Content-Type', 'application/json')
        .send(`{"email": ${nested(5000)}}`);
      expect(res.status, path).toBe(400);
      expect((res.body as ApiErrorBody).message).toMatch(/nested too deeply/);
    }
  });

  it('an unknown API path is still a JSON 404, not the client page', async () => {
    const res = await http().get('/api/no-such-thing').expect(404);
    expect((res.body as ApiErrorBody).statusCode).toBe(404);
  });
});
