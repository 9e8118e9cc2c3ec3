import 'reflect-metadata';
import { MikroORM } from '@mikro-orm/postgresql';
import config from '../mikro-orm.config';
import { runDemoSeed } from '../seed/run-demo-seed';

/** `npm run seed`: seeds the demo scenario when the database has no accounts yet, on a local demo install only. */
async function main(): Promise<void> {
  const orm = await MikroORM.init(config);
  try {
    console.log(await runDemoSeed(orm));
  } finally {
    await orm.close(true);
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
