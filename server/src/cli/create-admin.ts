import 'reflect-metadata';
import { MikroORM } from '@mikro-orm/postgresql';
import { read } from 'read';
import config from '../mikro-orm.config';
import { createAdministrator } from '../users/create-administrator';

/**
 * `npm run create-admin -w server`: asks for an e-mail, a name and a password (not echoed,
 * typed twice) and creates an administrator account. Exits 1 and writes nothing when refused.
 */
async function main(): Promise<void> {
  const email = await read({ prompt: 'E-mail of the administrator: ' });
  const displayName = await read({ prompt: 'Name to show: ' });
  const password = await read({ prompt: 'Password (not shown): ', silent: true, replace: '' });
  const again = await read({ prompt: 'The same password again: ', silent: true, replace: '' });
  if (password !== again) throw new Error('The two passwords differ; nothing was written.');
  const orm = await MikroORM.init(config);
  try {
    const result = await createAdministrator(orm.em.fork(), { email, displayName, password });
    if (!result.ok) throw new Error(result.problem);
    console.log(`Administrator ${result.user.email} created. Sign in and set up the second factor in Settings.`);
  } finally {
    await orm.close(true);
  }
}

main().catch((err: Error) => {
  console.error(err.message);
  process.exit(1);
});
