import type { NotificationKind } from '../dashboard/notifications.types.js';

/** How a reminder kind reaches a user. */
export const REMINDER_CHANNELS = ['email', 'in-app', 'both', 'off'] as const;
export type ReminderChannel = (typeof REMINDER_CHANNELS)[number];

/** Kinds not named in a user's choices go out by e-mail and in-app. */
export const DEFAULT_REMINDER_CHANNEL: ReminderChannel = 'both';

/** A whole local hour, 0–23. Quiet hours run from `quietFrom` up to `quietTo` (they may wrap past midnight). */
export interface ReminderPreferences {
  channels: Record<NotificationKind, ReminderChannel>;
  /** Null for no quiet hours. */
  quietHours: { from: number; to: number } | null;
  /** A roll-overdue reminder may break the quiet hours (an incubating sac does not wait for morning). */
  overdueBreaksQuiet: boolean;
  /** Local hour of the daily digest; null for none. */
  digestHour: number | null;
  /** The zone every time in a reminder is shown in (the user's settings). */
  timeZone: string;
}

/** A change to one's preferences: only what is sent changes. */
export interface UpdateReminderPreferencesRequest {
  channels?: Partial<Record<NotificationKind, ReminderChannel>>;
  quietHours?: { from: number; to: number } | null;
  overdueBreaksQuiet?: boolean;
  digestHour?: number | null;
}

export const REMINDER_HOURS = Array.from({ length: 24 }, (_, h) => h);

export function channelSendsEmail(c: ReminderChannel): boolean {
  return c === 'email' || c === 'both';
}

export function channelSendsInApp(c: ReminderChannel): boolean {
  return c === 'in-app' || c === 'both';
}
