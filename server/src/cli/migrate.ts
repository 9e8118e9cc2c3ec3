import 'reflect-metadata';
import { MikroORM } from '@mikro-orm/postgresql';
import config from '../mikro-orm.config';
import { databaseUrls } from '../database/database-urls';
import { migrateDatabase } from './migrate-database';

/**
 * `npm run migrate`, as the owner (DATABASE_OWNER_URL, else DATABASE_URL): applies pending
 * migrations, installs the job queues and grants the runtime role (DATABASE_URL) its row rights.
 */
async function main(): Promise<void> {
  const orm = await MikroORM.init(config);
  try {
    const { applied, grantedTo } = await migrateDatabase(orm, databaseUrls());
    console.log(applied.length ? `Applied ${applied.length} migration(s): ${applied.join(', ')}` : 'Database is up to date.');
    if (grantedTo) console.log(`The runtime role ${grantedTo} may read and write rows (and nothing more).`);
  } finally {
    await orm.close(true);
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
