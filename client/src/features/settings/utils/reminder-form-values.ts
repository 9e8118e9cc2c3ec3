import {
  NOTIFICATION_KINDS,
  type NotificationKind,
  type ReminderChannel,
  type ReminderPreferences,
  type UpdateReminderPreferencesRequest,
} from '@broodsilk/shared';

/** The form holds whole hours as Select values ('0'–'23'); '' is "none". */
export interface ReminderFormValues {
  channels: Record<NotificationKind, ReminderChannel>;
  quiet: boolean;
  quietFrom: string;
  quietTo: string;
  overdueBreaksQuiet: boolean;
  digestHour: string;
}

export function toReminderFormValues(p: ReminderPreferences): ReminderFormValues {
  return {
    channels: { ...p.channels },
    quiet: p.quietHours !== null,
    quietFrom: String(p.quietHours?.from ?? 22),
    quietTo: String(p.quietHours?.to ?? 7),
    overdueBreaksQuiet: p.overdueBreaksQuiet,
    digestHour: p.digestHour === null ? '' : String(p.digestHour),
  };
}

export function toReminderRequest(v: ReminderFormValues): UpdateReminderPreferencesRequest {
  return {
    channels: Object.fromEntries(NOTIFICATION_KINDS.map((k) => [k, v.channels[k]])),
    quietHours: v.quiet ? { from: Number(v.quietFrom), to: Number(v.quietTo) } : null,
    overdueBreaksQuiet: v.overdueBreaksQuiet,
    digestHour: v.digestHour === '' ? null : Number(v.digestHour),
  };
}

/** "07:00" for 7: the hour as the user's clock shows it. */
export const hourLabel = (h: number) => `${String(h).padStart(2, '0')}:00`;
