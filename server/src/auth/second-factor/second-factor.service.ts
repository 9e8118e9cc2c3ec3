import { BadRequestException, ConflictException, Inject, Injectable } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { EntityManager, LockMode } from '@mikro-orm/postgresql';
import QRCode from 'qrcode';
import type {
  RecoveryCodesRenewalRequest,
  RecoveryCodesResponse,
  SecondFactorRemovalRequest,
  SecondFactorStatus,
  TotpConfirmRequest,
  TotpEnrolment,
} from '@broodsilk/shared';
import { appConfig } from '../../config/app.config';
import { Clock } from '../../common/clock';
import { MailOutbox } from '../../mail/mail-outbox.service';
import { User } from '../../users/user.entity';
import { securityNotice } from '../security-notices';
import { assertPassword } from '../wrong-password';
import { RecoveryCode } from './recovery-code.entity';
import { newRecoveryCodes, recoveryCodeHash } from './recovery-codes';
import { secondFactorRequired } from './second-factor-rule';
import { openSecret, sealSecret } from './totp-secret-box';
import { readTotpKey } from '../../config/totp-key';
import { acceptedTotpStep, newTotpSecret, totpUri } from './totp';
import { refusal, type Refusal } from '../../common/refusal';

const codeRefusal = (why: Refusal) => new BadRequestException({ ...why, details: [{ field: 'code', ...why }] });
/** Authenticator apps show the six digits as "123 456"; the blank is not part of the code. */
const withoutBlanks = (code: string) => code.replace(/\s/g, '');

/** TOTP second factor (RFC 6238): enrolment with a confirming code, recovery codes, removal, and the code step of sign-in. */
@Injectable()
export class SecondFactorService {
  private readonly key: Buffer;

  constructor(
    private readonly em: EntityManager,
    private readonly clock: Clock,
    private readonly outbox: MailOutbox,
    @Inject(appConfig.KEY) private readonly app: ConfigType<typeof appConfig>,
  ) {
    const key = readTotpKey(app.totpEncryptionKey);
    if (!key) throw new Error('TOTP_ENCRYPTION_KEY is missing or malformed (32 random bytes as hex or base64url).');
    this.key = key;
  }

  async status(userId: string): Promise<SecondFactorStatus> {
    const user = await this.em.findOneOrFail(User, { id: userId });
    const recoveryCodesLeft = await this.em.count(RecoveryCode, { user: userId, usedAt: null });
    return { enabled: !!user.totpEnabledAt, required: secondFactorRequired(user.role), recoveryCodesLeft };
  }

  /** A new secret, kept aside (sealed) until a code from it is confirmed; asking again replaces it. */
  async startEnrolment(userId: string): Promise<TotpEnrolment> {
    const user = await this.em.findOneOrFail(User, { id: userId });
    if (user.totpEnabledAt) throw new ConflictException(refusal('auth.secondFactorExists'));
    const secret = newTotpSecret();
    user.totpPendingSecret = sealSecret(this.key, user.id, secret);
    await this.em.flush();
    const otpauthUri = totpUri(secret, user.email);
    const svg = await QRCode.toString(otpauthUri, { type: 'svg', errorCorrectionLevel: 'M', margin: 2 });
    return { secret, otpauthUri, qrCode: `data:image/svg+xml;base64,${Buffer.from(svg).toString('base64')}` };
  }

  /** The password and a right code turn the kept secret on; the recovery codes are shown this once. */
  async confirmEnrolment(userId: string, dto: TotpConfirmRequest): Promise<RecoveryCodesResponse> {
    return this.em.transactional(async (em) => {
      const user = await this.lockedUser(em, userId);
      await assertPassword(user, dto.password, 'password');
      if (user.totpEnabledAt) throw new ConflictException(refusal('auth.secondFactorAlready'));
      if (!user.totpPendingSecret) throw new ConflictException(refusal('auth.startSetupFirst'));
      const step = acceptedTotpStep(openSecret(this.key, user.id, user.totpPendingSecret), withoutBlanks(dto.code), this.clock.now(), null);
      if (step === null) throw codeRefusal(refusal('auth.codeNoMatch'));
      Object.assign(user, { totpSecret: user.totpPendingSecret, totpPendingSecret: null, totpEnabledAt: this.clock.now(), totpLastStep: step });
      const recoveryCodes = await this.replaceRecoveryCodes(em, user);
      await this.outbox.enqueue(em, securityNotice('second-factor-added', user, this.app.publicUrl));
      return { recoveryCodes };
    });
  }

  /**
   * A new set of recovery codes, shown this once; every older code stops working. The current
   * password or the app's current code proves the owner (OWASP ASVS 5.0 V6.2.3 asks for it again
   * before a change to how the account signs in); a recovery code does not, so one found code
   * cannot turn into ten.
   */
  async renewRecoveryCodes(userId: string, dto: RecoveryCodesRenewalRequest): Promise<RecoveryCodesResponse> {
    return this.em.transactional(async (em) => {
      const user = await this.lockedUser(em, userId);
      if (!user.totpEnabledAt) throw new ConflictException(refusal('auth.noSecondFactorCodes'));
      if (dto.password) await assertPassword(user, dto.password, 'password');
      else if (dto.code) {
        if (!(await this.takeCode(em, user, dto.code, false))) throw codeRefusal(refusal('auth.codeWrong'));
      } else {
        const why = refusal('auth.passwordOrCode');
        throw new BadRequestException({ ...why, details: [{ field: 'password', ...why }] });
      }
      const recoveryCodes = await this.replaceRecoveryCodes(em, user);
      await this.outbox.enqueue(em, securityNotice('recovery-codes-renewed', user, this.app.publicUrl));
      return { recoveryCodes };
    });
  }

  private async replaceRecoveryCodes(em: EntityManager, user: User): Promise<string[]> {
    await em.nativeDelete(RecoveryCode, { user: user.id });
    const recoveryCodes = newRecoveryCodes();
    for (const code of recoveryCodes) em.create(RecoveryCode, { user, codeHash: recoveryCodeHash(code)! });
    await em.flush();
    return recoveryCodes;
  }

  /** Turning the second factor off needs the password and a code (from the app or a recovery code). */
  async remove(userId: string, dto: SecondFactorRemovalRequest): Promise<void> {
    await this.em.transactional(async (em) => {
      const user = await this.lockedUser(em, userId);
      await assertPassword(user, dto.password, 'password');
      if (!user.totpEnabledAt) throw new ConflictException(refusal('auth.noSecondFactor'));
      if (!(await this.takeCode(em, user, dto.code))) throw codeRefusal(refusal('auth.codeOrRecovery'));
      Object.assign(user, { totpSecret: null, totpPendingSecret: null, totpEnabledAt: null, totpLastStep: null });
      await em.nativeDelete(RecoveryCode, { user: user.id });
      await em.flush();
      await this.outbox.enqueue(em, securityNotice('second-factor-removed', user, this.app.publicUrl));
    });
  }

  /**
   * Which kind of code `code` is when it is the app's current code (not used before) or an unused
   * recovery code, else null; either is spent by one conditional UPDATE, so two requests with the
   * same code cannot both pass. With `recovery` false only the app's code counts.
   */
  async takeCode(em: EntityManager, user: User, code: string, recovery = true): Promise<'app' | 'recovery' | null> {
    await em.populate(user, ['totpSecret']);
    if (!user.totpSecret || !user.totpEnabledAt) return null;
    const step = acceptedTotpStep(openSecret(this.key, user.id, user.totpSecret), withoutBlanks(code), this.clock.now(), user.totpLastStep ?? null);
    if (step !== null) {
      const taken = await em.nativeUpdate(User, { id: user.id, $or: [{ totpLastStep: null }, { totpLastStep: { $lt: step } }] }, { totpLastStep: step });
      return taken === 1 ? 'app' : null;
    }
    const hash = recovery ? recoveryCodeHash(code) : null;
    if (!hash) return null;
    return (await em.nativeUpdate(RecoveryCode, { user: user.id, codeHash: hash, usedAt: null }, { usedAt: this.clock.now() })) === 1 ? 'recovery' : null;
  }

  private lockedUser(em: EntityManager, userId: string): Promise<User> {
    return em.findOneOrFail(User, { id: userId }, { populate: ['passwordHash', 'totpPendingSecret'], lockMode: LockMode.PESSIMISTIC_WRITE });
  }
}
