import { ConflictException, Inject, Injectable, UnauthorizedException, BadRequestException } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import { JwtService } from '@nestjs/jwt';
import { EntityManager, LockMode, raw } from '@mikro-orm/postgresql';
import { createHash, randomBytes } from 'node:crypto';
import { SESSION_HOURS, type Me } from '@broodsilk/shared';
import { appConfig } from '../config/app.config';
import { MailOutbox } from '../mail/mail-outbox.service';
import { User } from '../users/user.entity';
import { toMe } from '../users/users.mapper';
import { dummyPasswordHash, hashPassword, verifyPassword } from './password-hasher';
import { PasswordResetToken } from './password-reset-token.entity';
import { SignInLimits } from './sign-in-limits';
import { revokeFeeds } from '../calendar/feed-token';
import type { JwtPayload } from '../common/auth-user';
import type { RegisterDto } from './dto/register.dto';
import type { LoginDto } from './dto/login.dto';
import { Clock } from '../common/clock';

export const RESET_LINK_MINUTES = 45;

export interface IssuedSession {
  user: Me;
  accessToken: string;
  expiresAt: Date;
}

function sha256(value: string): string {
  return createHash('sha256').update(value).digest('hex');
}

@Injectable()
export class AuthService {
  constructor(
    private readonly em: EntityManager,
    private readonly clock: Clock,
    private readonly jwt: JwtService,
    private readonly outbox: MailOutbox,
    private readonly limits: SignInLimits,
    @Inject(appConfig.KEY) private readonly app: ConfigType<typeof appConfig>,
  ) {}

  async register(dto: RegisterDto): Promise<IssuedSession> {
    if (await this.em.count(User, { email: dto.email })) {
      throw new ConflictException('An account with this e-mail already exists. Sign in or reset your password.');
    }
    const user = this.em.create(User, {
      email: dto.email,
      displayName: dto.displayName,
      passwordHash: await hashPassword(dto.password),
      timeZone: dto.timeZone ?? 'UTC',
      language: dto.language ?? 'en',
    });
    await this.em.flush();
    return this.issue(user);
  }

  /** Checks the password unless the account is locked; wrong ones count towards the lock, known address or not. */
  async login(dto: LoginDto, ip: string): Promise<IssuedSession> {
    await this.limits.assertAccountOpen(dto.email, ip);
    const user = await this.em.findOne(User, { email: dto.email }, { populate: ['passwordHash'] });
    // Verify against a dummy hash for unknown e-mails so the answer takes as long either way.
    const ok = await verifyPassword(user?.passwordHash ?? (await dummyPasswordHash()), dto.password);
    if (!user || !ok) {
      await this.limits.recordFailure(dto.email);
      throw new UnauthorizedException('The e-mail or password is not right.');
    }
    await this.limits.recordSuccess(dto.email);
    return this.issue(user);
  }

  /** Ends every session of the user: tokens carry the version, and it moves on. */
  async logout(userId: string): Promise<void> {
    await this.em
      .createQueryBuilder(User)
      .update({ tokenVersion: raw('token_version + 1') })
      .where({ id: userId })
      .execute();
  }

  async me(userId: string): Promise<Me> {
    return toMe(await this.em.findOneOrFail(User, { id: userId }));
  }

  issue(user: User): IssuedSession {
    const payload: JwtPayload = { sub: user.id, ver: user.tokenVersion };
    const accessToken = this.jwt.sign(payload, { expiresIn: `${SESSION_HOURS}h` });
    return { user: toMe(user), accessToken, expiresAt: new Date(this.clock.now().getTime() + SESSION_HOURS * 3600_000) };
  }

  /** Always answers the same way, whether or not the e-mail belongs to an account. */
  async requestPasswordReset(email: string): Promise<void> {
    const user = await this.em.findOne(User, { email });
    if (!user) return;
    const token = randomBytes(32).toString('base64url');
    const link = `${this.app.publicUrl}/reset-password?token=${token}`;
    await this.em.transactional(async (em) => {
      // A new link replaces any older one that is still open.
      await em.nativeUpdate(PasswordResetToken, { user: user.id, usedAt: null }, { usedAt: this.clock.now() });
      em.create(PasswordResetToken, { user, tokenHash: sha256(token), expiresAt: new Date(this.clock.now().getTime() + RESET_LINK_MINUTES * 60_000) });
      await em.flush();
      await this.outbox.enqueue(em, {
        to: user.email,
        subject: 'Reset your Broodsilk password',
        text: `Hello ${user.displayName},\n\nSomeone asked to reset the password of your Broodsilk account. If it was you, open this link within ${RESET_LINK_MINUTES} minutes:\n\n${link}\n\nThe link works once. If you did not ask for it, ignore this e-mail; your password stays as it is.\n`,
      });
    });
  }

  async confirmPasswordReset(token: string, password: string): Promise<void> {
    await this.em.transactional(async (em) => {
      const row = await em.findOne(PasswordResetToken, { tokenHash: sha256(token) }, { populate: ['user'], lockMode: LockMode.PESSIMISTIC_WRITE });
      if (!row || row.usedAt || row.expiresAt.getTime() < this.clock.now().getTime()) {
        throw new BadRequestException('This reset link has expired or was already used. Ask for a new one.');
      }
      row.usedAt = this.clock.now();
      const user = row.user.getEntity();
      user.passwordHash = await hashPassword(password);
      user.tokenVersion += 1;
      // Whoever took over the account may have copied the feed URL too.
      await revokeFeeds(em, user.id, this.clock.now());
    });
  }

  async changePassword(userId: string, currentPassword: string, newPassword: string): Promise<IssuedSession> {
    const user = await this.em.findOneOrFail(User, { id: userId }, { populate: ['passwordHash'] });
    if (!(await verifyPassword(user.passwordHash, currentPassword))) {
      throw new BadRequestException({
        message: 'Your current password is not right.',
        details: [{ field: 'currentPassword', message: 'This is not your current password.' }],
      });
    }
    user.passwordHash = await hashPassword(newPassword);
    user.tokenVersion += 1;
    await this.em.flush();
    return this.issue(user);
  }
}
