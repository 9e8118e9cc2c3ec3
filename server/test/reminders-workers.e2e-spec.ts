/**
 * Reminder jobs survive a restart and go out once with several instances: one app plans and
 * stops before anything is sent; two fresh instances with workers on then share the queue.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addDays, todayIn } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { addMember, createProject } from './support/projects';
import { createSac } from './support/sacs';
import { mailsTo, waitForMail } from './support/mail-sink';
import { JOBS_SCHEMA, JobsService } from '../src/jobs/jobs.service';
import { COMPOSE_QUEUE } from '../src/mail/mail-outbox.service';
import { REMINDER_QUEUE } from '../src/reminders/reminder-planner.service';
import { Notification } from '../src/reminders/notification.entity';

const saved = process.env.JOBS_ENABLED;
let instances: TestApp[] = [];
let owner: SignedIn;
let caretaker: SignedIn;
let sacId: string;

beforeAll(async () => {
  process.env.JOBS_ENABLED = 'false';
  const planner = await createTestApp();
  owner = await registerKeeper(planner.app, 'Rhea');
  caretaker = await registerKeeper(planner.app, 'Ravi');
  const p = await createProject(planner.app, planner.orm, owner, { title: 'Restart pair' });
  await addMember(planner.orm, p.id, caretaker, 'caretaker');
  const pulledAt = new Date(Date.now() - 5 * 60_000).toISOString();
  sacId = (await createSac(planner.app, owner, p.id, { layDate: addDays(todayIn('UTC', new Date()), -29), pulledAt })).id;
  await planner.close(); // the "restart": planned, nothing sent yet
  process.env.JOBS_ENABLED = 'true';
  instances = [await createTestApp({ fresh: false }), await createTestApp({ fresh: false })];
});
afterAll(async () => {
  for (const i of instances) await i.close();
  if (saved === undefined) delete process.env.JOBS_ENABLED;
  else process.env.JOBS_ENABLED = saved;
});

describe('reminder workers', () => {
  it('two instances work the queue in schema pgboss', () => {
    for (const i of instances) expect([...i.app.get(JobsService).working].sort()).toEqual([COMPOSE_QUEUE, 'mail-out', REMINDER_QUEUE].sort());
  });

  it('after the restart, each planned roll reminder is sent exactly once to the owner and the caretaker', async () => {
    await waitForMail(owner.user.email, /Roll due: Restart pair/, 20_000);
    await waitForMail(caretaker.user.email, /Roll due: Restart pair/, 20_000);
    await new Promise((r) => setTimeout(r, 3_000)); // longer than a polling round of both workers
    for (const who of [owner, caretaker]) {
      expect((await mailsTo(who.user.email)).filter((m) => /Roll due/.test(m.subject ?? ''))).toHaveLength(1);
      expect(await instances[0].orm.em.fork().count(Notification, { user: who.user.id, subjectId: sacId, kind: 'roll-due' })).toBe(1);
    }
    const states = await instances[0].orm.em
      .getConnection()
      .execute<{ state: string; n: number }[]>(
        `select state, count(*)::int as n from ${JOBS_SCHEMA}.job where name = ? and data->>'plannedFor' = ? and data->>'key' like 'roll-due:%' group by state`,
        [REMINDER_QUEUE, `sac:${sacId}`],
      );
    expect(states).toEqual([{ state: 'completed', n: 2 }]);
  });
});
