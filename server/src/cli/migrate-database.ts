import type { MikroORM } from '@mikro-orm/postgresql';
import { installJobQueues, JOBS_SCHEMA } from '../jobs/job-queues';
import { roleOf, type DatabaseUrls } from '../database/database-urls';
import { grantRuntimeRole } from '../database/runtime-role';

/** The schemas whose rows the app reads and writes: the migrations' tables and pg-boss's. */
const APP_SCHEMAS = ['public', JOBS_SCHEMA];

export interface MigrationReport {
  applied: string[];
  /** The runtime role given its rights, or null when the app runs as the owner. */
  grantedTo: string | null;
}

/**
 * `npm run migrate`, as the owner (`orm` connects with `urls.owner`): applies pending migrations,
 * creates or upgrades pg-boss's schema and queues, then grants the runtime role its row rights
 * when it is another role than the owner.
 */
export async function migrateDatabase(orm: MikroORM, urls: DatabaseUrls): Promise<MigrationReport> {
  const applied = (await orm.getMigrator().up()).map((m) => m.name);
  await installJobQueues(urls.owner);
  const owner = roleOf(urls.owner);
  const runtime = roleOf(urls.runtime);
  if (runtime === owner) return { applied, grantedTo: null };
  await grantRuntimeRole(orm.em.getConnection(), runtime, APP_SCHEMAS);
  return { applied, grantedTo: runtime };
}
