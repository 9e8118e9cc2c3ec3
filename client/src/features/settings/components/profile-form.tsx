import { SegmentedControl, Stack, Text } from '@mantine/core';
import { TextField } from '@/components/fields/text-field';
import { TimeZoneField } from '@/components/fields/time-zone-field';
import { textRule } from '@/components/fields/text-rule';
import { FormActions } from '@/components/ui/form-actions';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { TEXT_LIMITS, type Me, type TemperatureUnit } from '@broodsilk/shared';
import { applyServerErrors } from '@/lib/form-errors';
import { useUpdateProfile } from '../api/profile';

export function ProfileForm({ me }: { me: Me }) {
  const update = useUpdateProfile();
  const form = useForm({
    mode: 'uncontrolled',
    initialValues: { displayName: me.displayName, timeZone: me.timeZone, temperatureUnit: me.temperatureUnit as TemperatureUnit },
    validate: { displayName: textRule({ required: 'Give the name to show to your partners.', maxLength: TEXT_LIMITS.displayName }) },
  });
  return (
    <form
      onSubmit={form.onSubmit((values) =>
        update.mutate(values, {
          onSuccess: () => notifications.show({ color: 'moss', message: 'Settings saved.' }),
          onError: (e) => notifications.show({ color: 'clay', message: applyServerErrors(form, e) }),
        }),
      )}
    >
      <Stack maw={480}>
        <TextField label="Display name" maxLength={TEXT_LIMITS.displayName} withAsterisk key={form.key('displayName')} {...form.getInputProps('displayName')} />
        <TimeZoneField
          current={me.timeZone}
          description="Dates, day numbers and what is due today follow this zone."
          key={form.key('timeZone')}
          {...form.getInputProps('timeZone')}
        />
        <div>
          <Text size="sm" fw={500} mb={4}>
            Temperature unit
          </Text>
          <SegmentedControl
            data={[
              { label: '°C', value: 'C' },
              { label: '°F', value: 'F' },
            ]}
            key={form.key('temperatureUnit')}
            {...form.getInputProps('temperatureUnit')}
          />
        </div>
        <FormActions message={null} loading={update.isPending} submitLabel="Save settings" />
      </Stack>
    </form>
  );
}
