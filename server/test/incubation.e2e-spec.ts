import request from 'supertest';
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import type { BroodCountsResponse, CareLogEntryResponse, DashboardResponse, SacResponse, KeysetPage } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { projectWithRoles } from './support/projects';
import { createSac } from './support/sacs';
import { Clock } from '../src/common/clock';

let t: TestApp;
let owner: SignedIn;
let partner: SignedIn;
let caretaker: SignedIn;
let stranger: SignedIn;
let projectId: string;
const http = () => request(t.app.getHttpServer());
const NOW = '2025-10-20T18:00:00Z';
const pin = () => vi.spyOn(t.app.get(Clock), 'now').mockReturnValue(new Date(NOW));
const as = (who: SignedIn) => ({
  get: (url: string) => http().get(`/api${url}`).set('Authorization', who.bearer),
  post: (url: string, body: object = {}) => http().post(`/api${url}`).set('Authorization', who.bearer).send(body),
  patch: (url: string, body: object) => http().patch(`/api${url}`).set('Authorization', who.bearer).send(body),
  put: (url: string, body: object) => http().put(`/api${url}`).set('Authorization', who.bearer).send(body),
});
// 95 eggs is below the fixture species' usual range: the opening's plausibility warning, acknowledged.
const OPENING = {
  openedAt: '2025-10-19T09:00:00Z',
  healthyEggs: 0,
  eggsWithLegs: 0,
  nymphs: 90,
  darkEggs: 4,
  spoiledEggs: 1,
  keptBack: 0,
  acknowledgedWarnings: ['eggs-outside-species-range'],
  warningReason: 'A small first sac.',
};
const withMother = () => createSac(t.app, owner, projectId, { layDate: '2025-09-01' });
const pulled = () => createSac(t.app, owner, projectId, { layDate: '2025-09-20', pulledAt: '2025-10-18T08:00:00Z' });
const sacOf = async (id: string, who = owner) => (await as(who).get(`/sacs/${id}`).expect(200)).body as SacResponse;
const setRights = (who: SignedIn, on: boolean) => as(who).put(`/projects/${projectId}/incubator-rights`, { caretakersMayPullAndOpen: on });

beforeAll(async () => {
  t = await createTestApp();
  ({ projectId, owner, partner, caretaker } = await projectWithRoles(t.app, t.orm, 'Incubation', ['Ilse', 'Pim', 'Carla']));
  stranger = await registerKeeper(t.app, 'Stan');
});
afterEach(() => vi.restoreAllMocks());
afterAll(async () => {
  await t.close();
});

describe('a sac left with the mother', () => {
  it('is the keeper’s choice: no pull window to watch, and it opens and counts like a pulled sac', async () => {
    pin();
    const sac = await withMother();
    // Day 49 of a species window that closed on day 45: past, and watched, until the keeper decides.
    expect(sac).toMatchObject({ leftWithMother: false, pulled: false, dayNumber: 49 });
    expect(sac.pullWindow.state).toBe('past');
    const left = (await as(owner).patch(`/sacs/${sac.id}`, { leftWithMother: true }).expect(200)).body as SacResponse;
    expect(left).toMatchObject({ leftWithMother: true, pulled: false, roll: null, inIncubator: false });
    const dash = (await as(owner).get('/dashboard').expect(200)).body as DashboardResponse;
    expect(dash.upcomingPullWindows.map((x) => x.sac.id)).not.toContain(sac.id);

    await as(owner).post(`/sacs/${sac.id}/opening`, OPENING).expect(201);
    await as(owner).patch(`/sacs/${sac.id}`, { outcome: 'emerged' }).expect(200);
    await as(caretaker)
      .post(`/sacs/${sac.id}/counts`, { at: '2025-10-20T08:00:00Z', stage: 'first-instar', alive: 85, lost: 5, lossReason: 'died' })
      .expect(201);
    const counts = (await as(partner).get(`/sacs/${sac.id}/counts`).expect(200)).body as BroodCountsResponse;
    expect(counts.current).toBe(85);
    // One stage fact: the count named first instar, so the sac is at first instar, with the entry in its log.
    expect(await sacOf(sac.id, partner)).toMatchObject({
      opened: true,
      currentCount: 85,
      leftWithMother: true,
      outcome: 'emerged',
      broodStage: 'first-instar',
    });
    const log = ((await as(owner).get(`/sacs/${sac.id}/log`).expect(200)).body as KeysetPage<CareLogEntryResponse>).items;
    expect(log.filter((e) => e.kind === 'stage').map((e) => [e.stage, e.at])).toEqual([['first-instar', '2025-10-20T08:00:00.000Z']]);
    // A later count naming an earlier stage is history at its instant; it does not move the stage back.
    await as(caretaker).post(`/sacs/${sac.id}/counts`, { at: '2025-10-20T09:00:00Z', stage: 'eggs-with-legs', alive: 85 }).expect(201);
    expect((await sacOf(sac.id)).broodStage).toBe('first-instar');
  });

  it('can be recorded so from the start, and a pull ends the choice; both at once is a 400', async () => {
    pin();
    const sac = await createSac(t.app, owner, projectId, { layDate: '2025-10-01', leftWithMother: true });
    expect(sac.leftWithMother).toBe(true);
    const both = await as(owner)
      .post(`/projects/${projectId}/sacs`, { layDate: '2025-10-01', leftWithMother: true, pulledAt: '2025-10-18T08:00:00Z' })
      .expect(400);
    expect(both.body.details).toEqual([{ field: 'leftWithMother', message: expect.stringMatching(/recorded as pulled/) }]);
    const p = (await as(owner).post(`/sacs/${sac.id}/pull`, { pulledAt: '2025-10-19T07:00:00Z' }).expect(201)).body as SacResponse;
    expect(p).toMatchObject({ pulled: true, leftWithMother: false, pulledOn: '2025-10-19', inIncubator: true });
  });
});

describe('recording the pull', () => {
  it('takes an earlier time, refuses the future and a second pull', async () => {
    pin();
    const sac = await withMother();
    const future = await as(owner).post(`/sacs/${sac.id}/pull`, { pulledAt: '2025-10-21T09:00:00Z' }).expect(400);
    expect(future.body.details[0]).toEqual({ field: 'pulledAt', message: expect.stringMatching(/in the future/) });
    const before = await as(owner).post(`/sacs/${sac.id}/pull`, { pulledAt: '2025-08-30T09:00:00Z' }).expect(400);
    expect(before.body.details[0].message).toMatch(/before it was laid/);
    const junk = await as(owner).post(`/sacs/${sac.id}/pull`, { pulledAt: 'yesterday' }).expect(400);
    expect(junk.body.details[0].field).toBe('pulledAt');
    expect((await sacOf(sac.id)).pulled).toBe(false);
    const done = (await as(owner).post(`/sacs/${sac.id}/pull`, { pulledAt: '2025-10-12T20:30:00Z' }).expect(201)).body as SacResponse;
    expect(done).toMatchObject({ pulledAt: '2025-10-12T20:30:00.000Z', pulledOn: '2025-10-12' });
    await as(owner).post(`/sacs/${sac.id}/pull`, {}).expect(409);
  });

  it('is refused to a caretaker unless the keeper allows it, and always to a partner and a stranger', async () => {
    pin();
    const sac = await withMother();
    expect((await sacOf(sac.id, caretaker)).may).toEqual({ edit: false, pullAndOpen: false, log: true, setIncubatorRights: false });
    const refused = await as(caretaker).post(`/sacs/${sac.id}/pull`).expect(403);
    expect(refused.body.message).toMatch(/unless the keeper allows caretakers/);
    await as(caretaker).post(`/sacs/${sac.id}/opening`, OPENING).expect(403);
    await setRights(caretaker, true).expect(403);
    await setRights(partner, true).expect(403);
    await as(stranger).put(`/projects/${projectId}/incubator-rights`, { caretakersMayPullAndOpen: true }).expect(404);
    await as(stranger).post(`/sacs/${sac.id}/pull`).expect(404);
    await setRights(owner, 'yes' as unknown as boolean).expect(400);

    expect((await setRights(owner, true).expect(200)).body).toEqual({ projectId, caretakersMayPullAndOpen: true });
    expect((await sacOf(sac.id, caretaker)).may.pullAndOpen).toBe(true);
    expect((await sacOf(sac.id, partner)).may.pullAndOpen).toBe(false);
    await as(partner).post(`/sacs/${sac.id}/pull`).expect(403);
    await as(caretaker).post(`/sacs/${sac.id}/pull`, { pulledAt: '2025-10-15T08:00:00Z' }).expect(201);
    await as(caretaker).post(`/sacs/${sac.id}/opening`, OPENING).expect(201);
    // The switch gives the pull and the opening, nothing else the keeper decides.
    await as(caretaker).patch(`/sacs/${sac.id}`, { rollIntervalHours: 8 }).expect(403);
    const events = (await as(owner).get(`/projects/${projectId}/activity`).expect(200)).body as { kind: string }[];
    expect(events.map((e) => e.kind)).toContain('project.incubator-rights');
    await setRights(owner, false).expect(200);
    await as(caretaker)
      .post(`/sacs/${(await withMother()).id}/pull`)
      .expect(403);
  });
});

describe('rolling', () => {
  it('stops at eggs with legs by default and goes on to first instar where the keeper keeps rolling', async () => {
    pin();
    const sac = await pulled();
    expect(sac.roll).not.toBeNull();
    expect(sac.rollingStopsAt).toBe('eggs-with-legs');
    await as(caretaker).post(`/sacs/${sac.id}/log`, { kind: 'stage', stage: 'eggs-with-legs', at: '2025-10-20T07:00:00Z' }).expect(201);
    const legs = await sacOf(sac.id);
    expect(legs).toMatchObject({ broodStage: 'eggs-with-legs', roll: null, inIncubator: true });
    const keep = (await as(owner).patch(`/sacs/${sac.id}`, { rollPastLegs: true }).expect(200)).body as SacResponse;
    expect(keep).toMatchObject({ rollPastLegs: true, rollingStopsAt: 'first-instar' });
    expect(keep.roll).not.toBeNull();
    await as(caretaker).post(`/sacs/${sac.id}/log`, { kind: 'stage', stage: 'first-instar', at: '2025-10-20T08:00:00Z' }).expect(201);
    expect((await sacOf(sac.id)).roll).toBeNull();
  });

  it('takes a pull window, a roll interval and a container from the keeper, and refuses bad ones', async () => {
    pin();
    const sac = await pulled();
    const set = (
      await as(owner).patch(`/sacs/${sac.id}`, { pullFromDay: 20, pullToDay: 30, rollIntervalHours: 8, container: 'Incubator B, shelf 2' }).expect(200)
    ).body as SacResponse;
    expect(set).toMatchObject({ rollIntervalHours: 8, container: 'Incubator B, shelf 2' });
    expect(set.pullWindow).toMatchObject({ fromDay: 20, toDay: 30, origin: 'sac' });
    const long = await as(owner)
      .patch(`/sacs/${sac.id}`, { container: 'x'.repeat(61) })
      .expect(400);
    expect(long.body.details[0]).toEqual({ field: 'container', message: 'Name the incubator or container in at most 60 characters.' });
    await as(owner).patch(`/sacs/${sac.id}`, { rollIntervalHours: 0 }).expect(400);
    expect((await sacOf(sac.id)).container).toBe('Incubator B, shelf 2');
  });
});

describe('the target band', () => {
  it('defaults to trade facts §4, refuses impossible bands, and flags readings outside it on the log, the sac and the dashboard', async () => {
    pin();
    const sac = await pulled();
    // docs/trade-facts.md §4 (from memory): 24–28 °C, 70–85 % relative humidity.
    expect(sac.band).toMatchObject({ temperatureC: { min: 24, max: 28 }, humidityPercent: { min: 70, max: 85 }, origin: 'default' });
    const backwards = await as(owner)
      .patch(`/sacs/${sac.id}`, { temperatureBand: { min: 29, max: 25 } })
      .expect(400);
    expect(backwards.body.details).toEqual([{ field: 'temperatureBand', message: 'The lowest temperature (29 °C) must be below the highest (25 °C).' }]);
    await as(owner)
      .patch(`/sacs/${sac.id}`, { humidityBand: { min: 60, max: 120 } })
      .expect(400);
    await as(owner)
      .patch(`/sacs/${sac.id}`, { humidityBand: { min: 60 } })
      .expect(400);
    expect((await sacOf(sac.id)).band.origin).toBe('default');

    const hot = (
      await as(caretaker)
        .post(`/sacs/${sac.id}/log`, { kind: 'temperature', temperature: { value: 86, unit: 'F' }, at: '2025-10-20T10:00:00Z' })
        .expect(201)
    ).body as CareLogEntryResponse;
    // 86 °F = 30 °C (NIST SP 811: t/°C = (t/°F − 32)/1.8): kept as typed, flagged above the band.
    expect(hot).toMatchObject({ temperatureC: 30, entered: { value: 86, unit: 'F' }, outsideBand: 'above' });
    await as(caretaker).post(`/sacs/${sac.id}/log`, { kind: 'humidity', humidityPercent: 75, at: '2025-10-20T10:00:00Z' }).expect(201);
    const s = await sacOf(sac.id, partner);
    expect(s.readingAlerts).toEqual([{ kind: 'temperature', value: 30, at: '2025-10-20T10:00:00.000Z', side: 'above' }]);
    const dash = (await as(caretaker).get('/dashboard').expect(200)).body as DashboardResponse;
    expect(dash.dueToday.readings.map((x) => x.sac.id)).toContain(sac.id);

    // The keeper's own band: 30 °C is inside it, so the alert goes.
    const own = (
      await as(owner)
        .patch(`/sacs/${sac.id}`, { temperatureBand: { min: 26, max: 31 } })
        .expect(200)
    ).body as SacResponse;
    expect(own.band).toMatchObject({ temperatureC: { min: 26, max: 31 }, origin: 'sac' });
    expect(own.readingAlerts).toEqual([]);
    const log = ((await as(owner).get(`/sacs/${sac.id}/log`).expect(200)).body as KeysetPage<CareLogEntryResponse>).items;
    expect(log.find((e) => e.id === hot.id)?.outsideBand).toBeNull();
    const reset = (await as(owner).patch(`/sacs/${sac.id}`, { temperatureBand: null }).expect(200)).body as SacResponse;
    expect(reset.band.origin).toBe('default');
    expect(reset.readingAlerts.map((a) => a.side)).toEqual(['above']);
  });
});
