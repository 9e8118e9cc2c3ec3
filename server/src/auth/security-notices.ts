import { accountMail, type MailReader } from '../mail/account-mail';
import type { QueuedMail } from '../mail/mail-outbox.service';

/**
 * The notices an account gets after a change to how it signs in (OWASP ASVS 5.0 V6.3.7: notify
 * the user after updates to authentication details). Each says what happened and what to do if
 * it was not them; none carries a link that signs in. Written in the account's language
 * (catalogue section `mail.security`).
 */
export type SecurityNotice =
  | 'password-changed'
  | 'password-reset'
  | 'second-factor-added'
  | 'second-factor-removed'
  | 'recovery-code-used'
  | 'recovery-codes-renewed'
  | 'registration-attempt';

export function securityNotice(kind: SecurityNotice, to: MailReader & { displayName: string }, publicUrl: string): QueuedMail {
  const urls = { signInUrl: `${publicUrl}/sign-in`, resetUrl: `${publicUrl}/forgot-password` };
  return accountMail(to, (t) => ({
    subject: t(`mail.security.${kind}.subject`),
    paragraphs: [t(`mail.security.${kind}.body`), t(kind === 'registration-attempt' ? 'mail.security.ifRegistering' : 'mail.security.ifNotYou', urls)],
  }));
}
