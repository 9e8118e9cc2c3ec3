import { useState } from 'react';
import { Checkbox, Group, Select, Stack, Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { label, NOTIFICATION_KINDS, REMINDER_CHANNELS, REMINDER_HOURS, type ReminderPreferences } from '@broodsilk/shared';
import { words } from '@/lib/i18n';
import { FormActions } from '@/components/ui/form-actions';
import { applyServerErrors } from '@/lib/form-errors';
import { useUpdateReminderPreferences } from '../api/reminder-preferences';
import { hourLabel, toReminderFormValues, toReminderRequest } from '../utils/reminder-form-values';

const hourOptions = REMINDER_HOURS.map((h) => ({ value: String(h), label: hourLabel(h) }));

/** How each kind of reminder reaches the user, quiet hours and the daily digest. */
export function ReminderPreferencesForm({ preferences }: { preferences: ReminderPreferences }) {
  const update = useUpdateReminderPreferences();
  const channelOptions = REMINDER_CHANNELS.map((c) => ({ value: c, label: label(words, 'reminderChannel', c) }));
  const form = useForm({ mode: 'uncontrolled', initialValues: toReminderFormValues(preferences) });
  const [quiet, setQuiet] = useState(preferences.quietHours !== null);
  form.watch('quiet', ({ value }) => setQuiet(value));
  return (
    <form
      onSubmit={form.onSubmit((values) =>
        update.mutate(toReminderRequest(values), {
          onSuccess: () => notifications.show({ color: 'moss', message: 'Reminder settings saved.' }),
          onError: (e) => notifications.show({ color: 'clay', message: applyServerErrors(form, e) }),
        }),
      )}
    >
      <Stack maw={640}>
        <Text size="sm" c="dimmed">
          Times in reminders are shown in your zone, {preferences.timeZone} (change it above).
        </Text>
        {NOTIFICATION_KINDS.map((kind) => (
          <Select
            key={form.key(`channels.${kind}`)}
            label={label(words, 'notificationKind', kind)}
            data={channelOptions}
            allowDeselect={false}
            {...form.getInputProps(`channels.${kind}`)}
          />
        ))}
        <Checkbox label="Quiet hours: hold reminders until they end" key={form.key('quiet')} {...form.getInputProps('quiet', { type: 'checkbox' })} />
        {quiet && (
          <Group grow>
            <Select label="From" data={hourOptions} allowDeselect={false} key={form.key('quietFrom')} {...form.getInputProps('quietFrom')} />
            <Select label="Until" data={hourOptions} allowDeselect={false} key={form.key('quietTo')} {...form.getInputProps('quietTo')} />
          </Group>
        )}
        <Checkbox
          label="An overdue roll may break the quiet hours"
          description="An incubating sac does not wait for morning."
          key={form.key('overdueBreaksQuiet')}
          {...form.getInputProps('overdueBreaksQuiet', { type: 'checkbox' })}
        />
        <Select
          label="Daily digest"
          description="What is planned for the next 24 hours, at this hour."
          data={[{ value: '', label: 'No digest' }, ...hourOptions]}
          allowDeselect={false}
          key={form.key('digestHour')}
          {...form.getInputProps('digestHour')}
        />
        <FormActions message={null} loading={update.isPending} submitLabel="Save reminder settings" />
      </Stack>
    </form>
  );
}
