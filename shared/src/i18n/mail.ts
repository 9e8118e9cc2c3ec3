import type { Widen } from './catalogue-shape.js';

/**
 * The e-mails the server writes about an account and its access: the address confirmation, the
 * password reset link, the invitation to a project and the security notices after a change to
 * how an account signs in. Each is rendered in the reader's language (server/src/mail/mail-words.ts).
 */
export const mailEn = {
  hello: 'Hello {{name}},',
  /** The subject and link of every e-mail about something in the app (reminders, partner updates). */
  subject: 'Broodsilk: {{title}}',
  openInApp: 'Open in Broodsilk',
  helloNobody: 'Hello,',
  confirmEmail: {
    subject: 'Confirm your e-mail address for Broodsilk',
    open_one: 'To finish creating your Broodsilk account, open this link within {{count}} hour and confirm the address:',
    open_other: 'To finish creating your Broodsilk account, open this link within {{count}} hours and confirm the address:',
    after: 'The link works once. If you did not create an account, ignore this e-mail; without the confirmation nobody can sign in to it.',
  },
  passwordReset: {
    subject: 'Reset your Broodsilk password',
    open_one: 'Someone asked to reset the password of your Broodsilk account. If it was you, open this link within {{count}} minute:',
    open_other: 'Someone asked to reset the password of your Broodsilk account. If it was you, open this link within {{count}} minutes:',
    after: 'The link works once. If you did not ask for it, ignore this e-mail; your password stays as it is.',
  },
  invitation: {
    subject: '{{inviter}} invites you to the breeding project "{{project}}"',
    body: '{{inviter}} invites you to join the breeding project "{{project}}" on Broodsilk as {{role}}.',
    open_one: 'Open this link within {{count}} day to accept (sign in or create an account first):',
    open_other: 'Open this link within {{count}} days to accept (sign in or create an account first):',
    after: 'The link works once. If you did not expect this e-mail, ignore it.',
    role: { partner: 'partner', caretaker: 'caretaker' },
  },
  security: {
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
    ifNotYou: 'If this was you, there is nothing to do. If it was not, reset your password at once at {{resetUrl}} and tell your partners.',
    ifRegistering: 'If that was you, sign in at {{signInUrl}}, or reset your password at {{resetUrl}}.',
  },
} as const;

export const mailDe: Widen<typeof mailEn> = {
  hello: 'Hallo {{name}},',
  subject: 'Broodsilk: {{title}}',
  openInApp: 'In Broodsilk öffnen',
  helloNobody: 'Hallo,',
  confirmEmail: {
    subject: 'Bestätige deine E-Mail-Adresse für Broodsilk',
    open_one: 'Um dein Broodsilk-Konto fertig anzulegen, öffne diesen Link innerhalb von {{count}} Stunde und bestätige die Adresse:',
    open_other: 'Um dein Broodsilk-Konto fertig anzulegen, öffne diesen Link innerhalb von {{count}} Stunden und bestätige die Adresse:',
    after:
      'Der Link funktioniert nur einmal. Wenn du kein Konto angelegt hast, ignoriere diese E-Mail; ohne die Bestätigung kann sich niemand bei dem Konto anmelden.',
  },
  passwordReset: {
    subject: 'Setze dein Broodsilk-Passwort zurück',
    open_one:
      'Jemand hat darum gebeten, das Passwort deines Broodsilk-Kontos zurückzusetzen. Wenn du das warst, öffne diesen Link innerhalb von {{count}} Minute:',
    open_other:
      'Jemand hat darum gebeten, das Passwort deines Broodsilk-Kontos zurückzusetzen. Wenn du das warst, öffne diesen Link innerhalb von {{count}} Minuten:',
    after: 'Der Link funktioniert nur einmal. Wenn du nicht darum gebeten hast, ignoriere diese E-Mail; dein Passwort bleibt, wie es ist.',
  },
  invitation: {
    subject: '{{inviter}} lädt dich zum Zuchtprojekt „{{project}}“ ein',
    body: '{{inviter}} lädt dich ein, beim Zuchtprojekt „{{project}}“ auf Broodsilk als {{role}} mitzumachen.',
    open_one: 'Öffne diesen Link innerhalb von {{count}} Tag, um anzunehmen (melde dich vorher an oder lege ein Konto an):',
    open_other: 'Öffne diesen Link innerhalb von {{count}} Tagen, um anzunehmen (melde dich vorher an oder lege ein Konto an):',
    after: 'Der Link funktioniert nur einmal. Wenn du diese E-Mail nicht erwartet hast, ignoriere sie.',
    role: { partner: 'Partner', caretaker: 'Betreuer' },
  },
  security: {
    'password-changed': {
      subject: 'Dein Broodsilk-Passwort wurde geändert',
      body: 'Das Passwort deines Broodsilk-Kontos wurde gerade geändert, und alle anderen Sitzungen wurden abgemeldet.',
    },
    'password-reset': {
      subject: 'Dein Broodsilk-Passwort wurde zurückgesetzt',
      body: 'Das Passwort deines Broodsilk-Kontos wurde gerade über einen per E-Mail geschickten Link zurückgesetzt, und alle Sitzungen wurden abgemeldet.',
    },
    'second-factor-added': {
      subject: 'Deinem Broodsilk-Konto wurde ein zweiter Faktor hinzugefügt',
      body: 'Bei der Anmeldung an deinem Broodsilk-Konto wird jetzt auch ein Code aus einer Authenticator-App abgefragt. Bewahre deine Wiederherstellungscodes sicher auf.',
    },
    'second-factor-removed': {
      subject: 'Der zweite Faktor deines Broodsilk-Kontos wurde entfernt',
      body: 'Bei der Anmeldung an deinem Broodsilk-Konto wird kein Code aus einer Authenticator-App mehr abgefragt.',
    },
    'recovery-code-used': {
      subject: 'Ein Wiederherstellungscode wurde zur Anmeldung bei deinem Broodsilk-Konto verwendet',
      body: 'Jemand hat sich mit dem Passwort und einem der Wiederherstellungscodes bei deinem Broodsilk-Konto angemeldet. Dieser Code gilt nicht mehr.',
    },
    'recovery-codes-renewed': {
      subject: 'Die Wiederherstellungscodes deines Broodsilk-Kontos wurden erneuert',
      body: 'Für dein Broodsilk-Konto wurden neue Wiederherstellungscodes erstellt; die bisherigen gelten nicht mehr.',
    },
    'registration-attempt': {
      subject: 'Jemand wollte sich mit deiner E-Mail-Adresse registrieren',
      body: 'Jemand wollte mit dieser E-Mail-Adresse ein Broodsilk-Konto anlegen, obwohl sie schon zu einem Konto gehört. Es wurde kein neues Konto angelegt, und dein Konto ist unverändert.',
    },
    ifNotYou: 'Wenn du das warst, musst du nichts tun. Wenn nicht, setze sofort dein Passwort unter {{resetUrl}} zurück und sag deinen Partnern Bescheid.',
    ifRegistering: 'Wenn du das warst, melde dich unter {{signInUrl}} an oder setze dein Passwort unter {{resetUrl}} zurück.',
  },
};
