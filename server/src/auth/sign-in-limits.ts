import { HttpException, HttpStatus, Inject, Injectable, Logger, type OnModuleDestroy } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { createHash } from 'node:crypto';
import { Pool } from 'pg';
import { RateLimiterPostgres, RateLimiterRes } from 'rate-limiter-flexible';
import { appConfig } from '../config/app.config';
import { databaseConfig } from '../config/database.config';
import { refusal, type Refusal } from '../common/refusal';

/** Consecutive wrong passwords for one account before it is locked. */
export const FAILURES_BEFORE_LOCK = 5;
/** The first lock; each further lock within a day doubles it (OWASP ASVS 5.0 V6.3.1, "Authentication Cheat Sheet": account lockout with growing delay). */
export const FIRST_LOCK_SECONDS = 60;
const MAX_LOCK_SECONDS = 24 * 3600;
const TABLE = { tableName: 'rate_limits', tableCreated: true, clearExpiredByTimeout: false, storeType: 'pool' } as const;

/** A short, stable stand-in for an e-mail address in logs and keys. */
const digest = (text: string) => createHash('sha256').update(text).digest('hex').slice(0, 16);

/**
 * Sign-in limits kept in PostgreSQL, so every API instance counts together: requests per client
 * address and route, and consecutive failures per account with a lock that doubles each time.
 * Unknown addresses are counted the same way, so a lock says nothing about whether an account
 * exists. Each refusal is logged as a structured `security.rate_limited` event.
 */
@Injectable()
export class SignInLimits implements OnModuleDestroy {
  private readonly logger = new Logger(SignInLimits.name);
  private readonly pool: Pool;
  private readonly perAddress: RateLimiterPostgres;
  private readonly failures: RateLimiterPostgres;
  private readonly locks: RateLimiterPostgres;

  constructor(@Inject(appConfig.KEY) app: ConfigType<typeof appConfig>, @Inject(databaseConfig.KEY) db: ConfigType<typeof databaseConfig>) {
    this.pool = new Pool({ connectionString: db.url, max: 4 });
    const store = { storeClient: this.pool, ...TABLE };
    this.perAddress = new RateLimiterPostgres({ ...store, keyPrefix: 'address', points: app.authRateLimit, duration: Math.ceil(app.authRateWindowMs / 1000) });
    this.failures = new RateLimiterPostgres({ ...store, keyPrefix: 'failures', points: FAILURES_BEFORE_LOCK, duration: 24 * 3600 });
    this.locks = new RateLimiterPostgres({ ...store, keyPrefix: 'locks', points: 1000, duration: 24 * 3600 });
  }

  async onModuleDestroy(): Promise<void> {
    await this.pool.end();
  }

  /** Counts one request of a client address on a sign-in route; 429 past the limit. */
  async countAddress(route: string, ip: string): Promise<void> {
    try {
      await this.perAddress.consume(`${route}:${ip}`);
    } catch (e) {
      if (!(e instanceof RateLimiterRes)) throw e;
      this.refuse({ scope: 'address', route, ip }, refusal('auth.tooManyAttempts'), e);
    }
  }

  /** 429 while the account is locked after too many wrong passwords in a row. */
  async assertAccountOpen(email: string, ip: string): Promise<void> {
    const state = await this.failures.get(email);
    if (state && state.consumedPoints > FAILURES_BEFORE_LOCK && state.msBeforeNext > 0) {
      const seconds = Math.ceil(state.msBeforeNext / 1000);
      this.refuse({ scope: 'account', account: digest(email), ip }, refusal('auth.tooManyWrongPasswords', { seconds }), state);
    }
  }

  /** One more wrong password in a row; the one that reaches the limit locks the account. */
  async recordFailure(email: string): Promise<void> {
    const res = await this.failures.penalty(email);
    if (res.consumedPoints !== FAILURES_BEFORE_LOCK) return;
    const lockNumber = (await this.locks.penalty(email)).consumedPoints;
    const seconds = Math.min(FIRST_LOCK_SECONDS * 2 ** (lockNumber - 1), MAX_LOCK_SECONDS);
    await this.failures.block(email, seconds);
    this.logger.warn({ event: 'security.account_locked', account: digest(email), seconds, lockNumber }, 'account locked after repeated wrong passwords');
  }

  /** A right password ends the run of failures (the lock count stays for the day). */
  async recordSuccess(email: string): Promise<void> {
    await this.failures.delete(email);
  }

  private refuse(fields: Record<string, string>, why: Refusal, res: RateLimiterRes): never {
    const retryAfter = Math.max(1, Math.ceil(res.msBeforeNext / 1000));
    this.logger.warn({ event: 'security.rate_limited', ...fields, retryAfter }, 'sign-in refused by a rate limit');
    throw new HttpException({ ...why, retryAfter }, HttpStatus.TOO_MANY_REQUESTS);
  }
}
