import type { NotificationKind } from '../dashboard/notifications.types.js';
import type { ReminderChannel } from '../reminders/reminder-preferences.types.js';

// Still to move into the catalogue (shared/src/i18n) with the reminder settings; the other
// label maps that lived here are catalogue sections now.

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
};

export const REMINDER_CHANNEL_LABELS: Record<ReminderChannel, string> = {
  both: 'E-mail and in-app',
  email: 'E-mail only',
  'in-app': 'In-app only',
  off: 'Off',
};
