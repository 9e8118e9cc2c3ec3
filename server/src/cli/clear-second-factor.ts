import 'reflect-metadata';
import { MikroORM } from '@mikro-orm/postgresql';
import { read } from 'read';
import config from '../mikro-orm.config';
import { clearSecondFactor } from '../auth/second-factor/clear-second-factor';

/** `npm run clear-second-factor -w server`: asks for the e-mail and removes that account's second factor. Exits 1 when refused. */
async function main(): Promise<void> {
  const email = await read({ prompt: 'E-mail of the account that lost its second factor: ' });
  const orm = await MikroORM.init(config);
  try {
    const result = await clearSecondFactor(orm.em.fork(), email);
    if (!result.ok) throw new Error(result.problem);
    console.log(`Second factor of ${result.email} removed and its sessions ended. It signs in with the password alone now.`);
  } finally {
    await orm.close(true);
  }
}

main().catch((err: Error) => {
  console.error(err.message);
  process.exit(1);
});
