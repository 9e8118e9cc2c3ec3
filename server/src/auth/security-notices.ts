import type { OutgoingMail } from '../mail/mail.service';

/**
 * The notices an account gets after a change to how it signs in (OWASP ASVS 5.0 V6.3.7: notify
 * the user after updates to authentication details). Each says what happened and what to do if
 * it was not them; none carries a link that signs in.
 */
export type SecurityNotice =
  | 'password-changed'
  | 'password-reset'
  | 'second-factor-added'
  | 'second-factor-removed'
  | 'recovery-code-used'
  | 'recovery-codes-renewed'
  | 'registration-attempt';

const WHAT: Record<SecurityNotice, { subject: string; body: string }> = {
  'password-changed': {
    subject: 'Your Broodsilk password was changed',
    body: 'The password of your Broodsilk account was just changed, and every other session was signed out.',
  },
  'password-reset': {
    subject: 'Your Broodsilk password was reset',
    body: 'The password of your Broodsilk account was just reset through an e-mailed link, and every session was signed out.',
  },
  'second-factor-added': {
    subject: 'A second factor was added to your Broodsilk account',
    body: 'Signing in to your Broodsilk account now also asks for a code from an authenticator app. Keep your recovery codes somewhere safe.',
  },
  'second-factor-removed': {
    subject: 'The second factor of your Broodsilk account was removed',
    body: 'Signing in to your Broodsilk account no longer asks for a code from an authenticator app.',
  },
  'recovery-code-used': {
    subject: 'A recovery code was used to sign in to your Broodsilk account',
    body: 'Someone signed in to your Broodsilk account with the password and one of its recovery codes. That code no longer works.',
  },
  'recovery-codes-renewed': {
    subject: 'The recovery codes of your Broodsilk account were renewed',
    body: 'New recovery codes were made for your Broodsilk account; the earlier ones no longer work.',
  },
  'registration-attempt': {
    subject: 'Someone tried to register with your e-mail address',
    body: 'Someone tried to create a Broodsilk account with this e-mail address, which already has one. No new account was made and your account is unchanged.',
  },
};

export function securityNotice(kind: SecurityNotice, to: { email: string; displayName: string }, publicUrl: string): Omit<OutgoingMail, 'attachments'> {
  const { subject, body } = WHAT[kind];
  const advice =
    kind === 'registration-attempt'
      ? `If that was you, sign in at ${publicUrl}/sign-in, or reset your password at ${publicUrl}/forgot-password.`
      : `If this was you, there is nothing to do. If it was not, reset your password at once at ${publicUrl}/forgot-password and tell your partners.`;
  return { to: to.email, subject, text: `Hello ${to.displayName},\n\n${body}\n\n${advice}\n` };
}
