import type { MikroORM } from '@mikro-orm/postgresql';
import { demoRefusal } from './demo-gate';
import { seedDemo } from './demo-seed';
import { DEMO_SEEDERS } from './demo-seeders';

/** What `npm run seed` does: the demo on a local demo install with no accounts, else nothing. Returns the line to print. */
export async function runDemoSeed(orm: MikroORM, env: NodeJS.ProcessEnv = process.env): Promise<string> {
  const refusal = demoRefusal(env);
  if (refusal) return `Demo seed skipped: ${refusal}. Create the first administrator with: npm run create-admin -w server`;
  const seeded = await seedDemo(orm.em.fork(), DEMO_SEEDERS);
  return seeded ? 'Demo scenario seeded.' : 'Accounts exist already; demo seed skipped.';
}
