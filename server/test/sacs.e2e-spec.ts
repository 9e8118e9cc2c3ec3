import request from 'supertest';
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { DateTime } from 'luxon';
import type { SacResponse } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { addMember, createProject, projectWithRoles } from './support/projects';
import { createSac, setTimeZone } from './support/sacs';
import { Clock } from '../src/common/clock';

let t: TestApp;
let owner: SignedIn;
let partner: SignedIn;
let caretaker: SignedIn;
let projectId: string;
const http = () => request(t.app.getHttpServer());
const pin = (iso: string) => vi.spyOn(t.app.get(Clock), 'now').mockReturnValue(new Date(iso));

/** Reference computation with luxon (independent of dayjs, which the server uses): whole days from the lay date to the viewer's date. */
const luxonDayN = (layDate: string, instant: string, zone: string) =>
  DateTime.fromISO(instant, { zone }).startOf('day').diff(DateTime.fromISO(layDate, { zone }), 'days').days;
const luxonPlus = (date: string, days: number) => DateTime.fromISO(date, { zone: 'utc' }).plus({ days }).toISODate();

beforeAll(async () => {
  t = await createTestApp();
  ({ projectId, owner, partner, caretaker } = await projectWithRoles(t.app, t.orm, 'Sac arithmetic', ['Odile', 'Pavel', 'Cato']));
});
afterEach(() => vi.restoreAllMocks());
afterAll(async () => {
  await t.close();
});

describe('recording a sac', () => {
  it('the owner records a sac left with the mother; members read it; the project moves to sac-laid with one activity event', async () => {
    pin('2025-06-10T12:00:00Z');
    const sac = await createSac(t.app, owner, projectId, { layDate: '2025-05-29' });
    expect(sac).toMatchObject({
      layDate: '2025-05-29',
      dayNumber: 12,
      pulled: false,
      roll: null,
      outcome: 'in-progress',
      broodStage: 'eggs',
      incubatorCaution: null,
      rollIntervalHours: 12,
    });
    // G. pulchripes has its own window (day 30–45) in the catalogue.
    expect(sac.pullWindow).toMatchObject({ fromDay: 30, toDay: 45, origin: 'species', state: 'not-yet', opensOn: '2025-06-28', closesOn: '2025-07-13' });
    // the sac card says where the window comes from: the genus' usual pull days (docs/trade-facts.md §2, from memory)
    expect(sac.pullWindow.source).toMatchObject({ kind: 'memory', note: expect.stringMatching(/usual pull days/) });
    for (const who of [partner, caretaker]) {
      const list = await http().get(`/api/projects/${projectId}/sacs`).set('Authorization', who.bearer).expect(200);
      expect(list.body.map((s: SacResponse) => s.id)).toContain(sac.id);
      await http().get(`/api/sacs/${sac.id}`).set('Authorization', who.bearer).expect(200);
    }
    const project = await http().get(`/api/projects/${projectId}`).set('Authorization', owner.bearer).expect(200);
    expect(project.body.stage).toEqual({ stage: 'sac-laid', sacId: sac.id, unrecorded: ['paired'] }); // no pairing recorded before it
    const timeline = await http().get(`/api/projects/${projectId}/activity`).set('Authorization', partner.bearer).expect(200);
    expect(timeline.body.filter((e: { subject: { id: string } }) => e.subject.id === sac.id).map((e: { kind: string }) => e.kind)).toEqual(['sac.laid']);
  });

  it('a lay date after the keeper’s today, a half window and a backwards window are 400s with readable messages', async () => {
    pin('2025-06-10T12:00:00Z');
    const future = await http().post(`/api/projects/${projectId}/sacs`).set('Authorization', owner.bearer).send({ layDate: '2025-06-11' }).expect(400);
    expect(future.body.details).toEqual([
      { field: 'layDate', message: 'The lay date 2025-06-11 is after today (2025-06-10 where you are); a sac is recorded once it is laid.' },
    ]);
    const bad = await http().post(`/api/projects/${projectId}/sacs`).set('Authorization', owner.bearer).send({ layDate: '2025-02-29' }).expect(400);
    expect(bad.body.details).toEqual([{ field: 'layDate', message: 'The lay date must be a date written YYYY-MM-DD.' }]);
    const half = await http()
      .post(`/api/projects/${projectId}/sacs`)
      .set('Authorization', owner.bearer)
      .send({ layDate: '2025-06-01', pullFromDay: 20 })
      .expect(400);
    expect(half.body.message).toBe('Give both the first and the last pull day, or neither to use the species window.');
    const back = await http()
      .post(`/api/projects/${projectId}/sacs`)
      .set('Authorization', owner.bearer)
      .send({ layDate: '2025-06-01', pullFromDay: 30, pullToDay: 25 })
      .expect(400);
    expect(back.body.message).toMatch(/must close on or after the day it opens/);
    const early = await http()
      .post(`/api/projects/${projectId}/sacs`)
      .set('Authorization', owner.bearer)
      .send({ layDate: '2025-06-05', pulledAt: '2025-06-04T10:00:00Z' })
      .expect(400);
    expect(early.body.details[0]).toMatchObject({ field: 'pulledAt', message: 'The sac cannot be pulled (2025-06-04) before it was laid (2025-06-05).' });
    const noZone = await http()
      .post(`/api/projects/${projectId}/sacs`)
      .set('Authorization', owner.bearer)
      .send({ layDate: '2025-06-05', pulledAt: '2025-06-06' })
      .expect(400);
    expect(noZone.body.details[0].field).toBe('pulledAt');
  });

  it('only the owner creates and changes sacs (403 for partner and caretaker)', async () => {
    pin('2025-06-10T12:00:00Z');
    const sac = await createSac(t.app, owner, projectId, { layDate: '2025-06-01' });
    for (const who of [partner, caretaker]) {
      await http().post(`/api/projects/${projectId}/sacs`).set('Authorization', who.bearer).send({ layDate: '2025-06-01' }).expect(403);
      await http().patch(`/api/sacs/${sac.id}`).set('Authorization', who.bearer).send({ notes: 'x' }).expect(403);
    }
  });

  it('pulling, failing and the failure reason rule through PATCH', async () => {
    pin('2025-07-01T08:00:00Z');
    const sac = await createSac(t.app, owner, projectId, { layDate: '2025-06-01' });
    const pulled = await http().patch(`/api/sacs/${sac.id}`).set('Authorization', owner.bearer).send({ pulledAt: '2025-07-01T07:00:00Z' }).expect(200);
    expect(pulled.body).toMatchObject({ pulled: true, pulledOn: '2025-07-01', roll: { due: '2025-07-01T07:00:00.000Z', status: 'due' } });
    expect(pulled.body.incubatorCaution).toMatch(/thermostat/);
    const project = await http().get(`/api/projects/${projectId}`).set('Authorization', owner.bearer).expect(200);
    expect(project.body.stage.stage).toBe('in-incubator');
    const noReason = await http().patch(`/api/sacs/${sac.id}`).set('Authorization', owner.bearer).send({ outcome: 'failed' }).expect(400);
    expect(noReason.body.details).toEqual([{ field: 'failureReason', message: 'Say why the sac failed: infertile, spoiled, eaten or other.' }]);
    const failed = await http()
      .patch(`/api/sacs/${sac.id}`)
      .set('Authorization', owner.bearer)
      .send({ outcome: 'failed', failureReason: 'spoiled' })
      .expect(200);
    expect(failed.body).toMatchObject({ outcome: 'failed', failureReason: 'spoiled', roll: null });
    const wrong = await http()
      .patch(`/api/sacs/${sac.id}`)
      .set('Authorization', owner.bearer)
      .send({ outcome: 'in-progress', failureReason: 'eaten' })
      .expect(400);
    expect(wrong.body.message).toBe('A failure reason only goes with the outcome "failed".');
    const kinds = (await http().get(`/api/projects/${projectId}/activity`).set('Authorization', owner.bearer)).body
      .filter((e: { subject: { id: string } }) => e.subject.id === sac.id)
      .map((e: { kind: string }) => e.kind);
    expect(kinds.sort()).toEqual(['sac.failed', 'sac.laid', 'sac.pulled']);
  });
});

describe('day N and the pull window in the viewer’s time zone (checked against luxon)', () => {
  it('two viewers on opposite sides of the date line see different day numbers for the same sac at the same instant', async () => {
    const kiri = await registerKeeper(t.app, 'Kiri');
    const pago = await registerKeeper(t.app, 'Pago');
    await setTimeZone(t.app, kiri, 'Pacific/Kiritimati'); // UTC+14
    await setTimeZone(t.app, pago, 'Pacific/Pago_Pago'); // UTC−11
    const p = await createProject(t.app, t.orm, kiri, { title: 'Date line' });
    await addMember(t.orm, p.id, pago, 'partner');
    const instant = '2024-03-01T05:00:00Z'; // 19:00 on 1 March in Kiritimati, 18:00 on 29 February in Pago Pago
    pin(instant);
    const sac = await createSac(t.app, kiri, p.id, { layDate: '2024-02-08', pullFromDay: 21, pullToDay: 22 });
    const a = (await http().get(`/api/sacs/${sac.id}`).set('Authorization', kiri.bearer).expect(200)).body as SacResponse;
    const b = (await http().get(`/api/sacs/${sac.id}`).set('Authorization', pago.bearer).expect(200)).body as SacResponse;
    expect(a.today).toBe(DateTime.fromISO(instant, { zone: 'Pacific/Kiritimati' }).toISODate());
    expect(b.today).toBe(DateTime.fromISO(instant, { zone: 'Pacific/Pago_Pago' }).toISODate());
    expect(a.dayNumber).toBe(luxonDayN('2024-02-08', instant, 'Pacific/Kiritimati'));
    expect(b.dayNumber).toBe(luxonDayN('2024-02-08', instant, 'Pacific/Pago_Pago'));
    expect([a.today, a.dayNumber, b.today, b.dayNumber]).toEqual(['2024-03-01', 22, '2024-02-29', 21]);
    // The same window, a different state: the last day for one, the first (and closing) day for the other.
    expect(a.pullWindow).toMatchObject({ opensOn: '2024-02-29', closesOn: '2024-03-01', state: 'closing', daysUntilCloses: 0 });
    expect(b.pullWindow).toMatchObject({ state: 'closing', daysUntilCloses: 1 });
  });

  it.each([
    ['a month end', '2025-01-10', 21, 45, '2025-01-31T12:00:00Z'],
    ['a year end', '2024-12-10', 21, 45, '2025-01-02T12:00:00Z'],
    ['a leap day', '2024-02-01', 28, 40, '2024-03-01T12:00:00Z'],
  ])('across %s the day number and window dates match luxon', async (_what, layDate, fromDay, toDay, instant) => {
    pin(instant);
    const sac = await createSac(t.app, owner, projectId, { layDate, pullFromDay: fromDay, pullToDay: toDay });
    const got = (await http().get(`/api/sacs/${sac.id}`).set('Authorization', owner.bearer).expect(200)).body as SacResponse;
    expect(got.dayNumber).toBe(luxonDayN(layDate, instant, 'UTC'));
    expect(got.pullWindow.opensOn).toBe(luxonPlus(layDate, fromDay));
    expect(got.pullWindow.closesOn).toBe(luxonPlus(layDate, toDay));
    expect(got.pullWindow.origin).toBe('sac');
  });

  it('the leap-day case in figures: laid 1 Feb 2024, day 28 is 29 Feb (ISO 8601 calendar)', async () => {
    pin('2024-02-29T12:00:00Z');
    const sac = await createSac(t.app, owner, projectId, { layDate: '2024-02-01', pullFromDay: 28, pullToDay: 40 });
    expect(sac).toMatchObject({ dayNumber: 28, pullWindow: { opensOn: '2024-02-29', closesOn: '2024-03-12', state: 'open' } });
  });
});

describe('sac routes for outsiders', () => {
  it('a stranger gets 404, anonymous 401, a malformed id 400', async () => {
    pin('2025-06-10T12:00:00Z');
    const stranger = await registerKeeper(t.app, 'Stranger');
    const sac = await createSac(t.app, owner, projectId, { layDate: '2025-06-01' });
    await http().get(`/api/sacs/${sac.id}`).set('Authorization', stranger.bearer).expect(404);
    await http().get(`/api/projects/${projectId}/sacs`).set('Authorization', stranger.bearer).expect(404);
    await http().get(`/api/sacs/${sac.id}`).expect(401);
    await http().get('/api/sacs/not-a-uuid').set('Authorization', owner.bearer).expect(404);
  });
});

describe('changing the window', () => {
  it('moves one end alone, falls back to the species window when both are cleared, and refuses a backwards window', async () => {
    pin('2025-06-10T12:00:00Z');
    const sac = await createSac(t.app, owner, projectId, { layDate: '2025-05-20', pullFromDay: 21, pullToDay: 45 });
    const moved = await http().patch(`/api/sacs/${sac.id}`).set('Authorization', owner.bearer).send({ pullToDay: 30 }).expect(200);
    expect(moved.body.pullWindow).toMatchObject({ fromDay: 21, toDay: 30, origin: 'sac', source: null, closesOn: luxonPlus('2025-05-20', 30) });
    await http().patch(`/api/sacs/${sac.id}`).set('Authorization', owner.bearer).send({ pullFromDay: 31 }).expect(400);
    const cleared = await http().patch(`/api/sacs/${sac.id}`).set('Authorization', owner.bearer).send({ pullFromDay: null, pullToDay: null }).expect(200);
    expect(cleared.body.pullWindow).toMatchObject({ fromDay: 30, toDay: 45, origin: 'species' });
  });
});
