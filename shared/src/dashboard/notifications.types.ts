/**
 * What a reminder or partner update is about. `partner-update` is news from a project one is a partner in. `pull-window-closes` goes out two days before the close day;
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
  'partner-update',
] as const;
export type NotificationKind = (typeof NOTIFICATION_KINDS)[number];

export const NOTIFICATION_SUBJECT_TYPES = ['sac', 'animal', 'project'] as const;
export type NotificationSubjectType = (typeof NOTIFICATION_SUBJECT_TYPES)[number];

/** An in-app reminder; the same text went out by e-mail when the user chose e-mail for its kind. */
export interface NotificationResponse {
  id: string;
  kind: NotificationKind;
  title: string;
  body: string;
  /** What it is about, for a link: a sac, an animal or a project (a digest is about the user's day and has none). */
  subject: { type: NotificationSubjectType; id: string } | null;
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
