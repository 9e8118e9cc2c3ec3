import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addDays, todayIn } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { createAnimal, speciesId } from './support/fixtures/collection';

let t: TestApp;
let mira: SignedIn;
let other: SignedIn;
let species: string;
let today: string;
const http = () => request(t.app.getHttpServer());
const molt = (who: SignedIn, animalId: string, body: object) => http().post(`/api/animals/${animalId}/molts`).set('Authorization', who.bearer).send(body);

beforeAll(async () => {
  t = await createTestApp();
  mira = await registerKeeper(t.app, 'Mira');
  other = await registerKeeper(t.app, 'Other');
  species = await speciesId(t.orm, 'Grammostola pulchripes');
  today = todayIn('UTC', new Date());
});
afterAll(async () => {
  await t.close();
});

describe('molts', () => {
  it('a maturing molt entered only as the day she or he matured counts as the last molt (readiness, list)', async () => {
    const f = await createAnimal(t.app, mira, { speciesId: species, label: 'MAT-F', sex: 'female', maturity: 'mature', maturedOn: addDays(today, -40) });
    expect(f).toMatchObject({ lastMoltOn: addDays(today, -40), readiness: { state: 'ready', lastMoltOn: addDays(today, -40), daysSinceMolt: 40 } });
    const m = await createAnimal(t.app, mira, { speciesId: species, label: 'MAT-M', sex: 'male', maturity: 'mature', maturedOn: addDays(today, -5) });
    const list = await http().get('/api/animals?q=MAT-').set('Authorization', mira.bearer).expect(200);
    expect(list.body.items.map((a: { id: string; lastMoltOn: string }) => [a.id, a.lastMoltOn])).toEqual([
      [f.id, addDays(today, -40)],
      [m.id, addDays(today, -5)],
    ]);
  });

  it('a maturing molt on a male sets his maturity date and starts his clock', async () => {
    const m = await createAnimal(t.app, mira, { speciesId: species, label: 'GP-M1', sex: 'male' });
    const res = await molt(mira, m.id, {
      moltedOn: addDays(today, -10),
      maturing: true,
      sizeCm: 12.5,
      exuviaSex: 'male',
      notes: 'Tibial hooks and bulbs visible',
    }).expect(201);
    expect(res.body).toMatchObject({ moltedOn: addDays(today, -10), maturing: true, sizeCm: 12.5, exuviaSex: 'male', photos: [] });
    const after = await http().get(`/api/animals/${m.id}`).set('Authorization', mira.bearer).expect(200);
    expect(after.body).toMatchObject({
      maturity: 'mature',
      maturedOn: addDays(today, -10),
      lastMoltOn: addDays(today, -10),
      maleClock: { state: 'fresh', daysSinceMaturing: 10 },
    });
  });

  it('a molt in the future is a 400 with a field message', async () => {
    const f = await createAnimal(t.app, mira, { speciesId: species, label: 'GP-F1', sex: 'female' });
    const res = await molt(mira, f.id, { moltedOn: addDays(today, 1) }).expect(400);
    expect(res.body.details).toEqual([{ field: 'moltedOn', message: `The molt date ${addDays(today, 1)} is in the future.` }]);
    const bad = await molt(mira, f.id, { moltedOn: '12/03/2025' }).expect(400);
    expect(bad.body.details).toEqual([{ field: 'moltedOn', message: 'The molt date must be a date written YYYY-MM-DD.' }]);
  });

  it('a maturing molt on a female is refused; an exuvia result sexes an unsexed animal', async () => {
    const f = await createAnimal(t.app, mira, { speciesId: species, label: 'GP-F2', sex: 'female' });
    const res = await molt(mira, f.id, { moltedOn: today, maturing: true }).expect(400);
    expect(res.body.details[0]).toMatchObject({ field: 'maturing', message: expect.stringMatching(/Only a male/) });
    const u = await createAnimal(t.app, mira, { speciesId: species, label: 'GP-U1', sex: 'unsexed' });
    await molt(mira, u.id, { moltedOn: addDays(today, -2), exuviaSex: 'female' }).expect(201);
    const after = await http().get(`/api/animals/${u.id}`).set('Authorization', mira.bearer).expect(200);
    expect(after.body.sex).toBe('female');
  });

  it('a mature female shows the days since her last molt, newest molt first in the list', async () => {
    const f = await createAnimal(t.app, mira, { speciesId: species, label: 'GP-F3', sex: 'female', maturity: 'mature' });
    await molt(mira, f.id, { moltedOn: addDays(today, -200) }).expect(201);
    await molt(mira, f.id, { moltedOn: addDays(today, -40), sizeCm: 15 }).expect(201);
    const list = await http().get(`/api/animals/${f.id}/molts`).set('Authorization', mira.bearer).expect(200);
    expect(list.body.map((m: { moltedOn: string }) => m.moltedOn)).toEqual([addDays(today, -40), addDays(today, -200)]);
    const after = await http().get(`/api/animals/${f.id}`).set('Authorization', mira.bearer).expect(200);
    expect(after.body.readiness).toMatchObject({ lastMoltOn: addDays(today, -40), daysSinceMolt: 40, state: 'ready' });
  });

  it('another keeper’s animal: its molts are 404 both ways', async () => {
    const f = await createAnimal(t.app, mira, { speciesId: species, label: 'GP-F4', sex: 'female' });
    await http().get(`/api/animals/${f.id}/molts`).set('Authorization', other.bearer).expect(404);
    await molt(other, f.id, { moltedOn: today }).expect(404);
  });
});
