import type { ProjectSetback } from '../breeding/project-stage.js';
import type { NotificationKind } from '../dashboard/notifications.types.js';
import type { ReminderChannel } from '../reminders/reminder-preferences.types.js';

// Still to move into the catalogue (shared/src/i18n) with the reminder settings; the other
// label maps that lived here are catalogue sections now.

/**
 * Advice for a setback in the current attempt (see deriveProjectStage): what happened and what to do
 * next. The project stays open; ending it is the keeper's call. The molt rule follows
 * docs/trade-facts.md §5; the rest is common practice.
 */
export const SETBACK_ADVICE: Record<ProjectSetback, string> = {
  'female-molted': 'The female molted after the last pairing, so that pairing is lost: pair her again once she has hardened.',
  'sac-eaten': 'The mother ate the sac. First-time mothers often do: let her feed up, then pair her again.',
  'sac-failed': 'The last sac failed. Let her feed up and pair her again, or end the project if she is done for the season.',
  'male-died': 'The male died before a successful pairing: pair her with a backup male, or end the project.',
};

/** Reminder kinds as the settings and the inbox name them. */
export const NOTIFICATION_KIND_LABELS: Record<NotificationKind, string> = {
  'roll-due': 'A roll falls due',
  'roll-overdue': 'A roll is overdue',
  'pull-window-opens': 'A pull window opens',
  'pull-window-closes': 'A pull window closes in 2 days',
  'male-clock': 'A male’s clock moves on',
  'reading-out-of-band': 'A reading is outside the target band',
  'female-molted': 'A female molted after pairing',
  'loan-due-back': 'A loaned animal is due back in 7 days',
  'daily-digest': 'The daily digest',
  'partner-update': 'News from a project you are a partner in',
};

export const REMINDER_CHANNEL_LABELS: Record<ReminderChannel, string> = {
  both: 'E-mail and in-app',
  email: 'E-mail only',
  'in-app': 'In-app only',
  off: 'Off',
};
