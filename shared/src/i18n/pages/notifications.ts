import type { Widen } from '../catalogue-shape.js';

/** Page text: the inbox and its header link (client/src/features/notifications, app/routes/notifications). English first; German must fill the same keys. */
export const notificationsEn = {
  inbox: 'Inbox',
  description: 'Your reminders, newest first. Choose which ones come here in your settings.',
  linkUnread_one: 'Inbox, {{count}} unread',
  linkUnread_other: 'Inbox, {{count}} unread',
  linkNothing: 'Inbox, nothing unread',
  unread_one: '{{count}} unread',
  unread_other: '{{count}} unread',
  allRead: 'Everything is read.',
  markAll: 'Mark all as read',
  none: 'No notifications yet. Reminders you choose in your settings will arrive here.',
} as const;

export const notificationsDe: Widen<typeof notificationsEn> = {
  inbox: 'Posteingang',
  description: 'Deine Erinnerungen, die neuesten zuerst. Welche hier ankommen, wählst du in den Einstellungen.',
  linkUnread_one: 'Posteingang, {{count}} ungelesen',
  linkUnread_other: 'Posteingang, {{count}} ungelesen',
  linkNothing: 'Posteingang, nichts ungelesen',
  unread_one: '{{count}} ungelesen',
  unread_other: '{{count}} ungelesen',
  allRead: 'Alles gelesen.',
  markAll: 'Alle als gelesen markieren',
  none: 'Noch keine Benachrichtigungen. Erinnerungen, die du in den Einstellungen wählst, kommen hier an.',
};
