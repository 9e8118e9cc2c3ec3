import type { Widen } from './catalogue-shape.js';

/**
 * Reminders: each kind's title and body (in-app and by e-mail), the e-mail's frame, and the page
 * an unsubscribe link opens. Keyed by the reminder kinds (server/src/reminders/reminder-words.ts).
 * Dates and instants arrive formatted in the reader's locale; an instant names its time zone.
 * `{{about}}` is the project's title for a sac, the animal's label for an animal.
 */
export const remindersEn = {
  'roll-due': {
    title: 'Roll due: {{about}}',
    body_one: 'The sac laid {{layDate}} is due for its next roll at {{due}} (every hour).',
    body_other: 'The sac laid {{layDate}} is due for its next roll at {{due}} (every {{count}} hours).',
  },
  'roll-overdue': {
    title: 'Roll overdue: {{about}}',
    body: 'The roll of the sac laid {{layDate}} was due at {{due}} and no roll is logged since. Roll it and log it.',
  },
  'pull-window-opens': {
    title: 'Pull window opens today: {{about}}',
    body: 'The sac laid {{layDate}} may be pulled from today, {{opensOn}}, until {{closesOn}}.',
  },
  'pull-window-closes': {
    title_one: 'Pull window closes in {{count}} day: {{about}}',
    title_other: 'Pull window closes in {{count}} days: {{about}}',
    body: 'The last day to pull the sac laid {{layDate}} is {{closesOn}}.',
  },
  'reading-out-of-band': {
    title: 'Reading outside the target band: {{about}}',
    body: 'The reading at {{readAt}} ({{reading}}) is outside the band set for the sac laid {{layDate}}. Check the incubator and its heat source.',
  },
  'male-clock': {
    title: 'Male clock: {{about}} — {{state}}',
    body: 'From {{from}}: {{hint}}',
  },
  'female-molted': {
    title: 'Molted after pairing: {{about}}',
    body: '{{about}} molted on {{moltedOn}}, after her pairing on {{pairedOn}}; a molt sheds the stored sperm, so that pairing no longer counts.',
  },
  'loan-due-back': {
    title_one: 'Due back in {{count}} day: {{about}}',
    title_other: 'Due back in {{count}} days: {{about}}',
    body: '{{about}} is due back from the loan on {{dueBackOn}}. Agree the journey with the other keeper and follow the rules for moving live animals where you both live.',
  },
  'daily-digest': {
    title: 'Your day: {{date}}',
    line: '{{at}}: {{what}}',
    nothing: 'Nothing is planned for the next 24 hours.',
    unread_one: '{{count}} unread in your inbox.',
    unread_other: '{{count}} unread in your inbox.',
  },
  mail: {
    why: 'You get this because “{{kind}}” is on in your reminder settings.',
    unsubscribe: 'Stop e-mails for “{{kind}}”',
  },
  unsubscribe: {
    confirm: 'Stop e-mails for “{{kind}}”?',
    button: 'Stop these e-mails',
    doneTitle: 'E-mails stopped',
    done: 'You will get no more e-mails for “{{kind}}”. In-app reminders stay as they were; change either in your settings.',
    badLinkTitle: 'This link does not work',
    badLink: 'This unsubscribe link is not valid (it may have been cut short or changed). Nothing was changed.',
    accountGone: 'The account this link was for no longer exists. Nothing was changed.',
  },
} as const;

export const remindersDe: Widen<typeof remindersEn> = {
  'roll-due': {
    title: 'Drehen fällig: {{about}}',
    body_one: 'Der Kokon vom {{layDate}} muss am {{due}} wieder gedreht werden (jede Stunde).',
    body_other: 'Der Kokon vom {{layDate}} muss am {{due}} wieder gedreht werden (alle {{count}} Stunden).',
  },
  'roll-overdue': {
    title: 'Drehen überfällig: {{about}}',
    body: 'Der Kokon vom {{layDate}} hätte am {{due}} gedreht werden müssen, und seitdem ist kein Drehen eingetragen. Dreh ihn und trag es ein.',
  },
  'pull-window-opens': {
    title: 'Entnahmefenster öffnet heute: {{about}}',
    body: 'Der Kokon vom {{layDate}} darf ab heute, {{opensOn}}, bis zum {{closesOn}} entnommen werden.',
  },
  'pull-window-closes': {
    title_one: 'Entnahmefenster schließt in {{count}} Tag: {{about}}',
    title_other: 'Entnahmefenster schließt in {{count}} Tagen: {{about}}',
    body: 'Der letzte Tag, um den Kokon vom {{layDate}} zu entnehmen, ist {{closesOn}}.',
  },
  'reading-out-of-band': {
    title: 'Messwert außerhalb des Zielbereichs: {{about}}',
    body: 'Der Messwert vom {{readAt}} ({{reading}}) liegt außerhalb des Bereichs, der für den Kokon vom {{layDate}} eingestellt ist. Prüfe den Inkubator und seine Wärmequelle.',
  },
  'male-clock': {
    title: 'Uhr des Männchens: {{about}} – {{state}}',
    body: 'Ab {{from}}: {{hint}}',
  },
  'female-molted': {
    title: 'Nach der Verpaarung gehäutet: {{about}}',
    body: '{{about}} hat sich am {{moltedOn}} gehäutet, nach der Verpaarung am {{pairedOn}}. Mit der Häutung geht das gespeicherte Sperma verloren, diese Verpaarung zählt also nicht mehr.',
  },
  'loan-due-back': {
    title_one: 'Muss in {{count}} Tag zurück: {{about}}',
    title_other: 'Muss in {{count}} Tagen zurück: {{about}}',
    body: '{{about}} muss am {{dueBackOn}} aus der Leihe zurück sein. Sprich die Reise mit dem anderen Halter ab und halte dich an die Regeln für den Transport lebender Tiere dort, wo ihr beide wohnt.',
  },
  'daily-digest': {
    title: 'Dein Tag: {{date}}',
    line: '{{at}}: {{what}}',
    nothing: 'Für die nächsten 24 Stunden ist nichts geplant.',
    unread_one: '{{count}} ungelesene Nachricht in deinem Posteingang.',
    unread_other: '{{count}} ungelesene Nachrichten in deinem Posteingang.',
  },
  mail: {
    why: 'Du bekommst diese Nachricht, weil „{{kind}}“ in deinen Erinnerungseinstellungen an ist.',
    unsubscribe: 'Keine E-Mails mehr zu „{{kind}}“',
  },
  unsubscribe: {
    confirm: 'Keine E-Mails mehr zu „{{kind}}“?',
    button: 'Diese E-Mails abbestellen',
    doneTitle: 'E-Mails abbestellt',
    done: 'Du bekommst keine E-Mails mehr zu „{{kind}}“. Erinnerungen in der App bleiben, wie sie waren; beides kannst du in deinen Einstellungen ändern.',
    badLinkTitle: 'Dieser Link funktioniert nicht',
    badLink: 'Dieser Abmeldelink ist ungültig (vielleicht wurde er abgeschnitten oder verändert). Es wurde nichts geändert.',
    accountGone: 'Das Konto, für das dieser Link war, gibt es nicht mehr. Es wurde nichts geändert.',
  },
};
