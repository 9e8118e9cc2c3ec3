import type { EntityManager } from '@mikro-orm/postgresql';
import { isEmail } from 'class-validator';
import { hashPassword } from '../auth/password-hasher';
import { passwordProblem, passwordRefusal } from '../auth/password-policy';
import { User } from './user.entity';

export interface NewAdministrator {
  email: string;
  displayName: string;
  password: string;
}

/** The outcome of `npm run create-admin`: the account, or the reason nothing was written. */
export type CreateAdministratorResult = { ok: true; user: User } | { ok: false; problem: string };

/**
 * Creates an administrator account: how a real install (which gets no demo accounts) gets its
 * first one. Refuses a weak password and a taken address instead of changing an existing account.
 */
export async function createAdministrator(em: EntityManager, input: NewAdministrator): Promise<CreateAdministratorResult> {
  const email = input.email.trim().toLowerCase();
  const displayName = input.displayName.trim();
  if (!isEmail(email)) return { ok: false, problem: 'Enter a valid e-mail address.' };
  if (!displayName) return { ok: false, problem: 'Enter a name to show.' };
  const weak = passwordProblem(input.password);
  if (weak) return { ok: false, problem: passwordRefusal(weak).message };
  if (await em.count(User, { email })) return { ok: false, problem: `An account with ${email} exists already; nothing was changed.` };
  // The operator typed the address at the console: it counts as confirmed.
  const user = em.create(User, { email, displayName, role: 'admin', passwordHash: await hashPassword(input.password), emailConfirmedAt: new Date() });
  await em.flush();
  return { ok: true, user };
}
