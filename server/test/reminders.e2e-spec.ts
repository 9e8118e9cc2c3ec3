import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DateTime } from 'luxon';
import type { NotificationResponse } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { addMember, createProject } from './support/projects';
import { createSac } from './support/sacs';
import { mailsTo, waitForMail } from './support/mail-sink';
import { RemindersService } from '../src/reminders/reminders.service';
import { ReminderJobsService, jobsEnabled } from '../src/reminders/reminder-jobs.service';

let t: TestApp;
let owner: SignedIn;
let caretaker: SignedIn;
let partner: SignedIn;
const http = () => request(t.app.getHttpServer());
const now = new Date();
const utcDaysAgo = (n: number) => DateTime.fromJSDate(now, { zone: 'utc' }).minus({ days: n }).toISODate()!;
const notes = async (who: SignedIn): Promise<NotificationResponse[]> =>
  (await http().get('/api/notifications').set('Authorization', who.bearer).expect(200)).body;

beforeAll(async () => {
  t = await createTestApp();
  owner = await registerKeeper(t.app, 'Oskar');
  caretaker = await registerKeeper(t.app, 'Cass');
  partner = await registerKeeper(t.app, 'Petra');
  // The male matured 21 days ago: today his clock moves from fresh to prime (male-clock.ts, MALE_FRESH_DAYS).
  const p = await createProject(t.app, t.orm, owner, { title: 'Reminder pair', maleAgeDays: 21 });
  await addMember(t.orm, p.id, caretaker, 'caretaker');
  await addMember(t.orm, p.id, partner, 'partner');
  const pulled = await createSac(t.app, owner, p.id, { layDate: utcDaysAgo(26), pulledAt: new Date(now.getTime() - 30 * 3_600_000).toISOString() });
  await http()
    .post(`/api/sacs/${pulled.id}/log`)
    .set('Authorization', caretaker.bearer)
    .send({ kind: 'roll', at: new Date(now.getTime() - 13.5 * 3_600_000).toISOString() })
    .expect(201);
  await createSac(t.app, owner, p.id, { layDate: utcDaysAgo(21), pullFromDay: 21, pullToDay: 40 }); // window opens today
  await createSac(t.app, owner, p.id, { layDate: utcDaysAgo(10), pullFromDay: 21, pullToDay: 40 }); // nothing today
});
afterAll(async () => {
  await t.close();
});

describe('reminder job (its handler run directly against the database)', () => {
  it('jobs are off under vitest unless JOBS_ENABLED says otherwise', () => {
    expect(t.app.get(ReminderJobsService).running).toBe(false);
    expect(jobsEnabled({ VITEST: 'true' })).toBe(false);
    expect(jobsEnabled({ VITEST: 'true', JOBS_ENABLED: 'true' })).toBe(true);
    expect(jobsEnabled({ JOBS_ENABLED: 'false' })).toBe(false);
    expect(jobsEnabled({})).toBe(true);
  });

  it('mails and stores a due roll, a window opening today and a male clock change, once per thing per day', async () => {
    const reminders = t.app.get(RemindersService);
    const first = await reminders.runOnce(now);
    // Owner and caretaker: roll due + window opens = 4; the owner's male: 1.
    expect(first).toEqual({ sent: 5, skipped: 0 });

    const roll = await waitForMail(caretaker.user.email, /Roll due: Reminder pair/);
    expect(roll.text).toMatch(/day 26/);
    await waitForMail(owner.user.email, /Pull window opens today: Reminder pair/);
    const male = await waitForMail(owner.user.email, /Male clock: /);
    expect(male.text).toMatch(/is now in his prime \(day 21 since his maturing molt\)/);

    expect((await notes(caretaker)).map((n) => n.kind).sort()).toEqual(['pull-window-opens', 'roll-due']);
    expect((await notes(owner)).map((n) => n.kind).sort()).toEqual(['male-clock', 'pull-window-opens', 'roll-due']);
    expect(await notes(partner)).toEqual([]); // partners are not the ones who roll or pull

    const second = await reminders.runOnce(new Date(now.getTime() + 60_000));
    expect(second).toEqual({ sent: 0, skipped: 5 });
    expect((await mailsTo(caretaker.user.email)).filter((m) => /Roll due/.test(m.subject ?? ''))).toHaveLength(1);
    expect(await notes(caretaker)).toHaveLength(2);
  });

  it('notifications are private: marking another user’s one is a 404; one’s own is marked read', async () => {
    const [mine] = await notes(owner);
    await http().post(`/api/notifications/${mine.id}/read`).set('Authorization', caretaker.bearer).expect(404);
    const read = await http().post(`/api/notifications/${mine.id}/read`).set('Authorization', owner.bearer).expect(200);
    expect(read.body.readAt).not.toBeNull();
    await http().get('/api/notifications').expect(401);
  });
});
