import { describe, expect, it } from 'vitest';
import { NOTIFICATION_KINDS, type ReminderPreferences } from '@broodsilk/shared';
import { toReminderFormValues, toReminderRequest } from './reminder-form-values';

const prefs: ReminderPreferences = {
  channels: Object.fromEntries(NOTIFICATION_KINDS.map((k) => [k, 'both'])) as ReminderPreferences['channels'],
  quietHours: { from: 23, to: 6 },
  overdueBreaksQuiet: true,
  digestHour: 0,
  timeZone: 'Europe/Berlin',
};

describe('reminder form values', () => {
  it('round-trip the preferences exactly (hour 0 stays 0, not "none")', () => {
    const req = toReminderRequest(toReminderFormValues(prefs));
    expect(req).toEqual({ channels: prefs.channels, quietHours: { from: 23, to: 6 }, overdueBreaksQuiet: true, digestHour: 0 });
  });

  it('quiet hours off and no digest send null', () => {
    const v = { ...toReminderFormValues(prefs), quiet: false, digestHour: '' };
    expect(toReminderRequest(v)).toMatchObject({ quietHours: null, digestHour: null });
  });
});
