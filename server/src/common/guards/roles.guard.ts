import { CanActivate, ExecutionContext, ForbiddenException, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { AccountRole } from '@broodsilk/shared';
import { ACCOUNT_ROLES_KEY } from '../decorators/roles.decorator';
import type { AuthUser } from '../auth-user';
import { refusal } from '../refusal';

/** Global guard after authentication: checks @Roles(...) against the caller's account role. */
@Injectable()
export class RolesGuard implements CanActivate {
  constructor(private readonly reflector: Reflector) {}

  canActivate(context: ExecutionContext): boolean {
    const roles = this.reflector.getAllAndOverride<AccountRole[] | undefined>(ACCOUNT_ROLES_KEY, [context.getHandler(), context.getClass()]);
    if (!roles?.length) return true;
    const user = context.switchToHttp().getRequest().user as AuthUser | undefined;
    if (!user || !roles.includes(user.role)) throw new ForbiddenException(refusal('common.accountRole'));
    if (user.mustEnrolSecondFactor) {
      throw new ForbiddenException(refusal('common.adminSecondFactor'));
    }
    return true;
  }
}
