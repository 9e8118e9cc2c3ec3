import type { Widen } from '../catalogue-shape.js';

/** Page text: invitations (client/src/features/invitations). English first; German must fill the same keys. */
export const invitationsEn = {
  title: 'You are invited',
  subtitle: 'A breeding project on Broodsilk',
  /** `<inviter/>` and `<project/>` are the names, shown in bold (react-i18next `Trans` components). */
  invites: {
    partner: '<inviter/> invites you to the project <project/> as a partner (you share in the brood and agree the terms).',
    caretaker: '<inviter/> invites you to the project <project/> as the caretaker (you roll the eggs and keep the care log).',
  },
  noLongerWorks: 'This invitation no longer works',
  askForNew: 'Ask the keeper to send a new one.',
  waitingTitle: 'Waiting for the owner',
  waiting:
    'This invitation was sent to another e-mail address, so the project owner must approve your account before you join. You will see the project once they have.',
  signedInAs: 'Signed in as {{who}}.',
  who: '{{name}} ({{email}})',
  joinFailed: 'Joining did not work. Try again.',
  join: 'Join the project',
  signInFirst: 'Sign in to join. New to Broodsilk? Create an account with the address the invitation went to; you come back here to join.',
  signIn: 'Sign in to join',
} as const;

export const invitationsDe: Widen<typeof invitationsEn> = {
  title: 'Du bist eingeladen',
  subtitle: 'Ein Zuchtprojekt auf Broodsilk',
  invites: {
    partner: '<inviter/> lädt dich als Partner zum Projekt <project/> ein (du teilst dir die Brut und stimmst den Bedingungen zu).',
    caretaker: '<inviter/> lädt dich als Betreuer zum Projekt <project/> ein (du drehst die Eier und führst das Pflegeprotokoll).',
  },
  noLongerWorks: 'Diese Einladung gilt nicht mehr',
  askForNew: 'Bitte den Halter, dir eine neue zu senden.',
  waitingTitle: 'Warten auf den Eigentümer',
  waiting:
    'Diese Einladung ging an eine andere E-Mail-Adresse, deshalb muss der Eigentümer des Projekts dein Konto bestätigen, bevor du beitrittst. Sobald er das getan hat, siehst du das Projekt.',
  signedInAs: 'Angemeldet als {{who}}.',
  who: '{{name}} ({{email}})',
  joinFailed: 'Der Beitritt hat nicht geklappt. Bitte versuch es noch einmal.',
  join: 'Dem Projekt beitreten',
  signInFirst:
    'Melde dich an, um beizutreten. Neu bei Broodsilk? Lege ein Konto mit der Adresse an, an die die Einladung ging; danach kommst du hierher zurück und trittst bei.',
  signIn: 'Anmelden und beitreten',
};
