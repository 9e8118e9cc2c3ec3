import { Alert, Box, Button, Group, Select, Stack, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { useRef, useState } from 'react';
import { NumberField } from '@/components/fields/number-field';
import { TextField } from '@/components/fields/text-field';
import { checkText } from '@/components/fields/text-rule';
import { checkNumber, readNumber } from '@/components/fields/typed-number';
import { PullConfirmation } from './pull-confirmation';
import {
  BROOD_STAGES,
  HUMIDITY_LIMITS,
  TEMPERATURE_LIMITS_C,
  TEXT_LIMITS,
  celsiusToFahrenheit,
  fahrenheitToCelsius,
  type BroodStage,
  type CareLogRequest,
  type SacResponse,
  type TemperatureUnit,
} from '@broodsilk/shared';
import { formatInstant } from '@/lib/dates';
import { isApiError } from '@/lib/api-error';
import { useAddCareLogEntry } from '../api/care-log';
import { usePullSac } from '../api/sacs';
import { bandFlag, broodLabel, midSentence, rangeText, readingAlertText, ROLL_TEXT } from '../utils/sac-view';
import classes from './incubator-entry.module.css';
import { useWords } from '@/lib/i18n';
import { formatTemperature } from '@/lib/numbers';

/** What a log action saved, for the sentence that confirms it. */
type LoggedWhat = 'temperature' | 'humidity' | 'both' | 'check' | 'note' | 'stage' | 'roll';

interface IncubatorEntryProps {
  sac: SacResponse;
  timeZone: string;
  temperatureUnit: TemperatureUnit;
  /** Cautions of the species (urticating hairs, venom) in words, shown under the heat-source caution. */
  speciesCautions?: string[];
  /** What the sac is, e.g. the project title. */
  title?: string;
}

/**
 * The one-handed screen at the incubator: the next roll due at the top, readings and notes in the
 * middle, the big "Rolled now" at the bottom where the thumb is.
 */
export function IncubatorEntry({ sac, timeZone, temperatureUnit, speciesCautions = [], title }: IncubatorEntryProps) {
  const t = useWords();
  const stageOptions = BROOD_STAGES.map((s) => ({ value: s, label: broodLabel(s) }));
  const add = useAddCareLogEntry(sac.id);
  const pullSac = usePullSac(sac.id);
  const [done, setDone] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [temperature, setTemperature] = useState('');
  const [humidity, setHumidity] = useState('');
  const [pullOpen, pull] = useDisclosure(false);
  const [note, setNote] = useState('');
  const [stage, setStage] = useState<string | null>(null);

  // Only the latest action may report: a slow answer must not overwrite a newer one.
  const latest = useRef(0);
  async function run(action: () => Promise<string>, failure: string): Promise<boolean> {
    const mine = ++latest.current;
    setError(null);
    setDone(null);
    try {
      const message = await action();
      if (mine === latest.current) setDone(message);
      return true;
    } catch (e) {
      if (mine === latest.current) setError(isApiError(e) ? e.message : failure);
      return false;
    }
  }

  const send = (entries: CareLogRequest[], what: LoggedWhat) =>
    run(async () => {
      let last: { at: string } | undefined;
      const flags: string[] = [];
      for (const entry of entries) {
        const saved = await add.mutateAsync(entry);
        const flag = bandFlag(saved.outsideBand);
        if (flag && saved.outsideBand) flags.push(t(`page.sacs.entry.flag.${saved.kind === 'temperature' ? 'temperature' : 'humidity'}.${saved.outsideBand}`));
        last = saved;
      }
      // A reading outside the band is kept, and said so at once.
      const values = { what: t(`page.sacs.entry.what.${what}`), at: last ? formatInstant(last.at, timeZone) : '', flags: flags.join(', ') };
      return t(`page.sacs.entry.${last ? 'loggedAt' : 'logged'}${flags.length ? 'Flags' : ''}`, values);
    }, t('page.sacs.entry.notSaved'));

  const limits =
    temperatureUnit === 'F' ? { min: celsiusToFahrenheit(TEMPERATURE_LIMITS_C.min), max: celsiusToFahrenheit(TEMPERATURE_LIMITS_C.max) } : TEMPERATURE_LIMITS_C;
  const temperatureError = checkNumber(temperature, { ...limits, decimals: 1 });
  const humidityError = checkNumber(humidity, { ...HUMIDITY_LIMITS, decimals: 0 });
  const noteError = checkText(note, { maxLength: TEXT_LIMITS.note });

  async function saveReadings() {
    if (temperatureError || humidityError) {
      setError(t('page.sacs.entry.correctFirst'));
      return;
    }
    const entries: CareLogRequest[] = [];
    const typedT = readNumber(temperature);
    const h = readNumber(humidity);
    if (typedT !== null) entries.push({ kind: 'temperature', temperature: { value: typedT, unit: temperatureUnit } });
    if (h !== null) entries.push({ kind: 'humidity', humidityPercent: h });
    if (entries.length === 0) {
      setError(t('page.sacs.entry.enterFirst'));
      return;
    }
    if (await send(entries, entries.length === 2 ? 'both' : entries[0]!.kind === 'temperature' ? 'temperature' : 'humidity')) {
      setTemperature('');
      setHumidity('');
    }
  }

  const roll = sac.roll;
  const rollText = roll ? ROLL_TEXT[roll.status] : null;
  const tempValue = temperatureError ? null : readNumber(temperature);
  const tempHint = tempValue !== null && temperatureUnit === 'F' ? formatTemperature(fahrenheitToCelsius(tempValue), 'C') : null;

  return (
    <Stack gap="md" className={classes.screen}>
      <Stack gap={2}>
        {title && (
          <Text fw={700} size="lg">
            {title}
          </Text>
        )}
        <Text size="sm" c="dimmed">
          {t('page.sacs.incubator.dayStage', { day: sac.dayNumber, stage: broodLabel(sac.broodStage) })}
        </Text>
        {roll && rollText ? (
          <Box data-testid="next-roll">
            <Text size="xl" fw={800} className={rollText.tone}>
              {rollText.label}
            </Text>
            <Text size="md">{t('page.sacs.overview.due', { due: formatInstant(roll.due, timeZone) })}</Text>
            {roll.lastRollAt && (
              <Text size="sm" c="dimmed">
                {t('page.sacs.entry.lastRoll', { at: formatInstant(roll.lastRollAt, timeZone) })}
              </Text>
            )}
          </Box>
        ) : (
          <Text size="md" c="dimmed" data-testid="next-roll">
            {!sac.pulled
              ? t('page.sacs.entry.noRollsWithMother')
              : sac.rollingOff
                ? t('page.sacs.entry.noRollsOff')
                : t('page.sacs.entry.noMoreRolls', { stage: midSentence(broodLabel(sac.rollingStopsAt)) })}
          </Text>
        )}
        {sac.container && (
          <Text size="sm" c="dimmed">
            {t('page.sacs.entry.inContainer', { container: sac.container })}
          </Text>
        )}
        {sac.readingAlerts.map((a) => (
          <Text key={a.kind} size="sm" fw={700} className="tone-failed" data-testid="reading-alert">
            {readingAlertText(a, sac.band, temperatureUnit)}
          </Text>
        ))}
      </Stack>

      <Alert color="amber" variant="light" title={t('page.sacs.entry.heatSources')} data-testid="heat-caution" role="note">
        <Text size="sm">{sac.incubatorCaution ?? t('safety.heatSource')}</Text>
        {speciesCautions.map((c) => (
          <Text size="sm" mt={4} key={c} fw={600}>
            {c}
          </Text>
        ))}
      </Alert>

      <Group grow align="flex-end">
        <NumberField
          label={t('page.sacs.entry.temperature', { unit: temperatureUnit })}
          size="lg"
          value={temperature}
          onChange={(e) => setTemperature(e.currentTarget.value)}
          description={
            tempHint
              ? t('page.sacs.entry.bandWithHint', { hint: tempHint, range: rangeText('temperature', sac.band.temperatureC, temperatureUnit) })
              : t('page.sacs.entry.band', { range: rangeText('temperature', sac.band.temperatureC, temperatureUnit) })
          }
          error={temperatureError}
        />
        <NumberField
          label={t('page.sacs.entry.humidity')}
          size="lg"
          whole
          value={humidity}
          onChange={(e) => setHumidity(e.currentTarget.value)}
          error={humidityError}
          description={t('page.sacs.entry.band', { range: rangeText('humidity', sac.band.humidityPercent, temperatureUnit) })}
        />
      </Group>
      <Button size="lg" variant="light" onClick={saveReadings} loading={add.isPending} disabled={add.isPending}>
        {t('page.sacs.entry.saveReadings')}
      </Button>

      <Group grow align="flex-end">
        <TextField
          label={t('page.sacs.entry.note')}
          size="lg"
          maxLength={TEXT_LIMITS.note}
          value={note}
          onChange={(e) => setNote(e.currentTarget.value)}
          error={noteError}
          placeholder={t('page.sacs.entry.notePlaceholder')}
        />
      </Group>
      <Group grow>
        <Button size="lg" variant="default" onClick={() => send([{ kind: 'check' }], 'check')} loading={add.isPending}>
          {t('page.sacs.entry.checked')}
        </Button>
        <Button
          size="lg"
          variant="default"
          disabled={!note.trim() || !!noteError || add.isPending}
          onClick={async () => {
            if (await send([{ kind: 'note', text: note.trim() }], 'note')) setNote('');
          }}
        >
          {t('page.sacs.entry.addNote')}
        </Button>
      </Group>
      <Group grow align="flex-end">
        <Select
          label={t('page.sacs.entry.stageNow')}
          description={t('page.sacs.entry.stageNowHint')}
          size="lg"
          data={stageOptions}
          value={stage}
          onChange={setStage}
          placeholder={broodLabel(sac.broodStage)}
        />
        <Button
          size="lg"
          variant="default"
          disabled={!stage}
          onClick={() => send([{ kind: 'stage', stage: stage as BroodStage }], 'stage')}
          loading={add.isPending}
        >
          {t('page.sacs.entry.setStage')}
        </Button>
      </Group>

      <Box className={classes.thumbZone}>
        {error && (
          <Alert color="clay" role="alert" mb="xs">
            {error}
          </Alert>
        )}
        {done && (
          <Text className="tone-ok" fw={600} mb="xs" role="status" data-testid="entry-done">
            {done}
          </Text>
        )}
        {!sac.pulled && sac.outcome === 'in-progress' ? (
          // Offered only where the server will take it (sac.may, the server's own rule).
          sac.may.pullAndOpen ? (
            <Button fullWidth size="xl" h={76} fz={22} loading={pullSac.isPending} onClick={pull.open}>
              {t('page.sacs.entry.pulledInto')}
            </Button>
          ) : (
            <Text c="dimmed" data-testid="pull-not-mine">
              {t('page.sacs.entry.pullNotMine')}
            </Text>
          )
        ) : (
          <Button
            fullWidth
            size="xl"
            h={76}
            fz={24}
            onClick={() => send([{ kind: 'roll' }], 'roll')}
            loading={add.isPending}
            disabled={!roll}
            data-testid="rolled-now"
          >
            {t('page.sacs.entry.rolledNow')}
          </Button>
        )}
      </Box>
      {pullOpen && (
        <PullConfirmation
          opened
          onClose={pull.close}
          sac={sac}
          timeZone={timeZone}
          pending={pullSac.isPending}
          onConfirm={async (pulledAt) => {
            pull.close();
            await run(async () => {
              await pullSac.mutateAsync({ pulledAt });
              return t('page.sacs.entry.pulledDone');
            }, t('page.sacs.overview.pullNotSaved'));
          }}
        />
      )}
    </Stack>
  );
}
