import { applyDecorators, HttpException, HttpStatus, Injectable, SetMetadata, UseGuards, type CanActivate, type ExecutionContext } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { RateLimiterMemory, RateLimiterRes } from 'rate-limiter-flexible';
import type { ServerCatalogue } from '@broodsilk/shared';
import { refusal, term } from '../refusal';

export interface PerUserLimitOptions {
  /** Names the bucket and, in the refusal, what was limited (said in the reader's language): `'statementEmails'`. */
  what: keyof ServerCatalogue['refusal']['limitedWork'];
  limit: number;
  windowMinutes: number;
  /** Count per network address instead of per keeper, for public routes (no one is signed in). */
  perAddress?: boolean;
}

const LIMIT = Symbol('per-user-limit');
/** One in-process counter per limited kind of work (rate-limiter-flexible's memory store). */
const limiters = new Map<string, RateLimiterMemory>();
const limiterFor = (o: PerUserLimitOptions) => {
  const key = `${o.what}:${o.limit}:${o.windowMinutes}`;
  let limiter = limiters.get(key);
  if (!limiter) limiters.set(key, (limiter = new RateLimiterMemory({ keyPrefix: o.what, points: o.limit, duration: o.windowMinutes * 60 })));
  return limiter;
};

@Injectable()
export class PerUserLimitGuard implements CanActivate {
  constructor(private readonly reflector: Reflector) {}

  async canActivate(ctx: ExecutionContext): Promise<boolean> {
    const options = this.reflector.get<PerUserLimitOptions | undefined>(LIMIT, ctx.getHandler());
    const req = ctx.switchToHttp().getRequest<{ user?: { id: string }; ip?: string }>();
    const key = options?.perAddress ? req.ip : req.user?.id;
    if (!options || !key) return true;
    let refused: RateLimiterRes;
    try {
      await limiterFor(options).consume(key);
      return true;
    } catch (e) {
      if (!(e instanceof RateLimiterRes)) throw e;
      refused = e;
    }
    const minutes = Math.max(1, Math.ceil(refused.msBeforeNext / 60_000));
    const values = { limit: options.limit, what: term(`refusal.limitedWork.${options.what}`), window: options.windowMinutes, minutes, count: minutes };
    throw new HttpException(refusal(options.perAddress ? 'common.addressLimit' : 'common.userLimit', values), HttpStatus.TOO_MANY_REQUESTS);
  }
}

/**
 * At most `limit` calls of this route per signed-in keeper in a sliding window, for work that
 * sends mail or takes heavy uploads. Runs after authentication and before the body is validated,
 * so a refused call writes nothing.
 */
export function PerUserLimit(options: PerUserLimitOptions): MethodDecorator {
  return applyDecorators(SetMetadata(LIMIT, options), UseGuards(PerUserLimitGuard));
}

/** At most `limit` calls of this public route per network address in a sliding window (a guessed link costs as much as a real one). */
export function PerAddressLimit(options: Omit<PerUserLimitOptions, 'perAddress'>): MethodDecorator {
  return PerUserLimit({ ...options, perAddress: true });
}
