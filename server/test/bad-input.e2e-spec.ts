/**
 * Input that used to reach the database or a library unchecked and came back as a 500: each is
 * now a 4xx with a message a person can act on, and nothing is written.
 */
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addDays, todayIn, type ApiErrorBody } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { createAnimal, speciesId } from './support/fixtures/collection';
import { createProject } from './support/projects';
import { createSac } from './support/sacs';
import { rowCounts } from './support/row-counts';

let t: TestApp;
let keeper: SignedIn;
let sacId: string;
let species: string;
const http = () => request(t.app.getHttpServer());

beforeAll(async () => {
  t = await createTestApp();
  keeper = await registerKeeper(t.app, 'Input Keeper');
  species = await speciesId(t.orm, 'Grammostola pulchripes');
  const project = await createProject(t.app, t.orm, keeper);
  sacId = (await createSac(t.app, keeper, project.id, { layDate: addDays(todayIn('UTC', new Date()), -10), pullFromDay: 30, pullToDay: 40 })).id;
});
afterAll(async () => {
  await t.close();
});

/** Sends, expects a 4xx with a message, and proves no table changed. */
async function refused(send: () => request.Test, status = 400): Promise<ApiErrorBody> {
  const before = await rowCounts(t.orm);
  const res = await send();
  expect(res.status, JSON.stringify(res.body)).toBe(status);
  const body = res.body as ApiErrorBody;
  expect(body.message.length).toBeGreaterThan(10);
  expect(await rowCounts(t.orm)).toEqual(before);
  return body;
}

const animal = (extra: object) => ({ speciesId: species, label: `A-${Date.now()}-${Math.random()}`, sex: 'female', maturity: 'immature', ...extra });

describe('NUL characters (PostgreSQL text cannot hold U+0000)', () => {
  it('are refused in a text field, naming the field', async () => {
    const body = await refused(() =>
      http()
        .post('/api/animals')
        .set('Authorization', keeper.bearer)
        .send(animal({ label: 'Rosie\u0000' })),
    );
    expect(body.details).toEqual([{ field: 'label', message: expect.stringMatching(/NUL/) }]);
  });

  it('are refused in a nested field and in a profile update', async () => {
    await refused(() => http().patch('/api/users/me').set('Authorization', keeper.bearer).send({ displayName: '\u0000' }));
    await refused(() =>
      http()
        .post(`/api/sacs/${sacId}/log`)
        .set('Authorization', keeper.bearer)
        .send({ kind: 'note', text: 'ok', temperature: { value: 25, unit: 'C\u0000' } }),
    );
  });

  it('are refused in a search', async () => {
    await refused(() => http().get('/api/animals?q=%00').set('Authorization', keeper.bearer));
  });
});

describe('lone UTF-16 surrogates (no UTF-8 form; PostgreSQL would get U+FFFD instead)', () => {
  it('are refused, even in a field validated as an e-mail address', async () => {
    const project = await createProject(t.app, t.orm, keeper);
    const body = await refused(() =>
      http()
        .post(`/api/projects/${project.id}/members`)
        .set('Authorization', keeper.bearer)
        .send({ name: 'Lena', email: 'lena\ud800@example.test', role: 'partner' }),
    );
    expect(body.details).toEqual([{ field: 'email', message: expect.stringMatching(/broken character/) }]);
  });
});

describe('null where null means nothing', () => {
  it('is refused for a field that cannot be empty, and the value stays', async () => {
    const body = await refused(() => http().patch('/api/users/me').set('Authorization', keeper.bearer).send({ displayName: null }));
    expect(body.details?.[0]?.field).toBe('displayName');
    const me = await http().get('/api/auth/me').set('Authorization', keeper.bearer).expect(200);
    expect(me.body.displayName).toBe('Input Keeper');
  });

  it('is refused in an optional field of a new record', async () => {
    await refused(() =>
      http()
        .post('/api/animals')
        .set('Authorization', keeper.bearer)
        .send(animal({ sex: null })),
    );
    await refused(() => http().post(`/api/sacs/${sacId}/log`).set('Authorization', keeper.bearer).send({ kind: 'note', text: 'x', at: null }));
  });

  it('still clears a value where clearing is allowed: the sac’s own pull window', async () => {
    const res = await http().patch(`/api/sacs/${sacId}`).set('Authorization', keeper.bearer).send({ pullFromDay: null, pullToDay: null }).expect(200);
    expect(res.body.pullWindow.origin).not.toBe('sac');
  });
});

describe('numbers beyond the database’s range', () => {
  it('an offset past a 32-bit integer is refused', async () => {
    await refused(() => http().get('/api/animals?offset=99999999999').set('Authorization', keeper.bearer));
    await refused(() => http().get('/api/animals?offset=1e19').set('Authorization', keeper.bearer));
  });
});

describe('instants and dates (RFC 3339 §5.6, ISO 8601-1:2019)', () => {
  const log = (at: string) => () => http().post(`/api/sacs/${sacId}/log`).set('Authorization', keeper.bearer).send({ kind: 'note', text: 'x', at });

  it.each([
    ['year 0', '0000-01-01T00:00:00Z'],
    ['30 February (RFC 3339 §5.7: day must exist in the month)', '2026-02-30T00:00Z'],
    ['hour 24 (RFC 3339 time-hour is 00-23)', '2026-03-01T24:00Z'],
    ['minute 60', '2026-03-01T10:60Z'],
    ['an offset of 24 hours (time-numoffset hour is 00-23)', '2026-03-01T10:00+24:00'],
    ['no offset (a local time is not an instant)', '2026-03-01T10:00:00'],
  ])('%s is refused, not rolled over', async (_what, at) => {
    const body = await refused(log(at));
    expect(body.details).toEqual([{ field: 'at', message: expect.stringMatching(/date and time with its offset/) }]);
  });

  it('a real instant with an offset is kept', async () => {
    const res = await http()
      .post(`/api/sacs/${sacId}/log`)
      .set('Authorization', keeper.bearer)
      .send({ kind: 'note', text: 'x', at: `${addDays(todayIn('UTC', new Date()), -2)}T23:30:00+05:30` });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(new Date(res.body.at).toISOString()).toBe(`${addDays(todayIn('UTC', new Date()), -2)}T18:00:00.000Z`);
  });

  it('a calendar date in year 0 is refused', async () => {
    const body = await refused(() =>
      http()
        .post('/api/animals')
        .set('Authorization', keeper.bearer)
        .send(animal({ acquiredOn: '0000-01-01' })),
    );
    expect(body.details?.[0]?.field).toBe('acquiredOn');
  });

  it('a pairing start needs a real instant with its offset too', async () => {
    const project = await createProject(t.app, t.orm, keeper);
    await refused(() =>
      http()
        .post(`/api/projects/${project.id}/pairings`)
        .set('Authorization', keeper.bearer)
        .send({ startedAt: '2026-02-30T19:30:00+02:00', durationMinutes: 30, outcome: 'connected' }),
    );
    await refused(() =>
      http()
        .post(`/api/projects/${project.id}/pairings`)
        .set('Authorization', keeper.bearer)
        .send({ startedAt: '2026-02-20T19:30:00', durationMinutes: 30, outcome: 'connected' }),
    );
  });
});

it('createAnimal fixture still works (sanity of the refusals above)', async () => {
  expect((await createAnimal(t.app, keeper, { speciesId: species, label: `Ok-${Date.now()}`, sex: 'male', maturity: 'immature' })).id).toBeTruthy();
});
