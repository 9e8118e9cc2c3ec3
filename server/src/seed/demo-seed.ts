import type { EntityManager } from '@mikro-orm/postgresql';
import { User } from '../users/user.entity';
import { hashPassword } from '../auth/password-hasher';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from './demo-accounts';

export interface SeedContext {
  em: EntityManager;
  users: Record<(typeof DEMO_ACCOUNTS)[number]['key'], User>;
  /** "Today" of the scenario; every demo date is relative to it so the demo never goes stale. */
  today: Date;
}

/** Feature seeders add their part of the invented scenario here, in dependency order. */
export type FeatureSeeder = (ctx: SeedContext) => Promise<void>;

/**
 * Seeds the demo scenario into an empty database, in one transaction.
 * Returns false (and changes nothing) when any account already exists.
 */
export async function seedDemo(em: EntityManager, seeders: FeatureSeeder[] = [], today = new Date()): Promise<boolean> {
  if ((await em.count(User, {})) > 0) return false;
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  await em.transactional(async (tx) => {
    const users = Object.fromEntries(
      DEMO_ACCOUNTS.map((a) => [
        a.key,
        tx.create(User, {
          email: a.email,
          displayName: a.displayName,
          role: a.role,
          timeZone: a.timeZone,
          temperatureUnit: a.temperatureUnit,
          passwordHash,
          emailConfirmedAt: today,
        }),
      ]),
    ) as SeedContext['users'];
    await tx.flush();
    for (const seeder of seeders) {
      await seeder({ em: tx, users, today });
      await tx.flush();
    }
  });
  return true;
}
