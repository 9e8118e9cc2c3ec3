import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/test-app';

let t: TestApp | undefined;
afterAll(async () => {
  await t?.app.close().catch(() => undefined);
});

describe('GET /api/health', () => {
  it('is 200 while the database answers, 503 once it cannot be reached', async () => {
    t = await createTestApp({ fresh: false });
    const up = await request(t.app.getHttpServer()).get('/api/health').expect(200);
    expect(up.body).toEqual({ status: 'ok', db: 'up' });

    await t.orm.close(true); // the connection pool is gone: the database is out of reach
    const down = await request(t.app.getHttpServer()).get('/api/health').expect(503);
    expect(down.body).toMatchObject({ statusCode: 503, error: 'Service Unavailable', message: 'The database cannot be reached.' });
  });
});
