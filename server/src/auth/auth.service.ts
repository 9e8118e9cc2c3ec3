import { ForbiddenException, Inject, Injectable, UnauthorizedException, BadRequestException } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import { JwtService } from '@nestjs/jwt';
import { EntityManager, LockMode, raw, type RequiredEntityData } from '@mikro-orm/postgresql';
import { createHash, randomBytes } from 'node:crypto';
import { EMAIL_NOT_CONFIRMED, PENDING_SIGN_IN_MINUTES, RESET_LINK_MINUTES, SESSION_HOURS, type Me, type SecondFactorChallenge } from '@broodsilk/shared';
import { appConfig } from '../config/app.config';
import { MailOutbox } from '../mail/mail-outbox.service';
import { accountMail } from '../mail/account-mail';
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
import { SecondFactorService } from './second-factor/second-factor.service';
import { readPendingSignIn, signPendingSignIn } from './second-factor/pending-sign-in';
import { securityNotice } from './security-notices';
import { assertPassword } from './wrong-password';
import { EmailConfirmations } from './email-confirmations.service';
import { hashInvitationToken } from '../invitations/invitation-token';
import { refusal } from '../common/refusal';

/** The composed mail behind every reset request: a link for a known address, nothing for an unknown one. */
const RESET_MAIL = 'password-reset-link';
/** The composed mail behind every registration: a notice to the owner of a taken address, the confirmation link for a new one. */
const REGISTRATION_MAIL = 'registration-attempt';

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
    private readonly secondFactor: SecondFactorService,
    private readonly confirmations: EmailConfirmations,
    @Inject(appConfig.KEY) private readonly app: ConfigType<typeof appConfig>,
  ) {
    outbox.defineComposer(RESET_MAIL, ({ email }) => this.resetLinkMail(email));
    outbox.defineComposer(REGISTRATION_MAIL, ({ email, attemptedId, invitationHash }) => this.registrationMail(email, attemptedId, invitationHash));
  }

  /**
   * Does the same work and gives the same answer for a new and a taken address: one password
   * hash, one `INSERT … ON CONFLICT DO NOTHING`, one queued job, and nobody is signed in. The job
   * mails a new account its confirmation link and the owner of a taken address a notice that
   * someone tried to register with it (docs/operations.md, "Sign-up").
   */
  async register(dto: RegisterDto): Promise<void> {
    const user = Object.assign(new User(), {
      email: dto.email,
      displayName: dto.displayName,
      passwordHash: await hashPassword(dto.password),
      timeZone: dto.timeZone ?? 'UTC',
      language: dto.language ?? 'en',
    });
    await this.em.transactional(async (em) => {
      // Every column the entity would write (its defaults included), in one statement that skips a taken address.
      const row = em.getComparator().prepareEntity(user) as RequiredEntityData<User>;
      await em.createQueryBuilder(User).insert(row).onConflict('email').ignore().execute();
      // Only the invitation token's hash goes into the job's data, as the invitations table keeps it.
      const invitation: Record<string, string> = dto.invitationToken ? { invitationHash: hashInvitationToken(dto.invitationToken) } : {};
      await this.outbox.enqueueComposed(em, REGISTRATION_MAIL, { email: user.email, attemptedId: user.id, ...invitation });
    });
  }

  /** Runs in the job: the confirmation link for a new account, a notice to the owner of a taken address. */
  private async registrationMail(email: string, attemptedId: string, invitationHash: string | undefined) {
    const owner = await this.em.fork().findOne(User, { email });
    if (!owner) return null;
    if (owner.id === attemptedId) return this.confirmations.firstMail(owner, invitationHash);
    return securityNotice('registration-attempt', owner, this.app.publicUrl);
  }

  /**
   * Checks the password unless the account is locked; wrong ones count towards the lock, known
   * address or not. With a second factor the right password gives only a short-lived pending
   * token, and the run of failures goes on until the code is right too.
   */
  async login(dto: LoginDto, ip: string): Promise<IssuedSession | SecondFactorChallenge> {
    await this.limits.assertAccountOpen(dto.email, ip);
    const user = await this.em.findOne(User, { email: dto.email }, { populate: ['passwordHash'] });
    // Verify against a dummy hash for unknown e-mails so the answer takes as long either way.
    const ok = await verifyPassword(user?.passwordHash ?? (await dummyPasswordHash()), dto.password);
    if (!user || !ok) {
      await this.limits.recordFailure(dto.email);
      throw new UnauthorizedException(refusal('auth.wrongCredentials'));
    }
    if (!user.emailConfirmedAt) {
      // Only a right password learns this: the address's owner has not opened the link yet.
      await this.limits.recordSuccess(dto.email);
      throw new ForbiddenException({ ...refusal('auth.confirmEmailFirst'), reason: EMAIL_NOT_CONFIRMED });
    }
    if (user.totpEnabledAt) {
      const expiresAt = new Date(this.clock.now().getTime() + PENDING_SIGN_IN_MINUTES * 60_000);
      return {
        secondFactor: 'totp',
        pendingToken: signPendingSignIn(this.jwt, this.app.jwtSecret, user, this.clock.now()),
        expiresAt: expiresAt.toISOString(),
      };
    }
    await this.limits.recordSuccess(dto.email);
    return this.issue(user);
  }

  /** The code step of sign-in: the pending token from the right password, and a code; wrong codes count towards the account's lock. */
  async completeSignIn(pendingToken: string, code: string, ip: string): Promise<IssuedSession> {
    const pending = readPendingSignIn(this.jwt, this.app.jwtSecret, pendingToken, this.clock.now());
    const user = pending && (await this.em.findOne(User, { id: pending.userId }));
    if (!pending || !user || user.tokenVersion !== pending.ver) {
      throw new UnauthorizedException(refusal('auth.signInExpired'));
    }
    await this.limits.assertAccountOpen(user.email, ip);
    const kind = await this.secondFactor.takeCode(this.em, user, code);
    if (!kind) {
      await this.limits.recordFailure(user.email);
      const why = refusal('auth.codeOrRecovery');
      throw new UnauthorizedException({ ...why, details: [{ field: 'code', ...why }] });
    }
    await this.limits.recordSuccess(user.email);
    // A recovery code in someone else's hands would pass for the owner: tell them it was used.
    if (kind === 'recovery') await this.em.transactional((em) => this.outbox.enqueue(em, securityNotice('recovery-code-used', user, this.app.publicUrl)));
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

  /**
   * Does the same work whether or not the e-mail belongs to an account: one queued job, no lookup.
   * The job looks the address up after commit and mails a link to a known one; for an unknown
   * address it sends nothing (mailing strangers would let anyone aim our mail at any inbox).
   */
  async requestPasswordReset(email: string): Promise<void> {
    await this.em.transactional((em) => this.outbox.enqueueComposed(em, RESET_MAIL, { email }));
  }

  /** Runs in the job: a new single-use link (replacing any older open one) and its mail, or null for an unknown address. */
  private async resetLinkMail(email: string) {
    return this.em.fork().transactional(async (em) => {
      const user = await em.findOne(User, { email });
      if (!user) return null;
      const token = randomBytes(32).toString('base64url');
      const link = `${this.app.publicUrl}/reset-password?token=${token}`;
      await em.nativeUpdate(PasswordResetToken, { user: user.id, usedAt: null }, { usedAt: this.clock.now() });
      em.create(PasswordResetToken, { user, tokenHash: sha256(token), expiresAt: new Date(this.clock.now().getTime() + RESET_LINK_MINUTES * 60_000) });
      await em.flush();
      return accountMail(user, (t) => ({
        subject: t('mail.passwordReset.subject'),
        paragraphs: [t('mail.passwordReset.open', { count: RESET_LINK_MINUTES }), link, t('mail.passwordReset.after')],
      }));
    });
  }

  async confirmPasswordReset(token: string, password: string): Promise<void> {
    await this.em.transactional(async (em) => {
      const row = await em.findOne(PasswordResetToken, { tokenHash: sha256(token) }, { populate: ['user'], lockMode: LockMode.PESSIMISTIC_WRITE });
      if (!row || row.usedAt || row.expiresAt.getTime() < this.clock.now().getTime()) {
        throw new BadRequestException(refusal('auth.resetExpired'));
      }
      row.usedAt = this.clock.now();
      const user = row.user.getEntity();
      user.passwordHash = await hashPassword(password);
      user.tokenVersion += 1;
      // Whoever took over the account may have copied the feed URL too.
      await revokeFeeds(em, user.id, this.clock.now());
      await em.flush();
      await this.outbox.enqueue(em, securityNotice('password-reset', user, this.app.publicUrl));
    });
  }

  async changePassword(userId: string, currentPassword: string, newPassword: string): Promise<IssuedSession> {
    const user = await this.em.transactional(async (em) => {
      const found = await em.findOneOrFail(User, { id: userId }, { populate: ['passwordHash'], lockMode: LockMode.PESSIMISTIC_WRITE });
      await assertPassword(found, currentPassword, 'currentPassword');
      found.passwordHash = await hashPassword(newPassword);
      found.tokenVersion += 1;
      await em.flush();
      await this.outbox.enqueue(em, securityNotice('password-changed', found, this.app.publicUrl));
      return found;
    });
    return this.issue(user);
  }
}
