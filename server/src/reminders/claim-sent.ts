import type { EntityManager } from '@mikro-orm/postgresql';

/**
 * Claims a key in `reminder_sent` (unique) on `tx`: false when another worker, an earlier run or
 * another path has it. Reminders and partner updates are each sent once by this.
 */
export async function claimSent(tx: EntityManager, key: string): Promise<boolean> {
  const rows = await tx
    .getConnection()
    .execute<{ key: string }[]>(
      `insert into reminder_sent (id, created_at, updated_at, key) values (gen_random_uuid(), now(), now(), ?) on conflict (key) do nothing returning key`,
      [key],
      'all',
      tx.getTransactionContext(),
    );
  return rows.length > 0;
}
