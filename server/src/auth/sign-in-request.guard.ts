import { ForbiddenException, Inject, Injectable, UnsupportedMediaTypeException, type CanActivate, type ExecutionContext } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import type { Request } from 'express';
import { appConfig } from '../config/app.config';
import { refusal } from '../common/refusal';

/**
 * Sign-in and registration come only from our own pages or a non-browser client: the body must be
 * JSON (a cross-site HTML form cannot send that without a CORS preflight, which we never grant),
 * and a browser's Origin header, when there is one, must be our own address (OWASP CSRF
 * Prevention Cheat Sheet, "Verifying Origin With Standard Headers"). This stops login CSRF.
 */
@Injectable()
export class SignInRequestGuard implements CanActivate {
  constructor(@Inject(appConfig.KEY) private readonly app: ConfigType<typeof appConfig>) {}

  canActivate(context: ExecutionContext): boolean {
    const req = context.switchToHttp().getRequest<Request>();
    if (!req.is('application/json')) throw new UnsupportedMediaTypeException(refusal('auth.sendJson'));
    const origin = req.get('origin');
    if (origin !== undefined && !this.ownOrigins(req).includes(origin)) {
      throw new ForbiddenException(refusal('auth.foreignOrigin'));
    }
    return true;
  }

  /** PUBLIC_URL's origin, and the address the request itself was sent to (the dev server's proxy keeps it). */
  private ownOrigins(req: Request): string[] {
    return [new URL(this.app.publicUrl).origin, `${req.protocol}://${req.get('host') ?? ''}`];
  }
}
