import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/test-app';
import { JOBS_SCHEMA, REMINDER_QUEUE, ReminderJobsService, SWEEP_CRON } from '../src/reminders/reminder-jobs.service';

let t: TestApp;
let before: string | undefined;

beforeAll(async () => {
  before = process.env.JOBS_ENABLED;
  process.env.JOBS_ENABLED = 'true';
  t = await createTestApp();
});
afterAll(async () => {
  if (before === undefined) delete process.env.JOBS_ENABLED;
  else process.env.JOBS_ENABLED = before;
});

describe('pg-boss lifecycle', () => {
  it('starts with the app in its own schema with the sweep queue and schedule, and stops on shutdown', async () => {
    const jobs = t.app.get(ReminderJobsService);
    expect(jobs.running).toBe(true);
    const conn = t.orm.em.getConnection();
    const queues = await conn.execute<{ name: string }[]>(`select name from ${JOBS_SCHEMA}.queue where name = ?`, [REMINDER_QUEUE]);
    expect(queues.map((q) => q.name)).toEqual([REMINDER_QUEUE]);
    const schedules = await conn.execute<{ cron: string }[]>(`select cron from ${JOBS_SCHEMA}.schedule where name = ?`, [REMINDER_QUEUE]);
    expect(schedules.map((s) => s.cron)).toEqual([SWEEP_CRON]);
    await t.close();
    expect(jobs.running).toBe(false);
  });
});
