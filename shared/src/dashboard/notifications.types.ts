export const NOTIFICATION_KINDS = ['roll-due', 'roll-overdue', 'pull-window-opens', 'pull-window-closes', 'male-clock'] as const;
export type NotificationKind = (typeof NOTIFICATION_KINDS)[number];

/** An in-app reminder; the same text went out by e-mail. */
export interface NotificationResponse {
  id: string;
  kind: NotificationKind;
  title: string;
  body: string;
  /** What it is about, for a link: a sac or an animal. */
  subject: { type: 'sac' | 'animal'; id: string };
  projectId: string | null;
  createdAt: string;
  readAt: string | null;
}
