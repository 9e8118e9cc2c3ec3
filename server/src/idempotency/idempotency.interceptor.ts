import { BadRequestException, Injectable, type CallHandler, type ExecutionContext, type NestInterceptor } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import { createHash } from 'node:crypto';
import type { Request, Response } from 'express';
import { defaultIfEmpty, from, lastValueFrom, type Observable } from 'rxjs';
import type { AuthUser } from '../common/auth-user';
import { IdempotencyStore } from './idempotency.store';
import { refusal } from '../common/refusal';

export const IDEMPOTENCY_HEADER = 'Idempotency-Key';
// A UUID or any other opaque token a client makes up: printable ASCII, bounded.
const KEY = /^[\x21-\x7e]{8,255}$/;

/**
 * A POST carrying `Idempotency-Key` is written once per user and key for 24 hours: a repeat gets
 * the first answer again (status and body), a different request under the same key 422.
 * Requests without the header, or without a session, pass through untouched.
 *
 * The key is claimed in a transaction that the handler's own writes join (their
 * `em.transactional` becomes a savepoint in it) and the answer is stored in it too: a write that
 * fails, or a process that dies, after the claim leaves neither the key nor the write, so a retry
 * runs the write instead of replaying a success that never committed.
 */
@Injectable()
export class IdempotencyInterceptor implements NestInterceptor {
  constructor(
    private readonly store: IdempotencyStore,
    private readonly em: EntityManager,
  ) {}

  intercept(context: ExecutionContext, next: CallHandler): Observable<unknown> {
    if (context.getType() !== 'http') return next.handle();
    const req = context.switchToHttp().getRequest<Request>();
    const res = context.switchToHttp().getResponse<Response>();
    const key = req.header(IDEMPOTENCY_HEADER);
    const user = req.user as AuthUser | undefined;
    if (req.method !== 'POST' || key === undefined || !user) return next.handle();
    if (!KEY.test(key)) throw new BadRequestException(refusal('request.idempotencyKey', { header: IDEMPOTENCY_HEADER }));
    const path = req.originalUrl.split('?')[0]!;
    const fingerprint = createHash('sha256')
      .update(`${req.method} ${path}\n${JSON.stringify(req.body ?? null)}`)
      .digest('hex');
    return from(
      this.em.transactional(async (tx) => {
        const claim = await this.store.claim(tx, { userId: user.id, key, method: req.method, path, fingerprint });
        if ('replay' in claim) {
          res.status(claim.replay.status).setHeader('Idempotent-Replayed', 'true');
          return claim.replay.body;
        }
        // Subscribed inside the transaction's context, so the handler's EntityManager is `tx`.
        const body = await lastValueFrom(next.handle().pipe(defaultIfEmpty(undefined)));
        await this.store.complete(tx, claim.id, res.statusCode, body);
        return body;
      }),
    );
  }
}
