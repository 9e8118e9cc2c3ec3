import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addDays, todayIn, type ActivityEventResponse, type PairingResponse, type ProjectResponse } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { createAnimal, speciesId } from './support/fixtures/collection';
import { addMember, createProject, projectWithRoles, type ProjectWithRoles } from './support/projects';
import { createSac } from './support/sacs';
import { Clock } from '../src/common/clock';
import { Pairing } from '../src/projects/pairing.entity';
import { api, recordCount } from './accounts.fixtures';
import { User } from '../src/users/user.entity';
import type { SeedContext } from '../src/seed/demo-seed';
import { UNHAPPY_SEASON_TITLE, seedUnhappySeason } from '../src/seed/unhappy-season.seeder';

// Product rules (docs/product.md, Attempts, males and the end of a project); no outside source.
// Scenario and names are invented.
let t: TestApp;
let roles: ProjectWithRoles;
let stranger: SignedIn;
let species: string;
let today: string;
const http = () => request(t.app.getHttpServer());
const hoursAgo = (h: number) => new Date(t.app.get(Clock).now().getTime() - h * 3_600_000).toISOString();
let n = 0;

/** A mature male of `who`, matured `ageDays` ago, with extra fields (loan, status). */
async function male(who: SignedIn, over: Record<string, unknown> = {}, ageDays = 60) {
  n += 1;
  return createAnimal(t.app, who, {
    speciesId: species,
    label: `ATT-M${n}-${Date.now()}`,
    sex: 'male',
    maturity: 'mature',
    maturedOn: addDays(today, -ageDays),
    ...over,
  });
}

const pair = (who: SignedIn, projectId: string, body: Record<string, unknown>) =>
  http()
    .post(`/api/projects/${projectId}/pairings`)
    .set('Authorization', who.bearer)
    .send({ startedAt: hoursAgo(2), durationMinutes: 30, outcome: 'connected', ...body });
const project = async (who: SignedIn, id: string) =>
  (await http().get(`/api/projects/${id}`).set('Authorization', who.bearer).expect(200)).body as ProjectResponse;
const activity = async (who: SignedIn, id: string) =>
  (await http().get(`/api/projects/${id}/activity`).set('Authorization', who.bearer).expect(200)).body as ActivityEventResponse[];

beforeAll(async () => {
  t = await createTestApp();
  today = todayIn('UTC', t.app.get(Clock).now());
  species = await speciesId(t.orm, 'Grammostola pulchripes');
  roles = await projectWithRoles(t.app, t.orm, 'Attempts', ['Mira Attempts', 'Tomasz Attempts', 'Ines Attempts']);
  stranger = await registerKeeper(t.app, 'Stranger Attempts');
});
afterAll(async () => {
  await t.close();
});

describe('a season of attempts', () => {
  it('an eaten sac and a dead male leave the project open; a backup male is paired and a second sac recorded', async () => {
    const { projectId, owner } = roles;
    const first = await project(owner, projectId);
    await pair(owner, projectId, { startedAt: hoursAgo(24 * 55) }).expect(201);
    const sac = await createSac(t.app, owner, projectId, { layDate: addDays(today, -40) });
    await http().patch(`/api/sacs/${sac.id}`).set('Authorization', owner.bearer).send({ outcome: 'failed', failureReason: 'eaten' }).expect(200);
    let p = await project(owner, projectId);
    expect(p.stage).toEqual({ stage: 'planned', setback: 'sac-eaten', sacId: sac.id });

    await http()
      .post(`/api/animals/${first.male.id}/death`)
      .set('Authorization', owner.bearer)
      .send({ on: addDays(today, -10) })
      .expect(200);
    p = await project(owner, projectId);
    expect(p.stage.stage).not.toBe('ended-early');
    expect(p.warnings.map((w) => w.code)).toContain('male-died-after-pairing');

    const backup = await male(owner);
    const paired = (await pair(owner, projectId, { maleId: backup.id, startedAt: hoursAgo(24 * 5) }).expect(201)).body as PairingResponse;
    expect(paired.male).toEqual({ id: backup.id, label: backup.label });
    p = await project(owner, projectId);
    expect(p.stage).toEqual({ stage: 'waiting-for-sac' });
    expect(p.males.map((m) => m.label)).toEqual([first.male.label, backup.label]);
    // The dead first male's warning gives way to the living backup's.
    expect(p.warnings.map((w) => w.code)).not.toContain('male-died-after-pairing');

    const second = await createSac(t.app, owner, projectId, { layDate: today });
    p = await project(owner, projectId);
    expect(p.stage).toEqual({ stage: 'sac-laid', sacId: second.id });
    const sacs = (await http().get(`/api/projects/${projectId}/sacs`).set('Authorization', owner.bearer).expect(200)).body as { id: string }[];
    expect(sacs.map((s) => s.id).sort()).toEqual([sac.id, second.id].sort());

    // Every member reads who was paired; the backup male's page lists the project.
    const list = (await http().get(`/api/projects/${projectId}/pairings`).set('Authorization', roles.caretaker.bearer).expect(200)).body as PairingResponse[];
    expect(list.map((x) => x.male.label)).toEqual([backup.label, first.male.label]);
    const record = (await http().get(`/api/animals/${backup.id}/breeding`).set('Authorization', owner.bearer).expect(200)).body as {
      project: { id: string };
    }[];
    expect(record.map((r) => r.project.id)).toContain(projectId);
    expect((await activity(roles.partner, projectId)).map((e) => e.summary)).toContainEqual(
      expect.stringContaining(`with ${backup.label} (30 min): Connected.`),
    );
  });

  it('a molt after the pairing is advice to pair again, not an end', async () => {
    const { owner } = roles;
    const p = await createProject(t.app, t.orm, owner, { title: 'Molted after pairing' });
    await pair(owner, p.id, { startedAt: hoursAgo(24 * 30) }).expect(201);
    await http()
      .post(`/api/animals/${p.female.id}/molts`)
      .set('Authorization', owner.bearer)
      .send({ moltedOn: addDays(today, -3) })
      .expect(201);
    expect((await project(owner, p.id)).stage).toEqual({ stage: 'paired', setback: 'female-molted' });
    await pair(owner, p.id, {}).expect(201);
    expect((await project(owner, p.id)).stage).toEqual({ stage: 'waiting-for-sac' });
  });

  it('names the male of old pairings after the migration: the project’s first male', async () => {
    const em = t.orm.em.fork();
    const rows = await em.find(Pairing, { project: roles.projectId }, { populate: ['male'] });
    expect(rows.every((r) => !!r.male.id)).toBe(true);
  });
});

describe('a second male', () => {
  it('must be a mature male in the keeper’s care (400 with a field message); another keeper’s male is not found (404)', async () => {
    const { projectId, owner } = roles;
    const young = await createAnimal(t.app, owner, { speciesId: species, label: `ATT-J-${Date.now()}`, sex: 'male', maturity: 'immature' });
    const res = await pair(owner, projectId, { maleId: young.id }).expect(400);
    expect(res.body.details).toEqual([{ field: 'maleId', message: expect.stringMatching(/is not recorded as mature/) }]);
    const lentOut = await male(owner, { custody: 'loan-out', custodyParty: 'A friend', dueBackOn: addDays(today, 30) });
    expect((await pair(owner, projectId, { maleId: lentOut.id }).expect(400)).body.details[0].message).toMatch(/out on loan to someone else/);
    const dead = await male(owner, { status: 'deceased', statusOn: addDays(today, -1) });
    expect((await pair(owner, projectId, { maleId: dead.id }).expect(400)).body.details[0].message).toBe(
      `${dead.label} died on ${addDays(today, -1)}, so a pairing on ${today} cannot be with him.`,
    );
    // A pairing before his death may be recorded late.
    await pair(owner, projectId, { maleId: dead.id, startedAt: hoursAgo(24 * 3), outcome: 'interest-only' }).expect(201);
    const sold = await male(owner, { status: 'sold', statusOn: addDays(today, -1) });
    expect((await pair(owner, projectId, { maleId: sold.id }).expect(400)).body.details[0].message).toMatch(/is marked sold/);
    const female = (await project(owner, projectId)).femaleAnimal;
    expect((await pair(owner, projectId, { maleId: female.id }).expect(400)).body.details[0].message).toMatch(/recorded as female, not male/);
    const theirs = await male(stranger);
    expect((await pair(owner, projectId, { maleId: theirs.id }).expect(404)).body.message).toBe('There is no such male in your collection.');
    expect((await pair(owner, projectId, { maleId: 'not-an-id' }).expect(400)).body.details[0].field).toBe('maleId');
  });

  it('a male on loan to the keeper may be paired, and his loan warning names him', async () => {
    const { owner } = roles;
    const p = await createProject(t.app, t.orm, owner, { title: 'Loaned backup' });
    const loaned = await male(owner, { ownerKind: 'party', ownerName: 'Breeder Ana', custody: 'loan-in', dueBackOn: addDays(today, -2) });
    await pair(owner, p.id, { maleId: loaned.id }).expect(201);
    const warnings = (await project(owner, p.id)).warnings;
    expect(warnings).toContainEqual(
      expect.objectContaining({ code: 'loan-overdue', message: expect.stringContaining(`The loaned male ${loaned.label} was due back`) }),
    );
  });

  it('a backup male’s death is written on the projects he was paired in, and when every male is dead the setback says so', async () => {
    const { owner } = roles;
    const p = await createProject(t.app, t.orm, owner, { title: 'Backup died too' });
    const backup = await male(owner);
    await pair(owner, p.id, { maleId: backup.id, outcome: 'interest-only' }).expect(201);
    await http().post(`/api/animals/${backup.id}/death`).set('Authorization', owner.bearer).send({ on: today }).expect(200);
    const died = (await activity(owner, p.id)).filter((e) => e.kind === 'male.died');
    expect(died.map((e) => e.subject.id)).toEqual([backup.id]);
    // The first male still lives: no setback yet.
    expect((await project(owner, p.id)).stage).toEqual({ stage: 'paired' });
    await http().post(`/api/animals/${p.male.id}/death`).set('Authorization', owner.bearer).send({ on: today }).expect(200);
    expect((await project(owner, p.id)).stage).toEqual({ stage: 'paired', setback: 'male-died' });
  });

  it('a backup male is known to the members (403 to read his logs, not 404) and cannot be deleted while paired (409)', async () => {
    const { owner, partner, projectId } = roles;
    const backup = (await project(partner, projectId)).males[1]!;
    await http().get(`/api/animals/${backup.id}/feedings`).set('Authorization', partner.bearer).expect(403);
    await http().get(`/api/animals/${backup.id}/feedings`).set('Authorization', stranger.bearer).expect(404);
    const res = await http().delete(`/api/animals/${backup.id}`).set('Authorization', owner.bearer).expect(409);
    expect(res.body.message).toMatch(/a male paired in the project "Attempts"/);
  });

  it('only the keeper records a pairing: partner and caretaker 403, an outsider 404', async () => {
    const backup = await male(roles.owner);
    await pair(roles.partner, roles.projectId, { maleId: backup.id }).expect(403);
    await pair(roles.caretaker, roles.projectId, { maleId: backup.id }).expect(403);
    await pair(stranger, roles.projectId, { maleId: backup.id }).expect(404);
  });
});

describe('ending, closing and reopening', () => {
  const post = (who: SignedIn, id: string, what: 'end' | 'close' | 'reopen', body: object = {}) =>
    http().post(`/api/projects/${id}/${what}`).set('Authorization', who.bearer).send(body);

  it('only the keeper ends, closes or reopens (partner and caretaker 403, outsider 404)', async () => {
    const r = roles;
    for (const what of ['end', 'close', 'reopen'] as const) {
      await post(r.partner, r.projectId, what, { reason: 'no-sac' }).expect(403);
      await post(r.caretaker, r.projectId, what, { reason: 'no-sac' }).expect(403);
      await post(stranger, r.projectId, what, { reason: 'no-sac' }).expect(404);
    }
    expect((await project(r.owner, r.projectId)).stage.stage).not.toMatch(/ended-early|closed/);
  });

  it('an early end stops new pairings and sacs until the keeper reopens it; each step writes an event', async () => {
    const { owner } = roles;
    const p = await createProject(t.app, t.orm, owner, { title: 'Ended and reopened' });
    await post(owner, p.id, 'end', { reason: 'bogus' }).expect(400);
    await post(owner, p.id, 'reopen').expect(409); // not ended
    const ended = (await post(owner, p.id, 'end', { reason: 'sac-eaten', note: 'Ate it on day 3' }).expect(200)).body as ProjectResponse;
    expect(ended.stage).toEqual({ stage: 'ended-early', reason: 'sac-eaten' });
    await post(owner, p.id, 'end', { reason: 'no-sac' }).expect(409);
    expect((await pair(owner, p.id, {}).expect(409)).body.message).toMatch(/ended early/);
    await http()
      .post(`/api/projects/${p.id}/sacs`)
      .set('Authorization', owner.bearer)
      .send({ layDate: today, acknowledgedWarnings: ['sac-without-pairing'], warningReason: 'Test' })
      .expect(409);
    const reopened = (await post(owner, p.id, 'reopen').expect(200)).body as ProjectResponse;
    expect(reopened).toMatchObject({ stage: { stage: 'planned' }, endedOn: null, endedEarlyNote: null });
    await pair(owner, p.id, {}).expect(201);
    const kinds = (await activity(owner, p.id)).map((e) => e.kind);
    expect(kinds).toEqual(expect.arrayContaining(['project.ended', 'project.reopened', 'pairing.recorded']));
    const reopenEvent = (await activity(owner, p.id)).find((e) => e.kind === 'project.reopened')!;
    expect(reopenEvent.summary).toBe(`Reopened the project (it had ended early on ${today}: the sac was eaten).`);
  });

  it('closing is final: no new pairing, no second close, no reopening (409); a correction still goes in', async () => {
    const { owner } = roles;
    const p = await createProject(t.app, t.orm, owner, { title: 'Closed for good' });
    const first = (await pair(owner, p.id, { outcome: 'interest-only' }).expect(201)).body as PairingResponse;
    await post(owner, p.id, 'end', { reason: 'no-sac' }).expect(200);
    const closed = (await post(owner, p.id, 'close').expect(200)).body as ProjectResponse;
    expect(closed).toMatchObject({ stage: { stage: 'closed' }, closedOn: today });
    await post(owner, p.id, 'close').expect(409);
    expect((await post(owner, p.id, 'reopen').expect(409)).body.message).toMatch(/a closed project stays closed/);
    await post(owner, p.id, 'end', { reason: 'no-sac' }).expect(409);
    await pair(owner, p.id, {}).expect(409);
    const fixed = await pair(owner, p.id, { corrects: first.id, reason: 'It connected after all', outcome: 'connected' }).expect(201);
    expect(fixed.body).toMatchObject({ corrects: first.id, outcome: 'connected' });
    expect((await activity(owner, p.id)).filter((e) => e.kind === 'project.closed').map((e) => e.data)).toEqual([{ on: today }]);
  });

  it('two closes sent at once: one is recorded, the other is a 409, one event', async () => {
    const p = await createProject(t.app, t.orm, roles.owner, { title: 'Closed twice at once' });
    const answers = await Promise.all([0, 1].map(() => post(roles.owner, p.id, 'close')));
    expect(answers.map((r) => r.status).sort()).toEqual([200, 409]);
    expect((await activity(roles.owner, p.id)).filter((e) => e.kind === 'project.closed')).toHaveLength(1);
  });

  it('a closed project still takes payments, receipt confirmations and ledger corrections', async () => {
    // The spec's own keepers, so no new sign-ups: Mira 2 : Tomasz 1, a sac counted at 20.
    const p = await createProject(t.app, t.orm, roles.owner, { title: 'Closed, still settling' });
    const s = {
      projectId: p.id,
      mira: roles.owner,
      tomasz: roles.partner,
      miraId: p.members[0]!.id,
      tomaszId: await addMember(t.orm, p.id, roles.partner, 'partner'),
    };
    const lines = [
      { memberId: s.miraId, weight: 2, pickOrder: 1 },
      { memberId: s.tomaszId, weight: 1, pickOrder: 2 },
    ];
    const terms = { lines, pricePerSpiderlingMinor: 500, currency: 'EUR', failureClause: 'carries-over', shippingPaidBy: 'recipient' };
    await api(t.app).post(`/api/projects/${p.id}/terms`).set('Authorization', s.mira.bearer).send(terms).expect(201);
    const accepted = await api(t.app).post(`/api/projects/${p.id}/terms/1/accept`).set('Authorization', s.tomasz.bearer).send({});
    expect(accepted.status).toBeLessThan(300);
    const sac = await createSac(t.app, s.mira, p.id, { layDate: addDays(today, -70) });
    await recordCount(t.orm, sac.id, 20, new Date(t.app.get(Clock).now().getTime() - 86_400_000));
    const entry = async (who: SignedIn, body: object) => {
      const res = await api(t.app).post(`/api/projects/${s.projectId}/entries`).set('Authorization', who.bearer).send(body);
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      return res.body as { id: string; status: string };
    };
    const handOver = await entry(s.mira, { kind: 'hand-over', date: today, memberId: s.tomaszId, count: 2, method: 'pick-up' });
    await entry(s.mira, { kind: 'cash-out', date: today, memberId: s.tomaszId, count: 1 });
    await post(s.mira, s.projectId, 'close').expect(200);
    await api(t.app)
      .post(`/api/projects/${s.projectId}/entries/${handOver.id}/confirm`)
      .set('Authorization', s.tomasz.bearer)
      .send({ arrivedAlive: 2, arrivedDead: 0 })
      .expect(201);
    const paid = await entry(s.mira, { kind: 'money', date: today, fromMemberId: s.miraId, toMemberId: s.tomaszId, amountMinor: 500 });
    await api(t.app).post(`/api/projects/${s.projectId}/entries/${paid.id}/confirm`).set('Authorization', s.tomasz.bearer).send({}).expect(201);
    const correction = await entry(s.mira, { kind: 'correction', date: today, reversesId: paid.id, reason: 'the transfer bounced' });
    expect(correction.id).toBeTruthy();
    const list = (
      (await api(t.app).get(`/api/projects/${s.projectId}/entries`).set('Authorization', s.mira.bearer).expect(200)).body as {
        items: { id: string; status: string }[];
      }
    ).items;
    expect(list.find((e) => e.id === paid.id)!.status).toBe('reversed');
  });
});

describe('the demo’s unhappy season', () => {
  it('an eaten sac, a first male who died, a backup male paired after him and a second sac: open, at "sac laid"', async () => {
    const keeper = await registerKeeper(t.app, 'Mira Unhappy');
    const em = t.orm.em.fork();
    const user = await em.findOneOrFail(User, keeper.user.id);
    await seedUnhappySeason({ em, users: { keeper: user } as SeedContext['users'], today: t.app.get(Clock).now() });
    await em.flush();
    const summary = ((await http().get('/api/projects').set('Authorization', keeper.bearer).expect(200)).body as { id: string; title: string }[]).find(
      (x) => x.title === UNHAPPY_SEASON_TITLE,
    )!;
    const p = await project(keeper, summary.id);
    expect(p.stage).toMatchObject({ stage: 'sac-laid' });
    expect(p.males.map((m) => [m.label, m.status])).toEqual([
      ['MO-042', 'deceased'],
      ['MO-043', 'active'],
    ]);
    const pairings = (await http().get(`/api/projects/${p.id}/pairings`).set('Authorization', keeper.bearer).expect(200)).body as PairingResponse[];
    expect(pairings.map((x) => x.male.label)).toEqual(['MO-043', 'MO-042']);
    const sacs = (await http().get(`/api/projects/${p.id}/sacs`).set('Authorization', keeper.bearer).expect(200)).body as {
      outcome: string;
      failureReason: string | null;
    }[];
    expect(sacs.map((x) => [x.outcome, x.failureReason]).sort()).toEqual([
      ['failed', 'eaten'],
      ['in-progress', null],
    ]);
    const kinds = (await activity(keeper, p.id)).map((e) => e.kind);
    expect(kinds).toEqual(expect.arrayContaining(['sac.failed', 'male.died', 'pairing.recorded', 'sac.laid']));
  });
});
