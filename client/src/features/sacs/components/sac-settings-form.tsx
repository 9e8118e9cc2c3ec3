import { Group, SimpleGrid, Stack, Switch, Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { TEXT_LIMITS, formatTemperature, type SacResponse, type TemperatureUnit } from '@broodsilk/shared';
import { NumberField } from '@/components/fields/number-field';
import { TextField } from '@/components/fields/text-field';
import { textRule } from '@/components/fields/text-rule';
import { checkNumber } from '@/components/fields/typed-number';
import { FormActions } from '@/components/ui/form-actions';
import { applyServerErrors } from '@/lib/form-errors';
import { isApiError } from '@/lib/api-error';
import { useSetIncubatorRights, useUpdateSac } from '../api/sacs';
import { halfRange, SETTINGS_RULES, settingsRequest, settingsValuesOf, type SacSettingsValues } from '../utils/sac-settings-values';

/**
 * The keeper's settings for one sac: where it sits, its pull window and roll interval, and the
 * target band its readings are checked against (the usual band and its source shown beside it).
 * Band temperatures are in °C, as stored, so a typed value is kept exactly.
 */
export function SacSettingsForm({ sac, temperatureUnit }: { sac: SacResponse; temperatureUnit: TemperatureUnit }) {
  const update = useUpdateSac(sac.id);
  const [message, setMessage] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const form = useForm<SacSettingsValues>({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: settingsValuesOf(sac),
    validate: {
      container: textRule({ maxLength: TEXT_LIMITS.enclosure }),
      pullFromDay: (v, all) => checkNumber(v, SETTINGS_RULES.pullFromDay) ?? halfRange(v, all.pullToDay, 'pull window'),
      pullToDay: (v) => checkNumber(v, SETTINGS_RULES.pullToDay),
      rollIntervalHours: (v) => checkNumber(v, SETTINGS_RULES.rollIntervalHours),
      temperatureMin: (v, all) => checkNumber(v, SETTINGS_RULES.temperatureMin) ?? halfRange(v, all.temperatureMax, 'temperature band'),
      temperatureMax: (v) => checkNumber(v, SETTINGS_RULES.temperatureMax),
      humidityMin: (v, all) => checkNumber(v, SETTINGS_RULES.humidityMin) ?? halfRange(v, all.humidityMax, 'humidity band'),
      humidityMax: (v) => checkNumber(v, SETTINGS_RULES.humidityMax),
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
  const t = sac.band.temperatureC;
  const h = sac.band.humidityPercent;
  return (
    <form onSubmit={submit} noValidate aria-label="Incubation settings">
      <Stack gap="sm">
        <TextField
          label="Incubator or container"
          placeholder="e.g. Incubator B, top shelf"
          maxLength={TEXT_LIMITS.enclosure}
          key={form.key('container')}
          {...form.getInputProps('container')}
        />
        <SimpleGrid cols={{ base: 2, sm: 3 }}>
          <NumberField label="Pull window from day" whole key={form.key('pullFromDay')} {...form.getInputProps('pullFromDay')} />
          <NumberField label="Pull window to day" whole key={form.key('pullToDay')} {...form.getInputProps('pullToDay')} />
          <NumberField label="Hours between rolls" whole key={form.key('rollIntervalHours')} {...form.getInputProps('rollIntervalHours')} />
        </SimpleGrid>
        <Text size="xs" c="dimmed">
          Leave the pull days empty for the {sac.pullWindow.origin === 'species' ? "species'" : 'usual'} window.
        </Text>
        <SimpleGrid cols={{ base: 2, sm: 4 }}>
          <NumberField label="Lowest °C" key={form.key('temperatureMin')} {...form.getInputProps('temperatureMin')} />
          <NumberField label="Highest °C" key={form.key('temperatureMax')} {...form.getInputProps('temperatureMax')} />
          <NumberField label="Lowest humidity %" whole key={form.key('humidityMin')} {...form.getInputProps('humidityMin')} />
          <NumberField label="Highest humidity %" whole key={form.key('humidityMax')} {...form.getInputProps('humidityMax')} />
        </SimpleGrid>
        <Text size="xs" c="dimmed" data-testid="band-source">
          Band in force: {t.min}–{t.max} °C{temperatureUnit === 'F' && ` (${formatTemperature(t.min, 'F')} to ${formatTemperature(t.max, 'F')})`}, {h.min}–
          {h.max} % humidity
          {sac.band.origin === 'sac' ? ', set for this sac.' : `. ${sac.band.source}. Leave the band empty to keep it.`}
        </Text>
        <FormActions message={message} loading={update.isPending} submitLabel="Save settings" />
        {saved && (
          <Text size="sm" className="tone-ok" role="status">
            Settings saved.
          </Text>
        )}
      </Stack>
    </form>
  );
}

/** The owner's project-wide switch: caretakers may record the pull and the opening. */
export function IncubatorRightsSwitch({ sac }: { sac: SacResponse }) {
  const set = useSetIncubatorRights(sac.projectId);
  const [error, setError] = useState<string | null>(null);
  return (
    <Group>
      <Switch
        label="Caretakers may record the pull and the opening"
        description="For every sac of this project."
        checked={sac.caretakersMayPullAndOpen}
        disabled={set.isPending}
        onChange={async (e) => {
          setError(null);
          try {
            await set.mutateAsync({ caretakersMayPullAndOpen: e.currentTarget.checked });
          } catch (err) {
            setError(isApiError(err) ? err.message : 'Not saved. Try again.');
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
