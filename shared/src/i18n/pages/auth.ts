import type { Widen } from '../catalogue-shape.js';

/** Page text: sign-in, registration, second factor, password reset (client/src/features/auth). English first; German must fill the same keys. */
export const authEn = {
  checkEmail: {
    title: 'Check your e-mail',
    body: 'We have sent a message to {{email}} with the next step. Open the link in it within {{hours}} hours to finish creating your account.',
    invitation: 'Your invitation is kept: confirming the address also accepts it.',
    nothingCame: 'Nothing after a few minutes? Look in the spam folder, or send the e-mail again.',
  },
  notConfirmed: 'Confirm your e-mail address first: open the link we sent when you registered.',
  sendAgain: 'Send the e-mail again',
  sentAgain: 'If this address has an account waiting for confirmation, a new link is on its way. It works once, within {{hours}} hours.',
  confirm: {
    title: 'Confirm your e-mail address',
    subtitle: 'The last step of creating your account',
    intro: 'Confirm that this address is yours to finish creating your Broodsilk account.',
    button: 'Confirm my address',
    missingToken: 'This page needs the link from the e-mail. Open it again, and check that you copied all of it.',
    confirmedSignIn: 'Your address is confirmed. Sign in to continue.',
    invitationProblem: 'Your address is confirmed, but the invitation could not be used: {{problem}}',
    awaitingOwner: 'Your address is confirmed. The invitation was sent to another address, so the project owner approves your joining first.',
    goOn: 'Continue to Broodsilk',
    signIn: 'Go to sign-in',
  },
} as const;

export const authDe: Widen<typeof authEn> = {
  checkEmail: {
    title: 'Sieh in dein E-Mail-Postfach',
    body: 'Wir haben eine Nachricht mit dem nächsten Schritt an {{email}} geschickt. Öffne den Link darin innerhalb von {{hours}} Stunden, um dein Konto fertig anzulegen.',
    invitation: 'Deine Einladung bleibt erhalten: Mit der Bestätigung der Adresse nimmst du sie auch an.',
    nothingCame: 'Nach ein paar Minuten nichts angekommen? Sieh im Spam-Ordner nach oder lass dir die E-Mail noch einmal schicken.',
  },
  notConfirmed: 'Bestätige zuerst deine E-Mail-Adresse: Öffne den Link, den wir dir bei der Registrierung geschickt haben.',
  sendAgain: 'E-Mail noch einmal senden',
  sentAgain: 'Wenn zu dieser Adresse ein Konto auf die Bestätigung wartet, ist ein neuer Link unterwegs. Er gilt einmal, innerhalb von {{hours}} Stunden.',
  confirm: {
    title: 'Bestätige deine E-Mail-Adresse',
    subtitle: 'Der letzte Schritt beim Anlegen deines Kontos',
    intro: 'Bestätige, dass diese Adresse dir gehört, um dein Broodsilk-Konto fertig anzulegen.',
    button: 'Meine Adresse bestätigen',
    missingToken: 'Diese Seite braucht den Link aus der E-Mail. Öffne ihn noch einmal und prüfe, ob du ihn vollständig kopiert hast.',
    confirmedSignIn: 'Deine Adresse ist bestätigt. Melde dich an, um weiterzumachen.',
    invitationProblem: 'Deine Adresse ist bestätigt, aber die Einladung ließ sich nicht verwenden: {{problem}}',
    awaitingOwner:
      'Deine Adresse ist bestätigt. Die Einladung ging an eine andere Adresse, deshalb muss die Projektinhaberin oder der Projektinhaber deinem Beitritt erst zustimmen.',
    goOn: 'Weiter zu Broodsilk',
    signIn: 'Zur Anmeldung',
  },
};
