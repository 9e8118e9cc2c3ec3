import { applyDecorators, HttpException, HttpStatus, Injectable, SetMetadata, UseGuards, type CanActivate, type ExecutionContext } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { ThrottlerStorageService } from '@nestjs/throttler';

export interface PerUserLimitOptions {
  /** Names the bucket and, in the refusal, what was limited: "statement e-mails". */
  what: string;
  limit: number;
  windowMinutes: number;
}

const LIMIT = Symbol('per-user-limit');
/** One counter store for the process (its sweep timer is unref'd); the product runs as one process. */
const storage = new ThrottlerStorageService();

@Injectable()
export class PerUserLimitGuard implements CanActivate {
  constructor(private readonly reflector: Reflector) {}

  async canActivate(ctx: ExecutionContext): Promise<boolean> {
    const options = this.reflector.get<PerUserLimitOptions | undefined>(LIMIT, ctx.getHandler());
    const userId = (ctx.switchToHttp().getRequest<{ user?: { id: string } }>().user ?? {}).id;
    if (!options || !userId) return true;
    const ttl = options.windowMinutes * 60_000;
    // Without a block duration the storage counts a sliding window: blocked while `limit` hits are younger than the window.
    const { isBlocked, timeToBlockExpire } = await storage.increment(`${options.what}:${userId}`, ttl, options.limit, 0, 'per-user');
    if (!isBlocked) return true;
    const minutes = Math.max(1, Math.ceil(timeToBlockExpire / 60));
    throw new HttpException(
      `You have reached the limit of ${options.limit} ${options.what} per ${options.windowMinutes} minutes. Try again in ${minutes} minute${minutes === 1 ? '' : 's'}.`,
      HttpStatus.TOO_MANY_REQUESTS,
    );
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
