import { ConflictException, Injectable, UnprocessableEntityException } from '@nestjs/common';
import type { EntityManager } from '@mikro-orm/postgresql';
import { randomUUID } from 'node:crypto';
import { refusal } from '../common/refusal';

/** How long a key is remembered (the usual window for client retries; common practice, e.g. 24 hours in payment APIs). */
export const IDEMPOTENCY_TTL_HOURS = 24;
/** How long a repeat waits for the first request's transaction to end before giving up with 409. */
export const IDEMPOTENCY_WAIT = '10s';

export interface KeyedRequest {
  userId: string;
  key: string;
  method: string;
  path: string;
  fingerprint: string;
}

export type Claim = { id: string } | { replay: { status: number; body: unknown } };

interface Row {
  id: string;
  method: string;
  path: string;
  fingerprint: string;
  status: number | null;
  body: unknown;
}

/** PostgreSQL's lock_not_available (SQLSTATE 55P03): the lock_timeout passed. */
const LOCK_NOT_AVAILABLE = '55P03';

/**
 * The keys in PostgreSQL, always inside the transaction `tx` of the write they guard: the claim,
 * the write and the stored answer commit together or not at all. Raw SQL because claiming is one
 * `insert … on conflict do nothing`.
 */
@Injectable()
export class IdempotencyStore {
  /**
   * Claims the key for this request inside `tx`, or returns the first answer to replay. A repeat
   * sent while the first is running waits on the unique (user, key) index until the first
   * transaction ends: a commit means a replay, a rollback leaves the key free to claim.
   */
  async claim(tx: EntityManager, r: KeyedRequest): Promise<Claim> {
    const run = <T extends object[]>(sql: string, params: unknown[] = []) => tx.getConnection().execute<T>(sql, params, 'all', tx.getTransactionContext());
    // Expired keys of this user go first, so an old key can be used again (cleaned on read).
    await run(`delete from idempotency_keys where user_id = ? and expires_at < now()`, [r.userId]);
    let inserted: { id: string }[];
    try {
      await run(`set local lock_timeout = '${IDEMPOTENCY_WAIT}'`);
      inserted = await run<{ id: string }[]>(
        `insert into idempotency_keys (id, created_at, updated_at, user_id, key, method, path, fingerprint, expires_at)
         values (?, now(), now(), ?, ?, ?, ?, ?, now() + interval '${IDEMPOTENCY_TTL_HOURS} hours')
         on conflict (user_id, key) do nothing returning id`,
        [randomUUID(), r.userId, r.key, r.method, r.path, r.fingerprint],
      );
    } catch (e) {
      if ((e as { code?: string }).code === LOCK_NOT_AVAILABLE) throw busy();
      throw e;
    }
    // The write's own locks keep the server's usual (unlimited) wait.
    await run(`set local lock_timeout to default`);
    if (inserted.length) return { id: inserted[0]!.id };
    const [row] = await run<Row[]>(`select id, method, path, fingerprint, status, body from idempotency_keys where user_id = ? and key = ?`, [r.userId, r.key]);
    if (!row) throw busy(); // expired and deleted by a parallel request meanwhile: the client retries
    if (row.method !== r.method || row.path !== r.path || row.fingerprint !== r.fingerprint) {
      throw new UnprocessableEntityException(refusal('request.idempotencyReused'));
    }
    if (row.status === null) throw busy(); // only a key written before answers were stored with their write
    return { replay: { status: row.status, body: row.body } };
  }

  /** Keeps the first answer for repeats, in the write's transaction. */
  async complete(tx: EntityManager, id: string, status: number, body: unknown): Promise<void> {
    await tx
      .getConnection()
      .execute(
        `update idempotency_keys set status = ?, body = ?::jsonb, updated_at = now() where id = ?`,
        [status, JSON.stringify(body ?? null), id],
        'run',
        tx.getTransactionContext(),
      );
  }
}

const busy = () => new ConflictException(refusal('request.busy'));
