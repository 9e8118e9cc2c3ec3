import { Injectable, Logger, type OnApplicationBootstrap, type OnApplicationShutdown } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import PgBoss from 'pg-boss';
import { RemindersService } from './reminders.service';

export const REMINDER_QUEUE = 'reminders-sweep';
/** pg-boss keeps its tables in a schema of its own, away from the migrations' `public`. */
export const JOBS_SCHEMA = 'pgboss_reminders';
/** Every 15 minutes: often enough for a 12-hour roll interval's "due" stretch (3 hours). */
export const SWEEP_CRON = '*/15 * * * *';

/**
 * Jobs are on unless JOBS_ENABLED=false. Under vitest they are off unless a spec turns them on,
 * so e2e suites of other features do not each start a scheduler against the test database.
 */
export function jobsEnabled(env: NodeJS.ProcessEnv = process.env): boolean {
  if (env.JOBS_ENABLED !== undefined) return env.JOBS_ENABLED !== 'false';
  return !env.VITEST;
}

/** Starts pg-boss with the app, schedules the reminder sweep, and stops it on shutdown. */
@Injectable()
export class ReminderJobsService implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly logger = new Logger(ReminderJobsService.name);
  private boss: PgBoss | null = null;

  constructor(
    private readonly config: ConfigService,
    private readonly reminders: RemindersService,
  ) {}

  get running(): boolean {
    return this.boss !== null;
  }

  async onApplicationBootstrap(): Promise<void> {
    if (!jobsEnabled()) return;
    const boss = new PgBoss({ connectionString: this.config.getOrThrow<string>('database.url'), schema: JOBS_SCHEMA });
    boss.on('error', (e) => this.logger.error(`pg-boss: ${e.message}`));
    await boss.start();
    await boss.createQueue(REMINDER_QUEUE);
    await boss.schedule(REMINDER_QUEUE, SWEEP_CRON);
    await boss.work(REMINDER_QUEUE, async () => {
      const run = await this.reminders.runOnce();
      this.logger.log(`reminders: ${run.sent} sent, ${run.skipped} already sent today`);
    });
    this.boss = boss;
  }

  async onApplicationShutdown(): Promise<void> {
    const boss = this.boss;
    this.boss = null;
    if (boss) await boss.stop({ graceful: true, wait: true });
  }
}
