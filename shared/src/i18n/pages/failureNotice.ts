import type { Widen } from '../catalogue-shape.js';

/** Page text: the failure form with the keeper's message to the partners and its preview (client/src/features/sacs). */
export const failureNoticeEn = {
  reasonLabel: 'The sac failed',
  reasonPlaceholder: 'Reason',
  reasonRequired: 'Choose why the sac failed.',
  messageLabel: 'Your message to the partners (optional)',
  messageHint: 'Sent with the facts: the counts and what the terms say for each party.',
  preview: 'Show what the partners will read',
  previewHeading: 'What the partners will read',
  membersWill_one: 'One partner with an account gets it in the app and by e-mail, as they chose.',
  membersWill_other: '{{count}} partners with an account get it in the app and by e-mail, as they chose.',
  outsideWill_one: 'One partner without an account gets it by e-mail.',
  outsideWill_other: '{{count}} partners without an account get it by e-mail.',
  nobody: 'Nobody else is a partner in this project: nothing is sent.',
  previewFailed: 'The preview could not be made. Try again.',
  submit: 'Record as failed',
} as const;

export const failureNoticeDe: Widen<typeof failureNoticeEn> = {
  reasonLabel: 'Der Kokon ist verdorben',
  reasonPlaceholder: 'Grund',
  reasonRequired: 'Wähle, warum der Kokon verdorben ist.',
  messageLabel: 'Deine Nachricht an die Partner (freiwillig)',
  messageHint: 'Wird mit den Fakten verschickt: den Zählungen und dem, was die Bedingungen für jeden Beteiligten sagen.',
  preview: 'Zeigen, was die Partner lesen werden',
  previewHeading: 'Was die Partner lesen werden',
  membersWill_one: 'Ein Partner mit Konto bekommt es in der App und per E-Mail, wie er es eingestellt hat.',
  membersWill_other: '{{count}} Partner mit Konto bekommen es in der App und per E-Mail, wie sie es eingestellt haben.',
  outsideWill_one: 'Ein Partner ohne Konto bekommt es per E-Mail.',
  outsideWill_other: '{{count}} Partner ohne Konto bekommen es per E-Mail.',
  nobody: 'Außer dir ist niemand Partner in diesem Projekt: Es wird nichts verschickt.',
  previewFailed: 'Die Vorschau konnte nicht erstellt werden. Versuche es noch einmal.',
  submit: 'Als verdorben eintragen',
};
