import request from 'supertest';
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { DateTime } from 'luxon';
import type { CareLogEntryResponse, SacResponse, KeysetPage } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import type { SignedIn } from './support/users';
import { projectWithRoles } from './support/projects';
import { createSac, setTimeZone } from './support/sacs';
import { Clock } from '../src/common/clock';

let t: TestApp;
let owner: SignedIn;
let partner: SignedIn;
let caretaker: SignedIn;
let projectId: string;
const http = () => request(t.app.getHttpServer());
const NOW = '2025-09-15T12:00:00Z';
const hoursBefore = (h: number, from = NOW) => new Date(Date.parse(from) - h * 3_600_000).toISOString();
const pin = (iso: string) => vi.spyOn(t.app.get(Clock), 'now').mockReturnValue(new Date(iso));
const log = (who: SignedIn, sacId: string, body: object) => http().post(`/api/sacs/${sacId}/log`).set('Authorization', who.bearer).send(body);
const sacOf = async (id: string): Promise<SacResponse> => (await http().get(`/api/sacs/${id}`).set('Authorization', owner.bearer).expect(200)).body;
/** A sac pulled 40 h before NOW, so every roll below falls after the pull. */
const pulledSac = () => createSac(t.app, owner, projectId, { layDate: '2025-08-20', pulledAt: hoursBefore(40) });

beforeAll(async () => {
  t = await createTestApp();
  ({ projectId, owner, partner, caretaker } = await projectWithRoles(t.app, t.orm, 'Incubator log', ['Oona', 'Piet', 'Cleo']));
});
afterEach(() => vi.restoreAllMocks());
afterAll(async () => {
  await t.close();
});

describe('roll schedule through the API (interval 12 h; overdue after a quarter interval, 3 h, past due)', () => {
  it('a freshly pulled sac is due at the pull', async () => {
    pin(NOW);
    const sac = await pulledSac();
    expect(sac.roll).toEqual({ due: hoursBefore(40).replace('.000.000Z', '.000Z'), status: 'overdue', lastRollAt: null });
  });

  it('a roll 13.5 h ago is due; 16 h ago is overdue; a struck roll stops counting', async () => {
    pin(NOW);
    const sac = await pulledSac();
    const old = await log(caretaker, sac.id, { kind: 'roll', at: hoursBefore(16) }).expect(201);
    expect((await sacOf(sac.id)).roll).toMatchObject({ status: 'overdue', due: hoursBefore(4) });
    const recent = await log(caretaker, sac.id, { kind: 'roll', at: hoursBefore(13.5) }).expect(201);
    expect((await sacOf(sac.id)).roll).toMatchObject({ status: 'due', due: hoursBefore(1.5), lastRollAt: hoursBefore(13.5) });
    const strike = await log(owner, sac.id, { kind: 'strike', strikes: recent.body.id, reason: 'Logged on the wrong sac' }).expect(201);
    expect(strike.body).toMatchObject({ kind: 'strike', strikes: recent.body.id, text: 'Logged on the wrong sac' });
    expect((await sacOf(sac.id)).roll).toMatchObject({ status: 'overdue', lastRollAt: hoursBefore(16) });
    const entries = ((await http().get(`/api/sacs/${sac.id}/log`).set('Authorization', partner.bearer).expect(200)).body as KeysetPage<CareLogEntryResponse>)
      .items;
    expect(entries.find((e) => e.id === recent.body.id)!.struck).toMatchObject({ byEntryId: strike.body.id, reason: 'Logged on the wrong sac' });
    expect(entries.find((e) => e.id === old.body.id)!.struck).toBeNull();
    await log(owner, sac.id, { kind: 'strike', strikes: recent.body.id, reason: 'again' }).expect(409);
    const strikeStrike = await log(owner, sac.id, { kind: 'strike', strikes: strike.body.id, reason: 'undo' }).expect(400);
    expect(strikeStrike.body.message).toBe('A correction cannot be struck; add the entry again instead.');
  });

  it('rolls follow elapsed hours across a daylight-saving change (America/New_York, 9 March 2025)', async () => {
    await setTimeZone(t.app, owner, 'America/New_York');
    try {
      pin('2025-03-09T14:00:00Z');
      const sac = await createSac(t.app, owner, projectId, { layDate: '2025-02-10', pulledAt: '2025-03-08T12:00:00-05:00' });
      const roll = '2025-03-08T20:00:00-05:00'; // 20:00 EST, the evening before clocks go forward
      await log(owner, sac.id, { kind: 'roll', at: roll }).expect(201);
      const due = (await sacOf(sac.id)).roll!.due;
      // Reference: luxon adds 12 elapsed hours; on the wall clock that is 09:00 EDT, not 08:00.
      const expected = DateTime.fromISO(roll).plus({ hours: 12 });
      expect(due).toBe(expected.toUTC().toISO());
      expect(DateTime.fromISO(due).setZone('America/New_York').toFormat('HH:mm ZZ')).toBe('09:00 -04:00');
    } finally {
      await setTimeZone(t.app, owner, 'UTC');
    }
  });

  it('a sac left with the mother takes no rolls; a roll before the pull or in the future is refused', async () => {
    pin(NOW);
    const withMother = await createSac(t.app, owner, projectId, { layDate: '2025-09-01' });
    expect(withMother.roll).toBeNull();
    const res = await log(owner, withMother.id, { kind: 'roll' }).expect(400);
    expect(res.body.message).toMatch(/rolls apply only once it is pulled/);
    const sac = await pulledSac();
    await log(owner, sac.id, { kind: 'roll', at: hoursBefore(41) }).expect(400);
    const future = await log(owner, sac.id, { kind: 'roll', at: hoursBefore(-0.1) }).expect(400);
    expect(future.body.details[0].field).toBe('at');
    await log(owner, sac.id, { kind: 'roll', at: hoursBefore(-0.01) }).expect(201); // 36 s ahead: within the minute's tolerance
  });
});

describe('stage entries', () => {
  it('move the brood stage, stop rolls at eggs with legs (project → brood at first instar), and striking the entry undoes it', async () => {
    pin(NOW);
    const sac = await pulledSac();
    await log(caretaker, sac.id, { kind: 'stage', stage: 'eggs-with-legs', at: hoursBefore(5) }).expect(201);
    // docs/trade-facts.md §4: rolled "until the legs have formed, then left alone".
    expect(await sacOf(sac.id)).toMatchObject({ broodStage: 'eggs-with-legs', roll: null });
    await http().patch(`/api/sacs/${sac.id}`).set('Authorization', owner.bearer).send({ rollPastLegs: true }).expect(200);
    expect(await sacOf(sac.id)).toMatchObject({ broodStage: 'eggs-with-legs', roll: { status: 'overdue' } });
    const instar = await log(caretaker, sac.id, { kind: 'stage', stage: 'first-instar', at: hoursBefore(1) }).expect(201);
    expect(await sacOf(sac.id)).toMatchObject({ broodStage: 'first-instar', roll: null });
    const project = await http().get(`/api/projects/${projectId}`).set('Authorization', owner.bearer).expect(200);
    expect(project.body.stage).toEqual({ stage: 'brood', sacId: sac.id, unrecorded: ['paired'] }); // a fixture sac with no pairing recorded
    await log(owner, sac.id, { kind: 'strike', strikes: instar.body.id, reason: 'Still eggs with legs' }).expect(201);
    expect(await sacOf(sac.id)).toMatchObject({ broodStage: 'eggs-with-legs', roll: { status: 'overdue' } });
    const same = await log(owner, sac.id, { kind: 'stage', stage: 'eggs-with-legs' }).expect(400);
    expect(same.body.message).toBe('The brood is already at the stage "eggs-with-legs".');
    await log(owner, sac.id, { kind: 'stage', stage: 'eggs' }).expect(201);
    expect((await sacOf(sac.id)).broodStage).toBe('eggs');
  });
});

describe('readings', () => {
  it('stores temperatures in °C (°F converted: 77 °F = 25 °C, 80 °F = 26.67 °C, docs/trade-facts.md check value 9) and refuses implausible ones', async () => {
    pin(NOW);
    const sac = await pulledSac();
    const c = await log(caretaker, sac.id, { kind: 'temperature', temperature: { value: 26.5, unit: 'C' } }).expect(201);
    expect(c.body).toMatchObject({ temperatureC: 26.5, entered: { value: 26.5, unit: 'C' }, at: new Date(NOW).toISOString() });
    const f = await log(caretaker, sac.id, { kind: 'temperature', temperature: { value: 77, unit: 'F' } }).expect(201);
    expect(f.body.temperatureC).toBe(25);
    const f80 = await log(caretaker, sac.id, { kind: 'temperature', temperature: { value: 80, unit: 'F' } }).expect(201);
    expect(f80.body.temperatureC).toBeCloseTo(26.67, 2);
    const hot = await log(caretaker, sac.id, { kind: 'temperature', temperature: { value: 50, unit: 'C' } }).expect(400);
    expect(hot.body.message).toBe('50 °C is not a plausible incubator reading; it must be between 5 and 45 °C.');
    const hotF = await log(caretaker, sac.id, { kind: 'temperature', temperature: { value: 120, unit: 'F' } }).expect(400);
    expect(hotF.body.message).toBe('120 °F is not a plausible incubator reading; it must be between 41 and 113 °F.');
    await log(caretaker, sac.id, { kind: 'temperature', temperature: { value: 26, unit: 'K' } }).expect(400);
    const h = await log(caretaker, sac.id, { kind: 'humidity', humidityPercent: 78 }).expect(201);
    expect(h.body.humidityPercent).toBe(78);
    const wet = await log(caretaker, sac.id, { kind: 'humidity', humidityPercent: 101 }).expect(400);
    expect(wet.body.message).toBe('Humidity is a percentage from 0 to 100, not 101.');
    const mixed = await log(caretaker, sac.id, { kind: 'roll', humidityPercent: 70 }).expect(400);
    expect(mixed.body.message).toBe('A roll entry has no "humidityPercent".');
    await log(caretaker, sac.id, { kind: 'note' }).expect(400);
    await log(caretaker, sac.id, { kind: 'note', text: 'Condensation on the lid; opened vents' }).expect(201);
  });
});

describe('who writes the log', () => {
  it('owner and caretaker write; a partner reads but gets 403 on writing; every entry is one activity event', async () => {
    pin(NOW);
    const sac = await pulledSac();
    await log(owner, sac.id, { kind: 'check', text: 'All firm' }).expect(201);
    await log(caretaker, sac.id, { kind: 'roll' }).expect(201);
    const denied = await log(partner, sac.id, { kind: 'roll' }).expect(403);
    expect(denied.body.message).toMatch(/Only the owner or caretakers/);
    const entries = ((await http().get(`/api/sacs/${sac.id}/log`).set('Authorization', partner.bearer).expect(200)).body as KeysetPage<CareLogEntryResponse>)
      .items;
    expect(entries.map((e) => e.kind)).toEqual(['roll', 'check']);
    expect(entries[0].author).toEqual({ id: caretaker.user.id, name: 'Cleo' });
    const timeline = (await http().get(`/api/projects/${projectId}/activity`).set('Authorization', owner.bearer)).body as {
      kind: string;
      subject: { id: string };
    }[];
    expect(
      timeline
        .filter((e) => e.subject.id === sac.id)
        .map((e) => e.kind)
        .sort(),
    ).toEqual(['care.check', 'care.roll', 'sac.laid']);
  });
});
