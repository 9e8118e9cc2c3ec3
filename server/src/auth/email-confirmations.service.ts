import { BadRequestException, Inject, Injectable } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { EntityManager, LockMode } from '@mikro-orm/postgresql';
import { createHash, randomBytes } from 'node:crypto';
import { EMAIL_CONFIRMATION_HOURS, type AcceptInvitationResponse } from '@broodsilk/shared';
import { appConfig } from '../config/app.config';
import { Clock } from '../common/clock';
import { MailOutbox, type QueuedMail } from '../mail/mail-outbox.service';
import { accountMail } from '../mail/account-mail';
import { User } from '../users/user.entity';
import { Invitation } from '../invitations/invitation.entity';
import { InvitationsService } from '../invitations/invitations.service';
import { EmailConfirmationToken } from './email-confirmation-token.entity';
import { refusal } from '../common/refusal';

/** The composed mail behind "send the e-mail again": a new link for an unconfirmed account, nothing otherwise. */
const RESEND_MAIL = 'email-confirmation';

const sha256 = (value: string) => createHash('sha256').update(value).digest('hex');

export interface ConfirmedAccount {
  user: User;
  invitation: AcceptInvitationResponse | null;
  invitationProblem?: string;
}

/**
 * A new account proves it owns its address by opening a single-use link, valid
 * EMAIL_CONFIRMATION_HOURS; only the SHA-256 of the link's token is stored. The link carries the
 * invitation that led to the registration, and confirming accepts it.
 */
@Injectable()
export class EmailConfirmations {
  constructor(
    private readonly em: EntityManager,
    private readonly clock: Clock,
    private readonly outbox: MailOutbox,
    private readonly invitations: InvitationsService,
    @Inject(appConfig.KEY) private readonly app: ConfigType<typeof appConfig>,
  ) {
    outbox.defineComposer(RESEND_MAIL, ({ email }) => this.resendMail(email));
  }

  /** A new link for `user`, carrying `invitation` (older open links keep working until one is used); the token goes only into the e-mail. */
  async newLink(user: User, invitation: { id: string } | null = null): Promise<string> {
    const token = randomBytes(32).toString('base64url');
    const expiresAt = new Date(this.clock.now().getTime() + EMAIL_CONFIRMATION_HOURS * 3600_000);
    const em = this.em.fork();
    em.create(EmailConfirmationToken, { user: user.id, tokenHash: sha256(token), expiresAt, invitation: invitation?.id ?? null });
    await em.flush();
    return token;
  }

  /** Runs in the registration job for a new account: the mail with its first link. */
  async firstMail(user: User, invitationHash: string | undefined): Promise<QueuedMail | null> {
    if (user.emailConfirmedAt) return null;
    const invitation = invitationHash ? await this.em.fork().findOne(Invitation, { tokenHash: invitationHash }, { fields: ['id'] }) : null;
    return this.mail(user, await this.newLink(user, invitation));
  }

  /** Queues the job behind "send the e-mail again": the same work whether or not the address has an unconfirmed account. */
  async requestAgain(email: string): Promise<void> {
    await this.em.transactional((em) => this.outbox.enqueueComposed(em, RESEND_MAIL, { email }));
  }

  /** Runs in the job: a fresh link carrying the invitation of the account's latest link, or nothing for an unknown or confirmed address. */
  private async resendMail(email: string): Promise<QueuedMail | null> {
    const em = this.em.fork();
    const user = await em.findOne(User, { email });
    if (!user || user.emailConfirmedAt) return null;
    const latest = await em.findOne(EmailConfirmationToken, { user: user.id, invitation: { $ne: null } }, { orderBy: { createdAt: 'desc' } });
    return this.mail(user, await this.newLink(user, latest?.invitation ?? null));
  }

  /** The confirmation link, in the language the account was registered with. */
  private mail(user: User, token: string): QueuedMail {
    const link = `${this.app.publicUrl}/confirm-email?token=${token}`;
    return accountMail(user, (t) => ({
      subject: t('mail.confirmEmail.subject'),
      paragraphs: [t('mail.confirmEmail.open', { count: EMAIL_CONFIRMATION_HOURS }), link, t('mail.confirmEmail.after')],
    }));
  }

  /**
   * Spends the link (and every other open link of the account), marks the address confirmed and
   * accepts the invitation the link carries, in one transaction. An unknown, used or expired
   * link is refused with 400.
   */
  async confirm(token: string): Promise<ConfirmedAccount> {
    return this.em.transactional(async (em) => {
      const row = await em.findOne(EmailConfirmationToken, { tokenHash: sha256(token) }, { populate: ['user'], lockMode: LockMode.PESSIMISTIC_WRITE });
      if (!row || row.usedAt || row.expiresAt.getTime() <= this.clock.now().getTime()) {
        throw new BadRequestException(refusal('auth.confirmationExpired'));
      }
      const user = row.user.getEntity();
      await em.nativeUpdate(EmailConfirmationToken, { user: user.id, usedAt: null }, { usedAt: this.clock.now() });
      user.emailConfirmedAt ??= this.clock.now();
      await em.flush();
      if (!row.invitation) return { user, invitation: null };
      const accepted = await this.invitations.acceptAfterConfirmation(em, row.invitation.id, user);
      await em.flush();
      return 'problem' in accepted ? { user, invitation: null, invitationProblem: accepted.problem } : { user, invitation: accepted };
    });
  }
}
