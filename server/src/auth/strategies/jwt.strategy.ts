import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { PassportStrategy } from '@nestjs/passport';
import { EntityManager } from '@mikro-orm/postgresql';
import { ExtractJwt, Strategy } from 'passport-jwt';
import type { Request } from 'express';
import { SESSION_COOKIE } from '@broodsilk/shared';
import { User } from '../../users/user.entity';
import type { AuthUser, JwtPayload } from '../../common/auth-user';
import { secondFactorRequired } from '../second-factor/second-factor-rule';

function fromSessionCookie(req: Request): string | null {
  const value = (req.cookies as Record<string, string> | undefined)?.[SESSION_COOKIE];
  return value || null;
}

/** Accepts the session cookie or a Bearer token; both carry the same JWT. */
@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy) {
  constructor(
    config: ConfigService,
    private readonly em: EntityManager,
  ) {
    super({
      jwtFromRequest: ExtractJwt.fromExtractors([ExtractJwt.fromAuthHeaderAsBearerToken(), fromSessionCookie]),
      secretOrKey: config.getOrThrow<string>('app.jwtSecret'),
      algorithms: ['HS256'],
      ignoreExpiration: false,
    });
  }

  async validate(payload: JwtPayload): Promise<AuthUser | false> {
    const user = await this.em.findOne(User, { id: payload.sub }, { fields: ['id', 'email', 'role', 'timeZone', 'tokenVersion', 'totpEnabledAt'] });
    // A token issued before the last logout or password change no longer counts.
    if (!user || user.tokenVersion !== payload.ver) return false;
    return {
      id: user.id,
      email: user.email,
      role: user.role,
      timeZone: user.timeZone,
      mustEnrolSecondFactor: !user.totpEnabledAt && secondFactorRequired(user.role),
    };
  }
}
