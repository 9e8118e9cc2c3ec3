import { ConflictException, Injectable, UnprocessableEntityException } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import { randomUUID } from 'node:crypto';
import { setTimeout as sleep } from 'node:timers/promises';

/** How long a key is remembered (the usual window for client retries; common practice, e.g. 24 hours in payment APIs). */
export const IDEMPOTENCY_TTL_HOURS = 24;
/** How long a repeat waits for the first request to answer before giving up with 409. */
const WAIT_MS = 10_000;
const POLL_MS = 50;

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

/** The keys in PostgreSQL; raw SQL because claiming is one `insert … on conflict do nothing`. */
@Injectable()
export class IdempotencyStore {
  constructor(private readonly em: EntityManager) {}

  /** Claims the key for this request, or returns the first answer to replay (waiting while it is in flight). */
  async claim(r: KeyedRequest): Promise<Claim> {
    const conn = this.em.getConnection();
    // Expired keys of this user go first, so an old key can be used again (cleaned on read).
    await conn.execute(`delete from idempotency_keys where user_id = ? and expires_at < now()`, [r.userId]);
    const deadline = Date.now() + WAIT_MS;
    for (;;) {
      const inserted = await conn.execute<{ id: string }[]>(
        `insert into idempotency_keys (id, created_at, updated_at, user_id, key, method, path, fingerprint, expires_at)
         values (?, now(), now(), ?, ?, ?, ?, ?, now() + interval '${IDEMPOTENCY_TTL_HOURS} hours')
         on conflict (user_id, key) do nothing returning id`,
        [randomUUID(), r.userId, r.key, r.method, r.path, r.fingerprint],
      );
      if (inserted.length) return { id: inserted[0]!.id };
      const [row] = await conn.execute<Row[]>(`select id, method, path, fingerprint, status, body from idempotency_keys where user_id = ? and key = ?`, [
        r.userId,
        r.key,
      ]);
      if (!row) continue; // released meanwhile (the first attempt failed): claim it now
      if (row.method !== r.method || row.path !== r.path || row.fingerprint !== r.fingerprint) {
        throw new UnprocessableEntityException({
          message: 'This Idempotency-Key was already used for a different request. Send a new key for a new request.',
        });
      }
      if (row.status !== null) return { replay: { status: row.status, body: row.body } };
      if (Date.now() > deadline) throw new ConflictException({ message: 'The same request is still being processed; try again in a moment.' });
      await sleep(POLL_MS);
    }
  }

  /** Keeps the first answer for repeats. */
  async complete(id: string, status: number, body: unknown): Promise<void> {
    await this.em
      .getConnection()
      .execute(`update idempotency_keys set status = ?, body = ?::jsonb, updated_at = now() where id = ?`, [status, JSON.stringify(body ?? null), id]);
  }

  /** A failed write keeps nothing, so the same key may be sent again (after fixing the request). */
  async release(id: string): Promise<void> {
    await this.em.getConnection().execute(`delete from idempotency_keys where id = ?`, [id]);
  }
}
