import 'reflect-metadata';
import { MikroORM } from '@mikro-orm/postgresql';
import config from '../mikro-orm.config';

/** `npm run migrate`: applies pending migrations, nothing else. */
async function main(): Promise<void> {
  const orm = await MikroORM.init(config);
  try {
    const done = await orm.getMigrator().up();
    console.log(done.length ? `Applied ${done.length} migration(s): ${done.map((m) => m.name).join(', ')}` : 'Database is up to date.');
  } finally {
    await orm.close(true);
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
