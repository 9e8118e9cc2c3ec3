import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addDays, todayIn, type PairingResponse, type ProjectResponse } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { createProject } from './support/projects';
import { createAnimal, speciesId } from './support/fixtures/collection';

let t: TestApp;
let owner: SignedIn;
const http = () => request(t.app.getHttpServer());
const today = () => todayIn('UTC', new Date());
const at = (daysAgo: number) => `${addDays(today(), -daysAgo)}T10:00:00Z`;
const pair = (projectId: string, body: object) =>
  http()
    .post(`/api/projects/${projectId}/pairings`)
    .set('Authorization', owner.bearer)
    .send({ durationMinutes: 40, outcome: 'connected', ...body });
const lay = (projectId: string, body: object) => http().post(`/api/projects/${projectId}/sacs`).set('Authorization', owner.bearer).send(body);
const project = async (id: string) => (await http().get(`/api/projects/${id}`).set('Authorization', owner.bearer).expect(200)).body as ProjectResponse;
const sacCount = async (id: string) => ((await http().get(`/api/projects/${id}/sacs`).set('Authorization', owner.bearer).expect(200)).body as unknown[]).length;

beforeAll(async () => {
  t = await createTestApp();
  owner = await registerKeeper(t.app, 'Vesna');
});
afterAll(async () => {
  await t.close();
});

describe('plausibility warnings: 422 with codes, nothing written; saved with the reason once acknowledged', () => {
  // common practice: a male pairs only after his maturing (ultimate) molt, when he has his emboli.
  it('a pairing dated before the male’s maturing molt', async () => {
    const p = await createProject(t.app, t.orm, owner, { maleAgeDays: 60 });
    const warned = await pair(p.id, { startedAt: at(70) }).expect(422);
    expect(warned.body.details).toEqual([
      {
        field: 'acknowledgedWarnings',
        code: 'pairing-before-male-matured',
        message: `The pairing (${addDays(today(), -70)}) is dated before the male's maturing molt (${addDays(today(), -60)}); an immature male cannot pair. Check the dates.`,
      },
    ]);
    expect((await http().get(`/api/projects/${p.id}/pairings`).set('Authorization', owner.bearer)).body).toEqual([]);
    const saved = await pair(p.id, { startedAt: at(70), acknowledgedWarnings: ['pairing-before-male-matured'], warningReason: 'Molt date was a guess' }).expect(
      201,
    );
    expect(saved.body).toMatchObject({ warningReason: 'Molt date was a guess' });
    await pair(p.id, { startedAt: at(50) }).expect(201); // after the molt: no warning
  });

  it('a sac with no pairing; the progress line then does not call "Paired" done', async () => {
    const p = await createProject(t.app, t.orm, owner);
    const warned = await lay(p.id, { layDate: addDays(today(), -3) }).expect(422);
    expect(warned.body.details.map((d: { code: string }) => d.code)).toEqual(['sac-without-pairing']);
    expect(await sacCount(p.id)).toBe(0);
    const saved = await lay(p.id, { layDate: addDays(today(), -3), acknowledgedWarnings: ['sac-without-pairing'], warningReason: 'Bought gravid' }).expect(201);
    expect(saved.body.warningReason).toBe('Bought gravid');
    expect((await project(p.id)).stage).toEqual({ stage: 'sac-laid', sacId: saved.body.id, unrecorded: ['paired'] });
  });

  // New World terrestrials need about 4–10 months from pairing to sac (species-groups data, from memory: at least 120 days).
  it('a sac sooner than the species’ minimum after the pairing, and one more than 365 days after it (TRADE-FACTS §3)', async () => {
    const soon = await createProject(t.app, t.orm, owner);
    await pair(soon.id, { startedAt: at(50) }).expect(201);
    const w1 = await lay(soon.id, { layDate: addDays(today(), -10) }).expect(422);
    expect(w1.body.details[0]).toMatchObject({
      code: 'sac-soon-after-pairing',
      message: expect.stringContaining('laid 40 days after the last successful pairing'),
    });
    expect(w1.body.details[0].message).toMatch(/usually needs at least 120 days/);
    const late = await createProject(t.app, t.orm, owner, { maleAgeDays: 600 });
    await pair(late.id, { startedAt: at(400) }).expect(201);
    const w2 = await lay(late.id, { layDate: addDays(today(), -10) }).expect(422);
    expect(w2.body.details[0]).toMatchObject({ code: 'sac-long-after-pairing', message: expect.stringContaining('laid 390 days after') });
    await lay(late.id, { layDate: addDays(today(), -10), acknowledgedWarnings: ['sac-long-after-pairing'] }).expect(400); // no reason
    expect(await sacCount(late.id)).toBe(0);
    await lay(late.id, { layDate: addDays(today(), -250) }).expect(201); // 150 days: within the usual range
  });

  it('a second open project on a female with a brood in progress', async () => {
    const first = await createProject(t.app, t.orm, owner);
    await lay(first.id, { layDate: addDays(today(), -3), acknowledgedWarnings: ['sac-without-pairing'], warningReason: 'Bought gravid' }).expect(201);
    const male = await createAnimal(t.app, owner, {
      speciesId: await speciesId(t.orm, 'Grammostola pulchripes'),
      label: 'M-second',
      sex: 'male',
      maturity: 'mature',
      maturedOn: addDays(today(), -30),
    });
    const body = { title: 'Again', femaleId: first.femaleAnimal.id, maleId: male.id };
    const warned = await http().post('/api/projects').set('Authorization', owner.bearer).send(body).expect(422);
    expect(warned.body.details).toEqual([
      {
        field: 'acknowledgedWarnings',
        code: 'female-has-brood-in-progress',
        message: `${first.femaleAnimal.label} has a brood in progress in the open project "${first.title}". Finish or end that project first, or save with a reason.`,
      },
    ]);
    const saved = await http()
      .post('/api/projects')
      .set('Authorization', owner.bearer)
      .send({ ...body, acknowledgedWarnings: ['female-has-brood-in-progress'], warningReason: 'The first sac is eaten already' })
      .expect(201);
    expect(saved.body.warningReason).toBe('The first sac is eaten already');
  });
});

describe('pairing corrections', () => {
  it('a correcting pairing strikes the old one: both listed, the stage follows the correction, partners told', async () => {
    const p = await createProject(t.app, t.orm, owner);
    const wrong = (await pair(p.id, { startedAt: at(20) }).expect(201)).body as PairingResponse;
    expect((await project(p.id)).stage.stage).toBe('waiting-for-sac');
    await pair(p.id, { startedAt: at(20), outcome: 'female-refused', corrects: wrong.id }).expect(400); // no reason
    const fixed = (
      await pair(p.id, { startedAt: at(20), outcome: 'female-refused', corrects: wrong.id, reason: 'She refused; logged the wrong outcome' }).expect(201)
    ).body as PairingResponse;
    expect(fixed).toMatchObject({ corrects: wrong.id, reason: 'She refused; logged the wrong outcome', struckBy: null });
    const list = (await http().get(`/api/projects/${p.id}/pairings`).set('Authorization', owner.bearer).expect(200)).body as PairingResponse[];
    expect(list.map((x) => [x.id, x.struckBy])).toEqual([
      [fixed.id, null],
      [wrong.id, fixed.id],
    ]);
    expect((await project(p.id)).stage.stage).toBe('paired');
    await pair(p.id, { startedAt: at(20), corrects: wrong.id, reason: 'again' }).expect(409);
    const events = (await http().get(`/api/projects/${p.id}/activity`).set('Authorization', owner.bearer).expect(200)).body as { kind: string }[];
    expect(events.map((e) => e.kind)).toContain('pairing.corrected');
  });
});
