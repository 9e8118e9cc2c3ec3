import { useState } from 'react';
import { Checkbox, Group, Select, Stack, Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { NOTIFICATION_KINDS, REMINDER_CHANNELS, REMINDER_HOURS, type ReminderPreferences } from '@broodsilk/shared';
import { FormActions } from '@/components/ui/form-actions';
import { applyServerErrors } from '@/lib/form-errors';
import { useUpdateReminderPreferences } from '../api/reminder-preferences';
import { hourLabel, toReminderFormValues, toReminderRequest } from '../utils/reminder-form-values';
import { useWords } from '@/lib/i18n';

const hourOptions = REMINDER_HOURS.map((h) => ({ value: String(h), label: hourLabel(h) }));

/** How each kind of reminder reaches the user, quiet hours and the daily digest. */
export function ReminderPreferencesForm({ preferences }: { preferences: ReminderPreferences }) {
  const t = useWords();
  const channelOptions = REMINDER_CHANNELS.map((c) => ({ value: c, label: t(`page.settings.reminders.channel.${c}`) }));
  const update = useUpdateReminderPreferences();
  const form = useForm({ mode: 'uncontrolled', initialValues: toReminderFormValues(preferences) });
  const [quiet, setQuiet] = useState(preferences.quietHours !== null);
  form.watch('quiet', ({ value }) => setQuiet(value));
  return (
    <form
      onSubmit={form.onSubmit((values) =>
        update.mutate(toReminderRequest(values), {
          onSuccess: () => notifications.show({ color: 'moss', message: t('page.settings.reminders.saved') }),
          onError: (e) => notifications.show({ color: 'clay', message: applyServerErrors(form, e) }),
        }),
      )}
    >
      <Stack maw={640}>
        <Text size="sm" c="dimmed">
          {t('page.settings.reminders.zone', { zone: preferences.timeZone })}
        </Text>
        {NOTIFICATION_KINDS.map((kind) => (
          <Select
            key={form.key(`channels.${kind}`)}
            label={t(`notificationKind.${kind}`)}
            data={channelOptions}
            allowDeselect={false}
            {...form.getInputProps(`channels.${kind}`)}
          />
        ))}
        <Checkbox label={t('page.settings.reminders.quiet')} key={form.key('quiet')} {...form.getInputProps('quiet', { type: 'checkbox' })} />
        {quiet && (
          <Group grow>
            <Select
              label={t('page.settings.reminders.from')}
              data={hourOptions}
              allowDeselect={false}
              key={form.key('quietFrom')}
              {...form.getInputProps('quietFrom')}
            />
            <Select
              label={t('page.settings.reminders.until')}
              data={hourOptions}
              allowDeselect={false}
              key={form.key('quietTo')}
              {...form.getInputProps('quietTo')}
            />
          </Group>
        )}
        <Checkbox
          label={t('page.settings.reminders.overdueBreaksQuiet')}
          description={t('page.settings.reminders.overdueBreaksQuietHint')}
          key={form.key('overdueBreaksQuiet')}
          {...form.getInputProps('overdueBreaksQuiet', { type: 'checkbox' })}
        />
        <Select
          label={t('page.settings.reminders.digest')}
          description={t('page.settings.reminders.digestHint')}
          data={[{ value: '', label: t('page.settings.reminders.noDigest') }, ...hourOptions]}
          allowDeselect={false}
          key={form.key('digestHour')}
          {...form.getInputProps('digestHour')}
        />
        <FormActions message={null} loading={update.isPending} submitLabel={t('page.settings.reminders.save')} />
      </Stack>
    </form>
  );
}
