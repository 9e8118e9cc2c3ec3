/**
 * Workers run unless JOBS_ENABLED=false. Under vitest, workers of planned jobs (reminders) stay
 * off unless a spec turns them on, so other e2e suites do not send reminders for their sacs;
 * the mail outbox works under tests as in production.
 */
export function workersEnabled(planned: boolean, env: NodeJS.ProcessEnv = process.env): boolean {
  if (env.JOBS_ENABLED !== undefined) return env.JOBS_ENABLED !== 'false';
  return !planned || !env.VITEST;
}
