import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { TestApp } from './support/test-app';

let t: TestApp;

beforeAll(async () => {
  // A low limit for this file only; the config is read when the app module initialises.
  process.env.AUTH_RATE_LIMIT = '3';
  const { createTestApp } = await import('./support/test-app');
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

describe('sign-in rate limit', () => {
  it('slows repeated failures down with 429 and a message a person understands', async () => {
    const http = () => request(t.app.getHttpServer());
    const statuses: number[] = [];
    for (let i = 0; i < 5; i++) {
      const res = await http()
        .post('/api/auth/login')
        .send({ email: 'someone@example.test', password: `guess number ${i}` });
      statuses.push(res.status);
      if (res.status === 429)
        expect(res.body).toEqual({ statusCode: 429, error: 'Too Many Requests', message: 'Too many attempts. Wait a minute and try again.' });
    }
    expect(statuses).toEqual([401, 401, 401, 429, 429]);
    // Routes outside sign-in are not limited by it.
    await http().get('/api/health').expect(200);
  });
});
