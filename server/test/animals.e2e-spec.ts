import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addDays, todayIn, type AnimalResponse } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { createAnimal, speciesId } from './support/fixtures/collection';
import { AnimalUsageRegistry } from '../src/animals/animal-usage.registry';

let t: TestApp;
let mira: SignedIn;
let other: SignedIn;
let vagans: string;
let regalis: string;
let today: string;
const http = () => request(t.app.getHttpServer());

beforeAll(async () => {
  t = await createTestApp();
  mira = await registerKeeper(t.app, 'Mira');
  other = await registerKeeper(t.app, 'Other Keeper');
  vagans = await speciesId(t.orm, 'Tliltocatl vagans');
  regalis = await speciesId(t.orm, 'Poecilotheria regalis');
  // registerKeeper leaves the time zone at UTC
  today = todayIn('UTC', new Date());
});
afterAll(async () => {
  await t.close();
});

describe('animals CRUD', () => {
  it('creates, reads, edits and deletes an animal of one’s own', async () => {
    const created = await createAnimal(t.app, mira, {
      speciesId: vagans,
      label: 'TV-001',
      sex: 'female',
      acquiredOn: addDays(today, -100),
      pricePaidMinor: 4500,
      priceCurrency: 'eur',
    });
    expect(created).toMatchObject({
      label: 'TV-001',
      sex: 'female',
      maturity: 'immature',
      status: 'active',
      custody: 'with-owner',
      priceCurrency: 'EUR',
      pricePaidMinor: 4500,
      owner: { kind: 'self', userId: mira.user.id, name: 'Mira' },
      recordedBy: { id: mira.user.id, name: 'Mira' },
      editable: true,
      maleClock: null,
      species: { id: vagans, scientificName: 'Tliltocatl vagans', group: 'nw-terrestrial', urticatingHairs: true },
    });
    const got = await http().get(`/api/animals/${created.id}`).set('Authorization', mira.bearer).expect(200);
    expect(got.body).toEqual(created);
    const patched = await http()
      .patch(`/api/animals/${created.id}`)
      .set('Authorization', mira.bearer)
      .send({ enclosure: 'Rack B2', maturity: 'mature', premoltNote: 'Dark abdomen, refusing food' })
      .expect(200);
    expect(patched.body).toMatchObject({
      enclosure: 'Rack B2',
      maturity: 'mature',
      readiness: { state: 'no-molt-recorded', lastMoltOn: null, premoltNote: 'Dark abdomen, refusing food' },
    });
    await http().delete(`/api/animals/${created.id}`).set('Authorization', mira.bearer).expect(204);
    await http().get(`/api/animals/${created.id}`).set('Authorization', mira.bearer).expect(404);
  });

  it('another keeper’s animal is 404 for GET, PATCH and DELETE, and absent from their list', async () => {
    const a = await createAnimal(t.app, mira, { speciesId: vagans, label: 'TV-PRIVATE', sex: 'male' });
    for (const call of [
      http().get(`/api/animals/${a.id}`),
      http().patch(`/api/animals/${a.id}`).send({ notes: 'mine now' }),
      http().delete(`/api/animals/${a.id}`),
    ]) {
      const res = await call.set('Authorization', other.bearer).expect(404);
      expect(res.body.message).toMatch(/not yours to see/);
    }
    const list = await http().get('/api/animals').set('Authorization', other.bearer).expect(200);
    expect(list.body.items.map((x: AnimalResponse) => x.id)).not.toContain(a.id);
    const still = await http().get(`/api/animals/${a.id}`).set('Authorization', mira.bearer).expect(200);
    expect(still.body.notes).toBeNull();
  });

  it('needs a session', async () => {
    await http().get('/api/animals').expect(401);
  });
});

describe('clear 400s with field messages', () => {
  const post = (body: object) => http().post('/api/animals').set('Authorization', mira.bearer).send(body).expect(400);

  it('an unknown species', async () => {
    const res = await post({ speciesId: '00000000-0000-4000-8000-000000000000', label: 'X-1', sex: 'female' });
    expect(res.body.details).toEqual([{ field: 'speciesId', message: 'Choose a species from the catalogue.' }]);
    const malformed = await post({ speciesId: 'tarantula', label: 'X-1', sex: 'female' });
    expect(malformed.body.details).toEqual([{ field: 'speciesId', message: 'Choose a species from the catalogue.' }]);
  });

  it('a maturity date before the acquisition date', async () => {
    const res = await post({
      speciesId: vagans,
      label: 'X-2',
      sex: 'male',
      maturity: 'mature',
      maturedOn: addDays(today, -30),
      acquiredOn: addDays(today, -10),
    });
    expect(res.body.details).toEqual([{ field: 'maturedOn', message: expect.stringMatching(/before the acquisition date/) }]);
  });

  it('a male marked mature with no date', async () => {
    const res = await post({ speciesId: vagans, label: 'X-3', sex: 'male', maturity: 'mature' });
    expect(res.body.details).toEqual([{ field: 'maturedOn', message: expect.stringMatching(/mature male needs the date of his maturing molt/) }]);
  });

  it('dates that are not ISO 8601 calendar dates, or in the future', async () => {
    const res = await post({ speciesId: vagans, label: 'X-4', sex: 'female', acquiredOn: '2025-02-29' });
    expect(res.body.details).toEqual([{ field: 'acquiredOn', message: 'The acquisition date must be a date written YYYY-MM-DD.' }]);
    const future = await post({ speciesId: vagans, label: 'X-4', sex: 'female', acquiredOn: addDays(today, 2) });
    expect(future.body.details[0]).toMatchObject({ field: 'acquiredOn', message: expect.stringMatching(/in the future/) });
  });

  it('a price without a currency, and a currency that ISO 4217 does not have', async () => {
    const res = await post({ speciesId: vagans, label: 'X-5', sex: 'female', pricePaidMinor: 1000 });
    expect(res.body.details).toEqual([{ field: 'priceCurrency', message: expect.stringMatching(/which currency/) }]);
    const bad = await post({ speciesId: vagans, label: 'X-5', sex: 'female', pricePaidMinor: 1000, priceCurrency: 'XYZ' });
    expect(bad.body.details).toEqual([{ field: 'priceCurrency', message: 'XYZ is not an ISO 4217 currency code.' }]);
  });

  it('a duplicate label is refused and named', async () => {
    await createAnimal(t.app, mira, { speciesId: vagans, label: 'DUP-1', sex: 'female' });
    const res = await post({ speciesId: vagans, label: 'DUP-1', sex: 'male' });
    expect(res.body.details).toEqual([{ field: 'label', message: 'You already have an animal labelled "DUP-1".' }]);
    // another keeper may use the same label
    await createAnimal(t.app, other, { speciesId: vagans, label: 'DUP-1', sex: 'female' });
  });
});

describe('owner and custody', () => {
  it('a male owned by another keeper, on loan to me: nothing about the keeper shows until they accept', async () => {
    const lender = await registerKeeper(t.app, 'Lender');
    const a = await createAnimal(t.app, mira, {
      speciesId: regalis,
      label: 'PR-LOAN',
      sex: 'male',
      maturity: 'mature',
      maturedOn: addDays(today, -60),
      ownerKind: 'keeper',
      ownerEmail: lender.user.email,
      custody: 'loan-in',
      dueBackOn: addDays(today, 60),
    });
    const email = lender.user.email.toLowerCase();
    expect(a).toMatchObject({ owner: { kind: 'keeper', name: email, email, awaitingAcceptance: true }, custody: 'loan-in', custodyParty: email });
    expect(a.owner.userId).toBeUndefined();
    // the owner does not see the record: it lives in the holder's collection
    await http().get(`/api/animals/${a.id}`).set('Authorization', lender.bearer).expect(404);

    // Only the keeper with that address sees the request and accepts it.
    const asked = await http().get('/api/animals/ownership-requests').set('Authorization', lender.bearer).expect(200);
    expect(asked.body).toEqual([{ animalId: a.id, label: 'PR-LOAN', speciesName: expect.any(String), recordedBy: mira.user.displayName }]);
    expect((await http().get('/api/animals/ownership-requests').set('Authorization', mira.bearer).expect(200)).body).toEqual([]);
    await http().post(`/api/animals/ownership-requests/${a.id}/accept`).set('Authorization', mira.bearer).expect(404);
    await http().post(`/api/animals/ownership-requests/${a.id}/accept`).expect(401);
    await http().post(`/api/animals/ownership-requests/${a.id}/accept`).set('Authorization', lender.bearer).expect(204);
    const after = await http().get(`/api/animals/${a.id}`).set('Authorization', mira.bearer).expect(200);
    expect(after.body.owner).toEqual({ kind: 'keeper', userId: lender.user.id, name: 'Lender' });
    const held = (await http().get('/api/animals?q=PR-LOAN').set('Authorization', mira.bearer).expect(200)).body.items;
    expect(held).toMatchObject([{ id: a.id, heldBy: null, lender: { name: 'Lender', email } }]);

    // Once accepted, the owner sees him in her own collection, on loan to Mira, read-only.
    const hers = (await http().get('/api/animals').set('Authorization', lender.bearer).expect(200)).body;
    expect(hers.items).toMatchObject([{ id: a.id, label: 'PR-LOAN', heldBy: { id: mira.user.id, name: mira.user.displayName } }]);
    const read = await http().get(`/api/animals/${a.id}`).set('Authorization', lender.bearer).expect(200);
    expect(read.body).toMatchObject({ editable: false, recordedBy: { id: mira.user.id } });
    await http().get(`/api/animals/${a.id}/molts`).set('Authorization', lender.bearer).expect(200);
    await http().patch(`/api/animals/${a.id}`).set('Authorization', lender.bearer).send({ enclosure: 'Mine' }).expect(404);
    await http().delete(`/api/animals/${a.id}`).set('Authorization', lender.bearer).expect(404);
    await http().post(`/api/animals/ownership-requests/${a.id}/accept`).set('Authorization', lender.bearer).expect(404);
  });

  it('answers a known and an unknown keeper e-mail the same way (no account enumeration), and refuses my own', async () => {
    const known = await registerKeeper(t.app, 'Known Keeper');
    const save = (label: string, ownerEmail: string) =>
      http().post('/api/animals').set('Authorization', mira.bearer).send({ speciesId: regalis, label, sex: 'male', ownerKind: 'keeper', ownerEmail });
    const a = await save('PR-K1', known.user.email);
    const b = await save('PR-K2', 'nobody.here@example.test');
    expect([a.status, b.status]).toEqual([201, 201]);
    const shape = (body: { owner: object }) => Object.keys(body.owner).sort();
    expect(shape(a.body)).toEqual(shape(b.body));
    expect(a.body.owner).toEqual({ kind: 'keeper', name: known.user.email.toLowerCase(), email: known.user.email.toLowerCase(), awaitingAcceptance: true });
    const mine = await save('PR-K3', mira.user.email).expect(400);
    expect(mine.body.details).toEqual([{ field: 'ownerEmail', message: 'That is your own e-mail: choose yourself as the owner instead.' }]);
  });

  it('refuses a loan-in owned by myself', async () => {
    const selfLoan = await http()
      .post('/api/animals')
      .set('Authorization', mira.bearer)
      .send({ speciesId: regalis, label: 'PR-X', sex: 'male', custody: 'loan-in' })
      .expect(400);
    expect(selfLoan.body.details).toContainEqual({ field: 'custody', message: expect.stringMatching(/belongs to someone else/) });
  });

  it('sold and deceased need a date', async () => {
    const a = await createAnimal(t.app, mira, { speciesId: vagans, label: 'SOLD-1', sex: 'female' });
    const res = await http().patch(`/api/animals/${a.id}`).set('Authorization', mira.bearer).send({ status: 'sold' }).expect(400);
    expect(res.body.details).toEqual([{ field: 'statusOn', message: 'Give the date the animal was sold.' }]);
    const ok = await http().patch(`/api/animals/${a.id}`).set('Authorization', mira.bearer).send({ status: 'sold', statusOn: today }).expect(200);
    expect(ok.body).toMatchObject({ status: 'sold', statusOn: today });
  });
});

describe('male clock in responses', () => {
  // State boundaries as shared/collection/male-clock.ts defines them; Poecilotheria uses the
  // ow-arboreal group lifespan of 4–12 months (from memory, docs/trade-facts.md §5).
  it.each([
    [5, 'fresh'],
    [60, 'prime'],
    [200, 'late'],
    [420, 'past-typical'],
  ])('a male matured %i days ago is %s', async (days, state) => {
    const a = await createAnimal(t.app, mira, {
      speciesId: regalis,
      label: `PR-CLOCK-${days}`,
      sex: 'male',
      maturity: 'mature',
      maturedOn: addDays(today, -days),
    });
    expect(a.maleClock).toMatchObject({ daysSinceMaturing: days, state, maturedOn: addDays(today, -days), lifespanMonths: { min: 4, max: 12, from: 'group' } });
  });

  it('GET /api/animals/males/clock lists mature males, the most urgent first', async () => {
    const res = await http().get('/api/animals/males/clock').set('Authorization', mira.bearer).expect(200);
    const states = res.body.map((r: { clock: { state: string } }) => r.clock.state);
    const rank = { 'past-typical': 0, late: 1, prime: 2, fresh: 3 } as Record<string, number>;
    expect(states.length).toBeGreaterThanOrEqual(4);
    expect([...states].sort((x: string, y: string) => rank[x] - rank[y])).toEqual(states);
    expect(states[0]).toBe('past-typical');
  });
});

describe('deleting an animal that is used elsewhere', () => {
  it('a registered usage check refuses DELETE with 409 and its reason', async () => {
    const a = await createAnimal(t.app, mira, { speciesId: vagans, label: 'USED-1', sex: 'female' });
    t.app.get(AnimalUsageRegistry).register(async (_em, id) => (id === a.id ? { key: 'animal.femaleOfProject', values: { project: 'Spring pairing' } } : null));
    const res = await http().delete(`/api/animals/${a.id}`).set('Authorization', mira.bearer).expect(409);
    expect(res.body.message).toBe('This animal cannot be deleted: it is the female of the project "Spring pairing". Mark it sold or deceased instead.');
    await http().get(`/api/animals/${a.id}`).set('Authorization', mira.bearer).expect(200);
  });

  it('a foreign key from another table (as the projects module will add) turns into a 409 with a reason', async () => {
    const a = await createAnimal(t.app, mira, { speciesId: vagans, label: 'USED-2', sex: 'male' });
    const conn = t.orm.em.getConnection();
    await conn.execute('create table "test_project_animals" ("animal_id" uuid not null references "animals" ("id") on delete restrict)');
    try {
      await conn.execute('insert into "test_project_animals" values (?)', [a.id]);
      const res = await http().delete(`/api/animals/${a.id}`).set('Authorization', mira.bearer).expect(409);
      expect(res.body.message).toMatch(/part of a breeding project.*Mark it sold or deceased instead/);
      await http().get(`/api/animals/${a.id}`).set('Authorization', mira.bearer).expect(200);
    } finally {
      await conn.execute('drop table "test_project_animals"');
    }
  });
});
