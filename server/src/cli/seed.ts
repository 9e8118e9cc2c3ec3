import 'reflect-metadata';
import { MikroORM } from '@mikro-orm/postgresql';
import config from '../mikro-orm.config';
import { seedDemo } from '../seed/demo-seed';
import { DEMO_SEEDERS } from '../seed/demo-seeders';

/** `npm run seed`: seeds the demo scenario when the database has no accounts yet. */
async function main(): Promise<void> {
  const orm = await MikroORM.init(config);
  try {
    const seeded = await seedDemo(orm.em.fork(), DEMO_SEEDERS);
    console.log(seeded ? 'Demo scenario seeded.' : 'Accounts exist already; demo seed skipped.');
  } finally {
    await orm.close(true);
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
