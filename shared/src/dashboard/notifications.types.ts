/**
 * What a reminder is about. `pull-window-closes` goes out two days before the close day;
 * `reading-out-of-band` waits for sacs to carry a target band (the planner already takes one).
 */
export const NOTIFICATION_KINDS = [
  'roll-due',
  'roll-overdue',
  'pull-window-opens',
  'pull-window-closes',
  'male-clock',
  'reading-out-of-band',
  'female-molted',
  'loan-due-back',
  'daily-digest',
] as const;
export type NotificationKind = (typeof NOTIFICATION_KINDS)[number];

/** An in-app reminder; the same text went out by e-mail when the user chose e-mail for its kind. */
export interface NotificationResponse {
  id: string;
  kind: NotificationKind;
  title: string;
  body: string;
  /** What it is about, for a link: a sac or an animal (a digest is about the user's day and has none). */
  subject: { type: 'sac' | 'animal'; id: string } | null;
  projectId: string | null;
  createdAt: string;
  readAt: string | null;
}

/** One page of the caller's notifications, newest first, with how many are unread in all. */
export interface NotificationPage {
  items: NotificationResponse[];
  total: number;
  unread: number;
}

export interface NotificationListQuery {
  limit?: number;
  offset?: number;
}

export const NOTIFICATION_PAGE_SIZE = 20;
