import type { EntityManager } from '@mikro-orm/postgresql';
import type PgBoss from 'pg-boss';

/**
 * pg-boss runs its SQL through this adapter on the connection of a MikroORM transaction, so a job
 * is queued (or cancelled) only if the write it belongs to commits. pg-boss writes `$1`-style SQL
 * and the transaction runs knex's `?` style: each `$n` becomes a `?` with its value.
 */
/** knex would spread an array value into `?, ?, …`; PostgreSQL reads this text as the array pg-boss casts it to (`$2::uuid[]`). */
function arrayLiteral(value: unknown): unknown {
  if (!Array.isArray(value)) return value;
  return `{${value.map((v) => `"${String(v).replace(/[\\"]/g, '\\$&')}"`).join(',')}}`;
}

export function inTransaction(tx: EntityManager): PgBoss.Db {
  return {
    executeSql: async (text, values) => {
      const ordered: unknown[] = [];
      const sql = text.replace(/\$(\d+)/g, (_, n: string) => {
        ordered.push(arrayLiteral(values[Number(n) - 1]));
        return '?';
      });
      const rows = await tx.getConnection().execute(sql, ordered, 'all', tx.getTransactionContext());
      return { rows: rows as unknown[] };
    },
  };
}
