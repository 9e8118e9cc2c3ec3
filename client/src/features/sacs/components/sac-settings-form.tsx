import { Group, SimpleGrid, Stack, Switch, Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { TEXT_LIMITS, type SacResponse, type TemperatureUnit } from '@broodsilk/shared';
import { formatTemperature } from '@/lib/numbers';
import { NumberField } from '@/components/fields/number-field';
import { TextField } from '@/components/fields/text-field';
import { textRule } from '@/components/fields/text-rule';
import { checkNumber } from '@/components/fields/typed-number';
import { FormActions } from '@/components/ui/form-actions';
import { applyServerErrors } from '@/lib/form-errors';
import { isApiError } from '@/lib/api-error';
import { useSetIncubatorRights, useUpdateSac } from '../api/sacs';
import { useWords } from '@/lib/i18n';
import { halfRange, settingsRules, settingsRequest, settingsValuesOf, type SacSettingsValues } from '../utils/sac-settings-values';

/**
 * The keeper's settings for one sac: where it sits, its pull window and roll interval, and the
 * target band its readings are checked against (the usual band and its source shown beside it).
 * Band temperatures are in °C, as stored, so a typed value is kept exactly.
 */
export function SacSettingsForm({ sac, temperatureUnit }: { sac: SacResponse; temperatureUnit: TemperatureUnit }) {
  const t = useWords();
  const rules = settingsRules(t);
  const update = useUpdateSac(sac.id);
  const [message, setMessage] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const form = useForm<SacSettingsValues>({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: settingsValuesOf(sac),
    validate: {
      container: textRule({ maxLength: TEXT_LIMITS.enclosure }),
      pullFromDay: (v, all) => checkNumber(v, rules.pullFromDay) ?? halfRange(t, v, all.pullToDay, 'pullWindow'),
      pullToDay: (v) => checkNumber(v, rules.pullToDay),
      rollIntervalHours: (v) => checkNumber(v, rules.rollIntervalHours),
      temperatureMin: (v, all) => checkNumber(v, rules.temperatureMin) ?? halfRange(t, v, all.temperatureMax, 'temperature'),
      temperatureMax: (v) => checkNumber(v, rules.temperatureMax),
      humidityMin: (v, all) => checkNumber(v, rules.humidityMin) ?? halfRange(t, v, all.humidityMax, 'humidity'),
      humidityMax: (v) => checkNumber(v, rules.humidityMax),
    },
  });
  const submit = form.onSubmit(async (v) => {
    setMessage(null);
    setSaved(false);
    try {
      const next = await update.mutateAsync(settingsRequest(v));
      form.setValues(settingsValuesOf(next));
      form.resetDirty();
      setSaved(true);
    } catch (e) {
      setMessage(applyServerErrors(form, e));
    }
  });
  const c = sac.band.temperatureC;
  const h = sac.band.humidityPercent;
  const temperature =
    temperatureUnit === 'F'
      ? t('page.sacs.settings.temperatureCF', { min: c.min, max: c.max, fMin: formatTemperature(c.min, 'F'), fMax: formatTemperature(c.max, 'F') })
      : t('page.sacs.settings.temperatureC', { min: c.min, max: c.max });
  const band = { temperature, hMin: h.min, hMax: h.max, source: sac.band.source };
  return (
    <form onSubmit={submit} noValidate aria-label={t('page.sacs.page.settings')}>
      <Stack gap="sm">
        <TextField
          label={t('page.sacs.settings.container')}
          placeholder={t('page.sacs.settings.containerPlaceholder')}
          maxLength={TEXT_LIMITS.enclosure}
          key={form.key('container')}
          {...form.getInputProps('container')}
        />
        <SimpleGrid cols={{ base: 2, sm: 3 }}>
          <NumberField label={t('page.sacs.settings.pullFrom')} whole key={form.key('pullFromDay')} {...form.getInputProps('pullFromDay')} />
          <NumberField label={t('page.sacs.settings.pullTo')} whole key={form.key('pullToDay')} {...form.getInputProps('pullToDay')} />
          <NumberField label={t('page.sacs.settings.rollHours')} whole key={form.key('rollIntervalHours')} {...form.getInputProps('rollIntervalHours')} />
        </SimpleGrid>
        <Text size="xs" c="dimmed">
          {sac.pullWindow.origin === 'species' ? t('page.sacs.settings.emptyPullSpecies') : t('page.sacs.settings.emptyPullUsual')}
        </Text>
        <SimpleGrid cols={{ base: 2, sm: 4 }}>
          <NumberField label={t('page.sacs.settings.temperatureMin')} key={form.key('temperatureMin')} {...form.getInputProps('temperatureMin')} />
          <NumberField label={t('page.sacs.settings.temperatureMax')} key={form.key('temperatureMax')} {...form.getInputProps('temperatureMax')} />
          <NumberField label={t('page.sacs.settings.humidityMin')} whole key={form.key('humidityMin')} {...form.getInputProps('humidityMin')} />
          <NumberField label={t('page.sacs.settings.humidityMax')} whole key={form.key('humidityMax')} {...form.getInputProps('humidityMax')} />
        </SimpleGrid>
        <Text size="xs" c="dimmed" data-testid="band-source">
          {sac.band.origin === 'sac' ? t('page.sacs.settings.bandSac', band) : t('page.sacs.settings.bandDefault', band)}
        </Text>
        <FormActions message={message} loading={update.isPending} submitLabel={t('page.sacs.settings.save')} />
        {saved && (
          <Text size="sm" className="tone-ok" role="status">
            {t('page.sacs.settings.saved')}
          </Text>
        )}
      </Stack>
    </form>
  );
}

/** The owner's project-wide switch: caretakers may record the pull and the opening. */
export function IncubatorRightsSwitch({ sac }: { sac: SacResponse }) {
  const t = useWords();
  const set = useSetIncubatorRights(sac.projectId);
  const [error, setError] = useState<string | null>(null);
  return (
    <Group>
      <Switch
        label={t('page.sacs.settings.caretakers')}
        description={t('page.sacs.settings.caretakersHint')}
        checked={sac.caretakersMayPullAndOpen}
        disabled={set.isPending}
        onChange={async (e) => {
          setError(null);
          try {
            await set.mutateAsync({ caretakersMayPullAndOpen: e.currentTarget.checked });
          } catch (err) {
            setError(isApiError(err) ? err.message : t('page.sacs.notSaved'));
          }
        }}
      />
      {error && (
        <Text size="sm" className="tone-failed" role="alert">
          {error}
        </Text>
      )}
    </Group>
  );
}
