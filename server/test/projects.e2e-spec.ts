import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addDays, todayIn, type ProjectResponse } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { createAnimal, speciesId } from './support/fixtures/collection';
import { addMember, createProject } from './support/projects';

let t: TestApp;
let mira: SignedIn;
let other: SignedIn;
let partner: SignedIn;
let caretaker: SignedIn;
let species: string;
let today: string;
const http = () => request(t.app.getHttpServer());
const daysAgoAt = (n: number) => new Date(Date.now() - n * 86_400_000).toISOString();

beforeAll(async () => {
  t = await createTestApp();
  mira = await registerKeeper(t.app, 'Mira');
  other = await registerKeeper(t.app, 'Other');
  partner = await registerKeeper(t.app, 'Tomasz');
  caretaker = await registerKeeper(t.app, 'Ines');
  species = await speciesId(t.orm, 'Grammostola pulchripes');
  today = todayIn('UTC', new Date());
});
afterAll(async () => {
  await t.close();
});

describe('creating a project', () => {
  it('starts planned with the owner as its only party, and lists it for the owner only', async () => {
    const p = await createProject(t.app, t.orm, mira, { title: 'Pulchripes spring pairing' });
    expect(p).toMatchObject({ title: 'Pulchripes spring pairing', stage: { stage: 'planned' }, myRole: 'owner', owner: { id: mira.user.id } });
    expect(p.members).toEqual([expect.objectContaining({ role: 'owner', userId: mira.user.id, hasAccount: true })]);
    const mine = await http().get('/api/projects').set('Authorization', mira.bearer).expect(200);
    expect(mine.body.map((x: { id: string }) => x.id)).toContain(p.id);
    expect(mine.body.find((x: { id: string }) => x.id === p.id).stage).toEqual({ stage: 'planned' });
    const theirs = await http().get('/api/projects').set('Authorization', other.bearer).expect(200);
    expect(theirs.body.map((x: { id: string }) => x.id)).not.toContain(p.id);
  });

  it('refuses a female that is a male, and animals from another keeper’s collection (400 with field messages)', async () => {
    const m1 = await createAnimal(t.app, mira, { speciesId: species, label: 'SX-M1', sex: 'male' });
    const m2 = await createAnimal(t.app, mira, { speciesId: species, label: 'SX-M2', sex: 'male' });
    const res = await http().post('/api/projects').set('Authorization', mira.bearer).send({ title: 'Wrong', femaleId: m1.id, maleId: m2.id }).expect(400);
    expect(res.body.details).toEqual([{ field: 'femaleId', message: 'SX-M1 is recorded as male, not female.' }]);
    const hers = await createAnimal(t.app, other, { speciesId: species, label: 'OT-F1', sex: 'female' });
    const res2 = await http().post('/api/projects').set('Authorization', mira.bearer).send({ title: 'Not mine', femaleId: hers.id, maleId: m2.id }).expect(400);
    expect(res2.body.details[0]).toMatchObject({ field: 'femaleId', message: expect.stringMatching(/no such animal in your collection/) });
    const empty = await http().post('/api/projects').set('Authorization', mira.bearer).send({ title: '', femaleId: 'x', maleId: m2.id }).expect(400);
    expect(empty.body.details.map((d: { field: string }) => d.field).sort()).toEqual(['femaleId', 'title']);
  });

  it('an animal in a project cannot be deleted (409 naming the project)', async () => {
    const p = await createProject(t.app, t.orm, mira, { title: 'Keeps its animals' });
    const res = await http().delete(`/api/animals/${p.female.id}`).set('Authorization', mira.bearer).expect(409);
    expect(res.body.message).toMatch(/female of the project "Keeps its animals"/);
  });
});

describe('access', () => {
  it('another keeper gets 404 for the project and everything under it, reading or writing', async () => {
    const p = await createProject(t.app, t.orm, mira);
    for (const path of ['', '/members', '/pairings', '/terms', '/activity']) {
      await http().get(`/api/projects/${p.id}${path}`).set('Authorization', other.bearer).expect(404);
    }
    await http().patch(`/api/projects/${p.id}`).set('Authorization', other.bearer).send({ title: 'Mine now' }).expect(404);
    await http()
      .post(`/api/projects/${p.id}/pairings`)
      .set('Authorization', other.bearer)
      .send({ startedAt: daysAgoAt(1), durationMinutes: 30, outcome: 'connected' })
      .expect(404);
    await http().get('/api/projects/not-a-uuid').set('Authorization', other.bearer).expect(404);
    const after = await http().get(`/api/projects/${p.id}`).set('Authorization', mira.bearer).expect(200);
    expect(after.body.title).toBe(p.title);
  });

  it('a partner reads the project and its two animals (no price paid) but cannot change it (403)', async () => {
    const p = await createProject(t.app, t.orm, mira, { title: 'Shared pair' });
    await addMember(t.orm, p.id, partner, 'partner');
    const res = await http().get(`/api/projects/${p.id}`).set('Authorization', partner.bearer).expect(200);
    const body = res.body as ProjectResponse;
    expect(body.myRole).toBe('partner');
    expect(body.femaleAnimal).toMatchObject({ id: p.female.id, sex: 'female', readiness: expect.objectContaining({ state: expect.any(String) }) });
    expect(body.maleAnimal).toMatchObject({ id: p.male.id, maleClock: expect.objectContaining({ state: 'prime', daysSinceMaturing: 60 }) });
    expect(body.maleAnimal).not.toHaveProperty('pricePaidMinor');
    expect(body.members.every((m) => m.email === null)).toBe(true);
    const patch = await http().patch(`/api/projects/${p.id}`).set('Authorization', partner.bearer).send({ title: 'Taken over' }).expect(403);
    expect(patch.body.message).toMatch(/Only the owner/);
    await http().post(`/api/projects/${p.id}/end`).set('Authorization', partner.bearer).send({ reason: 'no-sac' }).expect(403);
    // The animals themselves stay the recorder's: the animals route is still a 404 for the partner.
    await http().get(`/api/animals/${p.female.id}`).set('Authorization', partner.bearer).expect(404);
  });
});

describe('stage and warnings in responses', () => {
  it('a connected pairing moves the project to waiting-for-sac', async () => {
    const p = await createProject(t.app, t.orm, mira);
    await http()
      .post(`/api/projects/${p.id}/pairings`)
      .set('Authorization', mira.bearer)
      .send({ startedAt: daysAgoAt(3), durationMinutes: 25, outcome: 'interest-only' })
      .expect(201);
    const paired = await http().get(`/api/projects/${p.id}`).set('Authorization', mira.bearer).expect(200);
    expect(paired.body.stage).toEqual({ stage: 'paired' });
    const pr = await http()
      .post(`/api/projects/${p.id}/pairings`)
      .set('Authorization', mira.bearer)
      .send({ startedAt: daysAgoAt(2), durationMinutes: 40, outcome: 'connected', notes: 'Insertion seen twice' })
      .expect(201);
    expect(pr.body).toMatchObject({ on: addDays(today, -2), outcome: 'connected', durationMinutes: 40, recordedBy: { id: mira.user.id } });
    const res = await http().get(`/api/projects/${p.id}`).set('Authorization', mira.bearer).expect(200);
    expect(res.body.stage).toEqual({ stage: 'waiting-for-sac' });
    const list = await http().get('/api/projects').set('Authorization', mira.bearer).expect(200);
    expect(list.body.find((x: { id: string }) => x.id === p.id).stage).toEqual({ stage: 'waiting-for-sac' });
    const pairings = await http().get(`/api/projects/${p.id}/pairings`).set('Authorization', mira.bearer).expect(200);
    expect(pairings.body.map((x: { outcome: string }) => x.outcome)).toEqual(['connected', 'interest-only']);
  });

  it('a molt of the female after the pairing shows the warning and a female-molted setback', async () => {
    const p = await createProject(t.app, t.orm, mira);
    await http()
      .post(`/api/projects/${p.id}/pairings`)
      .set('Authorization', mira.bearer)
      .send({ startedAt: daysAgoAt(20), durationMinutes: 30, outcome: 'connected' })
      .expect(201);
    const before = await http().get(`/api/projects/${p.id}`).set('Authorization', mira.bearer).expect(200);
    expect(before.body.warnings.map((w: { code: string }) => w.code)).not.toContain('female-molted-after-pairing');
    await http()
      .post(`/api/animals/${p.female.id}/molts`)
      .set('Authorization', mira.bearer)
      .send({ moltedOn: addDays(today, -4) })
      .expect(201);
    const res = await http().get(`/api/projects/${p.id}`).set('Authorization', mira.bearer).expect(200);
    expect(res.body.stage).toEqual({ stage: 'paired', setback: 'female-molted' }); // advice, not an end: the keeper may pair her again
    expect(res.body.warnings[0]).toMatchObject({
      code: 'female-molted-after-pairing',
      severity: 'danger',
      message: expect.stringContaining(addDays(today, -4)),
    });
  });

  it('an old male with no pairing yet warns that his clock is running out', async () => {
    const p = await createProject(t.app, t.orm, mira, { maleAgeDays: 900 });
    const res = await http().get(`/api/projects/${p.id}`).set('Authorization', mira.bearer).expect(200);
    expect(res.body.warnings.map((w: { code: string }) => w.code)).toEqual(['no-pairing-male-late', 'male-clock-past-typical']);
  });

  it('a loaned male past his due-back date, and a male who died before pairing, with the failure clause', async () => {
    const f = await createAnimal(t.app, mira, { speciesId: species, label: 'LN-F1', sex: 'female', maturity: 'mature' });
    const m = await createAnimal(t.app, mira, {
      speciesId: species,
      label: 'LN-M1',
      sex: 'male',
      maturity: 'mature',
      maturedOn: addDays(today, -50),
      ownerKind: 'party',
      ownerName: 'Tomasz',
      custody: 'loan-in',
      dueBackOn: addDays(today, -3),
    });
    const p = (await http().post('/api/projects').set('Authorization', mira.bearer).send({ title: 'Loan', femaleId: f.id, maleId: m.id }).expect(201))
      .body as ProjectResponse;
    expect(p.warnings).toEqual([
      expect.objectContaining({ code: 'loan-overdue', message: `The loaned male was due back on ${addDays(today, -3)}, 3 days ago.` }),
    ]);
    await http()
      .patch(`/api/animals/${m.id}`)
      .set('Authorization', mira.bearer)
      .send({ status: 'deceased', statusOn: addDays(today, -1) })
      .expect(200);
    const res = await http().get(`/api/projects/${p.id}`).set('Authorization', mira.bearer).expect(200);
    expect(res.body.stage).toEqual({ stage: 'planned', setback: 'male-died' });
    expect(res.body.warnings).toEqual([expect.objectContaining({ code: 'male-died-before-pairing', message: expect.stringContaining('nothing is owed') })]);
  });

  it('the owner ends a project early with a reason; it is then closed to pairings', async () => {
    const p = await createProject(t.app, t.orm, mira);
    const bad = await http().post(`/api/projects/${p.id}/end`).set('Authorization', mira.bearer).send({ reason: 'bored' }).expect(400);
    expect(bad.body.details[0].field).toBe('reason');
    const res = await http()
      .post(`/api/projects/${p.id}/end`)
      .set('Authorization', mira.bearer)
      .send({ reason: 'no-sac', note: 'Nothing after eight months' })
      .expect(200);
    expect(res.body).toMatchObject({
      stage: { stage: 'ended-early', reason: 'no-sac' },
      endedOn: today,
      endedEarlyNote: 'Nothing after eight months',
      warnings: [],
    });
    await http().post(`/api/projects/${p.id}/end`).set('Authorization', mira.bearer).send({ reason: 'no-sac' }).expect(409);
    const late = await http()
      .post(`/api/projects/${p.id}/pairings`)
      .set('Authorization', mira.bearer)
      .send({ startedAt: daysAgoAt(0), durationMinutes: 10, outcome: 'connected' })
      .expect(409);
    expect(late.body.message).toMatch(/ended early, so no more pairings/);
  });

  it('a pairing counts on the owner’s calendar day, whoever looks', async () => {
    const kiwi = await registerKeeper(t.app, 'Kiwi Keeper');
    await http().patch('/api/users/me').set('Authorization', kiwi.bearer).send({ timeZone: 'Pacific/Auckland' }).expect(200);
    const p = await createProject(t.app, t.orm, kiwi);
    // 2 days ago at 20:00 UTC is the next morning in Auckland (UTC+12 or +13): the calendar day after.
    const at = new Date(`${addDays(today, -2)}T20:00:00Z`);
    const expected = new Intl.DateTimeFormat('en-CA', { timeZone: 'Pacific/Auckland', year: 'numeric', month: '2-digit', day: '2-digit' }).format(at);
    expect(expected).toBe(addDays(today, -1));
    const res = await http()
      .post(`/api/projects/${p.id}/pairings`)
      .set('Authorization', kiwi.bearer)
      .send({ startedAt: at.toISOString(), durationMinutes: 30, outcome: 'connected' })
      .expect(201);
    expect(res.body.on).toBe(expected);
  });

  it('refuses a pairing in the future or with a made-up outcome', async () => {
    const p = await createProject(t.app, t.orm, mira);
    const res = await http()
      .post(`/api/projects/${p.id}/pairings`)
      .set('Authorization', mira.bearer)
      .send({ startedAt: new Date(Date.now() + 86_400_000).toISOString(), durationMinutes: 30, outcome: 'connected' })
      .expect(400);
    expect(res.body.details).toEqual([{ field: 'startedAt', message: expect.stringMatching(/in the future/) }]);
    const bad = await http()
      .post(`/api/projects/${p.id}/pairings`)
      .set('Authorization', mira.bearer)
      .send({ startedAt: daysAgoAt(1), durationMinutes: 0, outcome: 'maybe' })
      .expect(400);
    expect(bad.body.details.map((d: { field: string }) => d.field).sort()).toEqual(['durationMinutes', 'outcome']);
  });
});

describe('parties', () => {
  it('the owner adds an outside party; a caretaker cannot; the owner cannot be removed', async () => {
    const p = await createProject(t.app, t.orm, mira);
    await addMember(t.orm, p.id, caretaker, 'caretaker');
    const added = await http()
      .post(`/api/projects/${p.id}/members`)
      .set('Authorization', mira.bearer)
      .send({ name: 'Jonas Feld', email: 'Jonas@Example.test', role: 'partner' })
      .expect(201);
    expect(added.body).toMatchObject({ name: 'Jonas Feld', email: 'jonas@example.test', role: 'partner', hasAccount: false, userId: null });
    await http()
      .post(`/api/projects/${p.id}/members`)
      .set('Authorization', mira.bearer)
      .send({ name: 'Jonas again', email: 'jonas@example.test', role: 'partner' })
      .expect(409);
    await http().post(`/api/projects/${p.id}/members`).set('Authorization', caretaker.bearer).send({ name: 'Friend', role: 'partner' }).expect(403);
    const list = await http().get(`/api/projects/${p.id}/members`).set('Authorization', caretaker.bearer).expect(200);
    expect(list.body.map((m: { role: string }) => m.role)).toEqual(['owner', 'caretaker', 'partner']);
    // The project list names the partners (not the caretaker) so a keeper sees who shares each brood.
    const projects = await http().get('/api/projects').set('Authorization', mira.bearer).expect(200);
    expect(projects.body.find((x: { id: string }) => x.id === p.id).partners).toEqual(['Jonas Feld']);
    const ownerMember = list.body[0].id;
    await http().delete(`/api/projects/${p.id}/members/${ownerMember}`).set('Authorization', mira.bearer).expect(400);
    await http().delete(`/api/projects/${p.id}/members/${added.body.id}`).set('Authorization', mira.bearer).expect(204);
    const after = await http().get(`/api/projects/${p.id}/members`).set('Authorization', mira.bearer).expect(200);
    expect(after.body).toHaveLength(2);
  });
});

describe('activity', () => {
  it('records each change in the timeline, newest first, and shows partners’ doings on the dashboard feed', async () => {
    const p = await createProject(t.app, t.orm, mira, { title: 'Timeline pair' });
    await http()
      .post(`/api/projects/${p.id}/pairings`)
      .set('Authorization', mira.bearer)
      .send({ startedAt: daysAgoAt(1), durationMinutes: 15, outcome: 'female-refused' })
      .expect(201);
    await http().patch(`/api/projects/${p.id}`).set('Authorization', mira.bearer).send({ notes: 'Try again after her next meal' }).expect(200);
    const res = await http().get(`/api/projects/${p.id}/activity`).set('Authorization', mira.bearer).expect(200);
    expect(res.body.map((e: { kind: string }) => e.kind)).toEqual(['project.updated', 'pairing.recorded', 'project.created']);
    expect(res.body[1]).toMatchObject({
      actor: { id: mira.user.id, name: 'Mira' },
      subject: { type: 'pairing' },
      projectTitle: 'Timeline pair',
      data: { outcome: 'female-refused' },
    });
  });
});
