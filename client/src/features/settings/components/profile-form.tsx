import { SegmentedControl, Select, Stack, Text } from '@mantine/core';
import { TextField } from '@/components/fields/text-field';
import { TimeZoneField } from '@/components/fields/time-zone-field';
import { textRule } from '@/components/fields/text-rule';
import { FormActions } from '@/components/ui/form-actions';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { LANGUAGES, STAGE_NUMBERINGS, TEMPERATURE_UNITS, TEXT_LIMITS, type Me } from '@broodsilk/shared';
import { applyServerErrors } from '@/lib/form-errors';
import { useWords } from '@/lib/i18n';
import { useUpdateProfile } from '../api/profile';
import { toProfileRequest, toProfileValues } from '../utils/profile-form-values';

/** Name, zone, language, temperature unit and stage numbering: how every page speaks to this user. */
export function ProfileForm({ me }: { me: Me }) {
  const t = useWords();
  const update = useUpdateProfile();
  const form = useForm({
    mode: 'uncontrolled',
    initialValues: toProfileValues(me),
    validate: { displayName: textRule({ required: t('page.settings.profile.displayNameRequired'), maxLength: TEXT_LIMITS.displayName }) },
  });
  return (
    <form
      onSubmit={form.onSubmit((values) =>
        update.mutate(toProfileRequest(values), {
          // said in the language just chosen, since the page switches with it
          onSuccess: (saved) => notifications.show({ color: 'moss', message: t('page.settings.profile.saved', { lng: saved.language }) }),
          onError: (e) => notifications.show({ color: 'clay', message: applyServerErrors(form, e) }),
        }),
      )}
    >
      <Stack maw={480}>
        <TextField
          label={t('page.settings.profile.displayName')}
          maxLength={TEXT_LIMITS.displayName}
          withAsterisk
          key={form.key('displayName')}
          {...form.getInputProps('displayName')}
        />
        <TimeZoneField
          current={me.timeZone}
          description={t('page.settings.profile.timeZoneHint')}
          key={form.key('timeZone')}
          {...form.getInputProps('timeZone')}
        />
        <Select
          label={t('page.settings.profile.language')}
          description={t('page.settings.profile.languageHint')}
          data={LANGUAGES.map((l) => ({ value: l, label: t(`language.${l}`) }))}
          allowDeselect={false}
          key={form.key('language')}
          {...form.getInputProps('language')}
        />
        <div>
          <Text size="sm" fw={500} mb={4} id="temperature-unit-label">
            {t('page.settings.profile.temperatureUnit')}
          </Text>
          <SegmentedControl
            aria-labelledby="temperature-unit-label"
            data={TEMPERATURE_UNITS.map((u) => ({ label: t(`temperatureUnit.${u}`), value: u }))}
            key={form.key('temperatureUnit')}
            {...form.getInputProps('temperatureUnit')}
          />
        </div>
        <Select
          label={t('page.settings.profile.stageNumbering')}
          description={t('page.settings.profile.stageNumberingHint')}
          data={STAGE_NUMBERINGS.map((n) => ({ value: n, label: t(`stageNumbering.${n}`) }))}
          allowDeselect={false}
          key={form.key('stageNumbering')}
          {...form.getInputProps('stageNumbering')}
        />
        <FormActions message={null} loading={update.isPending} submitLabel={t('page.settings.profile.save')} />
      </Stack>
    </form>
  );
}
