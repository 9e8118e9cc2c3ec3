import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addDays, todayIn, type ActivityEventResponse, type AnimalResponse, type ProjectResponse } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { createAnimal, speciesId } from './support/fixtures/collection';
import { addMember, createProject } from './support/projects';
import { createSac } from './support/sacs';
import { Clock } from '../src/common/clock';
import { Project } from '../src/projects/project.entity';

// The breeding season on the animals side: feeding log, premolt, sperm web, penultimate males, the
// return of a loaned male and a male's death. Names and dates are an invented scenario.
let t: TestApp;
let mira: SignedIn;
let partner: SignedIn;
let caretaker: SignedIn;
let stranger: SignedIn;
let species: string;
let today: string;
const http = () => request(t.app.getHttpServer());
const as = (who: SignedIn) => ({
  get: (path: string) => http().get(`/api${path}`).set('Authorization', who.bearer),
  post: (path: string, body: object) => http().post(`/api${path}`).set('Authorization', who.bearer).send(body),
  patch: (path: string, body: object) => http().patch(`/api${path}`).set('Authorization', who.bearer).send(body),
});
const activity = async (who: SignedIn, projectId: string) => (await as(who).get(`/projects/${projectId}/activity`).expect(200)).body as ActivityEventResponse[];

/** A project of Mira with Ines as partner and Jonas as caretaker. */
async function sharedProject(title: string): Promise<ProjectResponse> {
  const p = await createProject(t.app, t.orm, mira, { title });
  await addMember(t.orm, p.id, partner, 'partner');
  await addMember(t.orm, p.id, caretaker, 'caretaker');
  return p;
}

beforeAll(async () => {
  t = await createTestApp();
  mira = await registerKeeper(t.app, 'Mira');
  partner = await registerKeeper(t.app, 'Ines');
  caretaker = await registerKeeper(t.app, 'Jonas');
  stranger = await registerKeeper(t.app, 'Other');
  species = await speciesId(t.orm, 'Grammostola pulchripes');
  today = todayIn('UTC', t.app.get(Clock).now());
});
afterAll(async () => {
  await t.close();
});

describe('feeding log', () => {
  it('keeps feedings newest first; a correction strikes the old entry with its reason', async () => {
    const f = await createAnimal(t.app, mira, { speciesId: species, label: 'FD-1', sex: 'female', maturity: 'mature' });
    const first = await as(mira)
      .post(`/animals/${f.id}/feedings`, { fedOn: addDays(today, -9), prey: '2 adult crickets', taken: true })
      .expect(201);
    await as(mira)
      .post(`/animals/${f.id}/feedings`, { fedOn: addDays(today, -2), prey: '1 dubia roach', taken: false, note: 'Plug half closed' })
      .expect(201);
    const fix = await as(mira)
      .post(`/animals/${f.id}/feedings`, {
        fedOn: addDays(today, -9),
        prey: '2 adult crickets',
        taken: false,
        strikes: first.body.id,
        reason: 'She left them; they were removed next day',
      })
      .expect(201);
    expect(fix.body).toMatchObject({ taken: false, strikes: { id: first.body.id, reason: 'She left them; they were removed next day' }, struckBy: null });
    const list = (await as(mira).get(`/animals/${f.id}/feedings`).expect(200)).body;
    expect(list.map((e: { fedOn: string; taken: boolean; struckBy: string | null }) => [e.fedOn, e.taken, e.struckBy])).toEqual([
      [addDays(today, -2), false, null],
      [addDays(today, -9), false, null],
      [addDays(today, -9), true, fix.body.id],
    ]);
    // An entry is struck once; the second correction of it is a 409 and nothing is written.
    await as(mira)
      .post(`/animals/${f.id}/feedings`, { fedOn: addDays(today, -9), prey: 'x', taken: true, strikes: first.body.id, reason: 'again' })
      .expect(409);
    expect((await as(mira).get(`/animals/${f.id}/feedings`).expect(200)).body).toHaveLength(3);
  });

  it('refuses bad input with field messages', async () => {
    const f = await createAnimal(t.app, mira, { speciesId: species, label: 'FD-2', sex: 'female' });
    const future = await as(mira)
      .post(`/animals/${f.id}/feedings`, { fedOn: addDays(today, 1), prey: 'cricket', taken: true })
      .expect(400);
    expect(future.body.details).toEqual([{ field: 'fedOn', message: `The feeding date ${addDays(today, 1)} is in the future.` }]);
    const blank = await as(mira).post(`/animals/${f.id}/feedings`, { fedOn: today, prey: '   ', taken: true }).expect(400);
    expect(blank.body.details).toEqual([{ field: 'prey', message: 'Say what prey was offered, e.g. "2 adult crickets".' }]);
    const noTaken = await as(mira).post(`/animals/${f.id}/feedings`, { fedOn: today, prey: 'cricket' }).expect(400);
    expect(noTaken.body.details[0]).toMatchObject({ field: 'taken' });
    const entry = await as(mira).post(`/animals/${f.id}/feedings`, { fedOn: today, prey: 'cricket', taken: true }).expect(201);
    const noReason = await as(mira).post(`/animals/${f.id}/feedings`, { fedOn: today, prey: 'cricket', taken: false, strikes: entry.body.id }).expect(400);
    expect(noReason.body.details).toEqual([{ field: 'reason', message: 'Say briefly why the entry is corrected.' }]);
    const other = await createAnimal(t.app, mira, { speciesId: species, label: 'FD-3', sex: 'female' });
    const elsewhere = await as(mira)
      .post(`/animals/${other.id}/feedings`, { fedOn: today, prey: 'cricket', taken: false, strikes: entry.body.id, reason: 'wrong animal' })
      .expect(400);
    expect(elsewhere.body.details).toEqual([{ field: 'strikes', message: 'There is no such entry in this animal’s feeding log.' }]);
  });

  it('another keeper gets 404; a member of her project 403', async () => {
    const p = await sharedProject('Feeding rights');
    for (const who of [partner, caretaker]) {
      await as(who).get(`/animals/${p.female.id}/feedings`).expect(403);
      await as(who).post(`/animals/${p.female.id}/feedings`, { fedOn: today, prey: 'cricket', taken: true }).expect(403);
    }
    await as(stranger).get(`/animals/${p.female.id}/feedings`).expect(404);
    await as(stranger).post(`/animals/${p.female.id}/feedings`, { fedOn: today, prey: 'cricket', taken: true }).expect(404);
  });
});

describe('premolt flag', () => {
  it('turns "ready" into "not now, premolt" on her page and in her project, until cleared', async () => {
    const p = await sharedProject('Premolt');
    await as(mira)
      .post(`/animals/${p.female.id}/molts`, { moltedOn: addDays(today, -120) })
      .expect(201);
    const early = await as(mira)
      .post(`/animals/${p.female.id}/premolt`, { on: addDays(today, -121) })
      .expect(400);
    expect(early.body.details[0]).toMatchObject({ field: 'on', message: expect.stringMatching(/after her last molt/) });
    const set = await as(mira)
      .post(`/animals/${p.female.id}/premolt`, { on: addDays(today, -5) })
      .expect(200);
    expect(set.body).toMatchObject({ premoltSince: addDays(today, -5), readiness: { state: 'premolt', premoltSince: addDays(today, -5) } });
    const project = await as(partner).get(`/projects/${p.id}`).expect(200);
    expect(project.body.femaleAnimal.readiness.state).toBe('premolt');
    await as(mira).post(`/animals/${p.female.id}/premolt`, { on: today }).expect(409);
    const before = await as(mira)
      .post(`/animals/${p.female.id}/premolt/end`, { on: addDays(today, -6) })
      .expect(400);
    expect(before.body.details).toEqual([{ field: 'on', message: `The premolt began on ${addDays(today, -5)}; it cannot end before that.` }]);
    const future = await as(mira)
      .post(`/animals/${p.female.id}/premolt/end`, { on: addDays(today, 1) })
      .expect(400);
    expect(future.body.details).toEqual([{ field: 'on', message: `The end of premolt date ${addDays(today, 1)} is in the future.` }]);
    const cleared = await as(mira).post(`/animals/${p.female.id}/premolt/end`, { on: today }).expect(200);
    expect(cleared.body).toMatchObject({ premoltSince: null, premoltEndedOn: today, readiness: { state: 'ready' } });
    await as(mira).post(`/animals/${p.female.id}/premolt/end`, { on: today }).expect(409);
    await as(partner).post(`/animals/${p.female.id}/premolt`, { on: today }).expect(403);
    await as(stranger).post(`/animals/${p.female.id}/premolt`, { on: today }).expect(404);
  });

  it('a molt recorded after the flag ends it: she is hardening', async () => {
    const f = await createAnimal(t.app, mira, { speciesId: species, label: 'PM-2', sex: 'female', maturity: 'mature' });
    await as(mira)
      .post(`/animals/${f.id}/premolt`, { on: addDays(today, -20) })
      .expect(200);
    await as(mira)
      .post(`/animals/${f.id}/molts`, { moltedOn: addDays(today, -3) })
      .expect(201);
    const after = (await as(mira).get(`/animals/${f.id}`).expect(200)).body as AnimalResponse;
    expect(after).toMatchObject({ premoltSince: null, readiness: { state: 'hardening', daysSinceMolt: 3 } });
  });
});

describe('the male before and at maturity', () => {
  it('a penultimate male shows his maturing window from his last molt', async () => {
    const m = await createAnimal(t.app, mira, { speciesId: species, label: 'PEN-1', sex: 'male', maturity: 'penultimate' });
    expect(m.maturingWindow).toBeNull();
    await as(mira).post(`/animals/${m.id}/molts`, { moltedOn: '2026-01-31' }).expect(201);
    const after = (await as(mira).get(`/animals/${m.id}`).expect(200)).body as AnimalResponse;
    // 3 and 8 calendar months (from memory), counted as dayjs counts months: Jan 31 + 3 months = Apr 30.
    expect(after.maturingWindow).toMatchObject({ lastMoltOn: '2026-01-31', from: '2026-04-30', to: '2026-09-30', source: 'from memory' });
    const list = (await as(mira).get('/animals?mature=false&q=PEN-1').expect(200)).body;
    expect(list.items.map((a: { label: string }) => a.label)).toEqual(['PEN-1']);
  });

  it('records the last sperm web of a mature male only', async () => {
    const p = await createProject(t.app, t.orm, mira, { title: 'Webs', maleAgeDays: 40 });
    const web = await as(mira)
      .post(`/animals/${p.male.id}/sperm-web`, { on: addDays(today, -2) })
      .expect(200);
    expect(web.body.spermWebOn).toBe(addDays(today, -2));
    const before = await as(mira)
      .post(`/animals/${p.male.id}/sperm-web`, { on: addDays(today, -41) })
      .expect(400);
    expect(before.body.details[0].message).toMatch(/matured on/);
    const female = await as(mira).post(`/animals/${p.female.id}/sperm-web`, { on: today }).expect(409);
    expect(female.body.message).toMatch(/Only a mature male/);
    const bad = await as(mira).post(`/animals/${p.male.id}/sperm-web`, { on: 'yesterday' }).expect(400);
    expect(bad.body.details).toEqual([{ field: 'on', message: 'The date must be a date written YYYY-MM-DD.' }]);
  });
});

describe('a loaned male goes back to his owner', () => {
  it('fills the return date, ends the loan warning and writes an event on his project', async () => {
    const male = await createAnimal(t.app, mira, {
      speciesId: species,
      label: 'LOAN-1',
      sex: 'male',
      maturity: 'mature',
      maturedOn: addDays(today, -90),
      ownerKind: 'party',
      ownerName: 'Petra Vogt',
      custody: 'loan-in',
      dueBackOn: addDays(today, -3),
    });
    const female = await createAnimal(t.app, mira, { speciesId: species, label: 'LOAN-F', sex: 'female', maturity: 'mature' });
    const p = (await as(mira).post('/projects', { title: 'Loan', femaleId: female.id, maleId: male.id }).expect(201)).body as ProjectResponse;
    await addMember(t.orm, p.id, caretaker, 'caretaker');
    expect(p.warnings.map((w) => w.code)).toContain('loan-overdue');

    const future = await as(mira)
      .post(`/animals/${male.id}/return`, { on: addDays(today, 1) })
      .expect(400);
    expect(future.body.details).toEqual([{ field: 'on', message: `The return date ${addDays(today, 1)} is in the future.` }]);
    await as(caretaker).post(`/animals/${male.id}/return`, { on: today }).expect(403);
    await as(stranger).post(`/animals/${male.id}/return`, { on: today }).expect(404);

    const back = await as(mira)
      .post(`/animals/${male.id}/return`, { on: addDays(today, -1) })
      .expect(200);
    expect(back.body).toMatchObject({ status: 'returned', statusOn: addDays(today, -1), returnedOn: addDays(today, -1) });
    const after = (await as(mira).get(`/projects/${p.id}`).expect(200)).body as ProjectResponse;
    expect(after.warnings.map((w) => w.code)).not.toContain('loan-overdue');
    const events = await activity(caretaker, p.id);
    expect(events.filter((e) => e.kind === 'male.returned').map((e) => e.summary)).toEqual([
      `The male LOAN-1 went back to his owner on ${addDays(today, -1)}; his breeding loan is over.`,
    ]);
    const again = await as(mira).post(`/animals/${male.id}/return`, { on: today }).expect(409);
    expect(again.body.message).toMatch(/already went back/);
    const newProject = await as(mira).post('/projects', { title: 'After the loan', femaleId: female.id, maleId: male.id }).expect(400);
    expect(newProject.body.details).toEqual([{ field: 'maleId', message: 'LOAN-1 is marked returned to its owner, so it cannot start a project.' }]);
  });

  it('an edit to "returned" fills the return date and writes the event; an edit back clears the date', async () => {
    const male = await createAnimal(t.app, mira, {
      speciesId: species,
      label: 'LOAN-2',
      sex: 'male',
      ownerKind: 'party',
      ownerName: 'Petra Vogt',
      custody: 'loan-in',
    });
    const p = (
      await as(mira)
        .post('/projects', { title: 'Loan by edit', femaleId: (await newFemale('LOAN-F2')).id, maleId: male.id })
        .expect(201)
    ).body;
    const edited = await as(mira)
      .patch(`/animals/${male.id}`, { status: 'returned', statusOn: addDays(today, -4) })
      .expect(200);
    expect(edited.body).toMatchObject({ status: 'returned', returnedOn: addDays(today, -4) });
    expect((await activity(mira, p.id)).filter((e) => e.kind === 'male.returned')).toHaveLength(1);
    const undone = await as(mira).patch(`/animals/${male.id}`, { status: 'active', statusOn: null }).expect(200);
    expect(undone.body).toMatchObject({ status: 'active', returnedOn: null });
  });

  it('an animal not on loan cannot be returned (409)', async () => {
    const p = await createProject(t.app, t.orm, mira, { title: 'Own male' });
    const res = await as(mira).post(`/animals/${p.male.id}/return`, { on: today }).expect(409);
    expect(res.body.message).toMatch(/not on loan to you/);
    const patch = await as(mira).patch(`/animals/${p.male.id}`, { status: 'returned', statusOn: today }).expect(400);
    expect(patch.body.details).toEqual([{ field: 'status', message: 'Only an animal on loan to you can be returned to its owner.' }]);
  });
});

describe('a male dies', () => {
  it('writes an event with the failure clause on each open project he is in, for owner and partners', async () => {
    const open = await sharedProject('Open with terms');
    const memberId = open.members[0].id;
    const partnerId = (await as(mira).get(`/projects/${open.id}`).expect(200)).body.members.find((m: { role: string }) => m.role === 'partner').id;
    await as(mira)
      .post(`/projects/${open.id}/terms`, {
        lines: [
          { memberId, weight: 2, pickOrder: 1 },
          { memberId: partnerId, weight: 1, pickOrder: 2 },
        ],
        pricePerSpiderlingMinor: 0,
        currency: 'EUR',
        failureClause: 'carries-over',
        shippingPaidBy: 'recipient',
      })
      .expect(201);
    const version = (await as(partner).get(`/projects/${open.id}/terms`).expect(200)).body.versions[0].number;
    await as(partner)
      .post(`/projects/${open.id}/terms/${version}/accept`, {})
      .expect((r) => expect([200, 201]).toContain(r.status));
    // A second project with the same male, closed: no event there.
    const closed = (
      await as(mira)
        .post('/projects', { title: 'Closed', femaleId: (await newFemale('DIE-F2')).id, maleId: open.male.id })
        .expect(201)
    ).body;
    const em = t.orm.em.fork();
    await em.nativeUpdate(Project, { id: closed.id }, { closedOn: addDays(today, -1) });

    const died = await as(mira)
      .post(`/animals/${open.male.id}/death`, { on: addDays(today, -2) })
      .expect(200);
    expect(died.body).toMatchObject({ status: 'deceased', statusOn: addDays(today, -2) });
    const seen = (await activity(partner, open.id)).filter((e) => e.kind === 'male.died');
    expect(seen).toHaveLength(1);
    expect(seen[0].summary).toMatch(new RegExp(`^The male ${open.male.label} died on ${addDays(today, -2)}\\. The terms in force say the deal carries over`));
    expect(seen[0].data).toEqual({ on: addDays(today, -2), failureClause: 'carries-over' });
    expect((await activity(caretaker, open.id)).filter((e) => e.kind === 'male.died')).toEqual([]);
    expect((await activity(mira, closed.id)).filter((e) => e.kind === 'male.died')).toEqual([]);
    await as(mira).post(`/animals/${open.male.id}/death`, { on: today }).expect(409);
  });

  it('setting the status to deceased in an edit writes the same event; no terms means no clause', async () => {
    const p = await createProject(t.app, t.orm, mira, { title: 'No terms' });
    await as(mira).patch(`/animals/${p.male.id}`, { status: 'deceased', statusOn: today }).expect(200);
    const events = (await activity(mira, p.id)).filter((e) => e.kind === 'male.died');
    expect(events.map((e) => e.summary)).toEqual([
      `The male ${p.male.label} died on ${today}. No terms are in force on this project, so no failure clause applies; agree with your partners what happens now.`,
    ]);
  });

  it('two deaths sent at once: one is recorded, the other is a 409, one event', async () => {
    const p = await createProject(t.app, t.orm, mira, { title: 'Race' });
    const answers = await Promise.all([0, 1].map(() => as(mira).post(`/animals/${p.male.id}/death`, { on: today })));
    expect(answers.map((r) => r.status).sort()).toEqual([200, 409]);
    expect((await activity(mira, p.id)).filter((e) => e.kind === 'male.died')).toHaveLength(1);
  });

  it('a death in the future is refused and nothing is written', async () => {
    const p = await createProject(t.app, t.orm, mira, { title: 'Future death' });
    const res = await as(mira)
      .post(`/animals/${p.male.id}/death`, { on: addDays(today, 1) })
      .expect(400);
    expect(res.body.details).toEqual([{ field: 'on', message: `The death date ${addDays(today, 1)} is in the future.` }]);
    expect((await as(mira).get(`/animals/${p.male.id}`).expect(200)).body.status).toBe('active');
    expect((await activity(mira, p.id)).filter((e) => e.kind === 'male.died')).toEqual([]);
  });
});

describe('her breeding record', () => {
  it('lists her projects with their pairings and sacs; 403 for a member, 404 for a stranger', async () => {
    const p = await sharedProject('Record');
    await as(mira)
      .post(`/projects/${p.id}/pairings`, { startedAt: `${addDays(today, -50)}T18:00:00.000Z`, durationMinutes: 25, outcome: 'connected' })
      .expect(201);
    await createSac(t.app, mira, p.id, { layDate: addDays(today, -20) });
    const rows = (await as(mira).get(`/animals/${p.female.id}/breeding`).expect(200)).body;
    expect(rows).toEqual([
      {
        project: { id: p.id, title: 'Record' },
        role: 'female',
        partnerLabel: p.male.label,
        stage: expect.objectContaining({ stage: expect.any(String) }),
        pairings: [{ on: addDays(today, -50), outcome: 'connected' }],
        sacs: [{ id: expect.any(String), layDate: addDays(today, -20), pulledOn: null, fate: 'developing', broodStage: 'eggs' }],
      },
    ]);
    const his = (await as(mira).get(`/animals/${p.male.id}/breeding`).expect(200)).body;
    expect(his[0]).toMatchObject({ role: 'male', partnerLabel: p.female.label });
    await as(partner).get(`/animals/${p.female.id}/breeding`).expect(403);
    await as(stranger).get(`/animals/${p.female.id}/breeding`).expect(404);
  });
});

async function newFemale(label: string): Promise<AnimalResponse> {
  return createAnimal(t.app, mira, { speciesId: species, label, sex: 'female', maturity: 'mature' });
}
