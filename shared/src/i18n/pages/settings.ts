import type { Widen } from '../catalogue-shape.js';

/** Page text: the settings page (client/src/features/settings). English first; German must fill the same keys. */
export const settingsEn = {
  renewCodes: {
    open: 'Make new recovery codes',
    intro:
      'New recovery codes replace all the earlier ones, used or not; the earlier ones stop working at once. Confirm with your password or with the code your app shows now.',
    password: 'Your password',
    code: 'Or the code your app shows now',
    needOne: 'Enter your password or the code your app shows now.',
    submit: 'Make new codes',
    cancel: 'Cancel',
    doneTitle: 'New recovery codes',
    doneBody: 'The earlier recovery codes no longer work.',
  },
} as const;

export const settingsDe: Widen<typeof settingsEn> = {
  renewCodes: {
    open: 'Neue Wiederherstellungscodes erstellen',
    intro:
      'Neue Wiederherstellungscodes ersetzen alle bisherigen, ob benutzt oder nicht; die bisherigen gelten ab sofort nicht mehr. Bestätige mit deinem Passwort oder mit dem Code, den deine App gerade anzeigt.',
    password: 'Dein Passwort',
    code: 'Oder der Code, den deine App gerade anzeigt',
    needOne: 'Gib dein Passwort oder den Code ein, den deine App gerade anzeigt.',
    submit: 'Neue Codes erstellen',
    cancel: 'Abbrechen',
    doneTitle: 'Neue Wiederherstellungscodes',
    doneBody: 'Die bisherigen Wiederherstellungscodes gelten nicht mehr.',
  },
};
