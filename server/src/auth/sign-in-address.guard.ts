import { Injectable, type CanActivate, type ExecutionContext } from '@nestjs/common';
import type { Request } from 'express';
import { SignInLimits } from './sign-in-limits';

/** Counts each request to a sign-in, registration or reset route per client address (`req.ip`, from TRUST_PROXY). */
@Injectable()
export class SignInAddressGuard implements CanActivate {
  constructor(private readonly limits: SignInLimits) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const req = context.switchToHttp().getRequest<Request>();
    await this.limits.countAddress(req.route ? String((req.route as { path: string }).path) : req.path, req.ip ?? 'unknown');
    return true;
  }
}
