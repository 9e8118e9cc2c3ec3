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
  formatTemperature,
  type BroodStage,
  type CareLogRequest,
  type SacResponse,
  type TemperatureUnit,
} from '@broodsilk/shared';
import { formatInstant } from '@/lib/dates';
import { isApiError } from '@/lib/api-error';
import { useAddCareLogEntry } from '../api/care-log';
import { usePullSac } from '../api/sacs';
import { bandFlag, broodLabel, rangeText, readingAlertText, ROLL_TEXT } from '../utils/sac-view';
import classes from './incubator-entry.module.css';

interface IncubatorEntryProps {
  sac: SacResponse;
  timeZone: string;
  temperatureUnit: TemperatureUnit;
  /** Cautions of the species (urticating hairs, venom) in words, shown under the heat-source caution. */
  speciesCautions?: string[];
  /** What the sac is, e.g. the project title. */
  title?: string;
}

const stageOptions = BROOD_STAGES.map((s) => ({ value: s, label: broodLabel(s) }));

/**
 * The one-handed screen at the incubator: the next roll due at the top, readings and notes in the
 * middle, the big "Rolled now" at the bottom where the thumb is.
 */
export function IncubatorEntry({ sac, timeZone, temperatureUnit, speciesCautions = [], title }: IncubatorEntryProps) {
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

  const send = (entries: CareLogRequest[], what: string) =>
    run(async () => {
      let last: { at: string } | undefined;
      const flags: string[] = [];
      for (const entry of entries) {
        const saved = await add.mutateAsync(entry);
        const flag = bandFlag(saved.outsideBand);
        if (flag) flags.push(`${saved.kind === 'temperature' ? 'temperature' : 'humidity'} ${flag}`);
        last = saved;
      }
      // A reading outside the band is kept, and said so at once.
      return `${what} logged${last ? ` at ${formatInstant(last.at, timeZone)}` : ''}${flags.length ? `: ${flags.join(', ')}` : ''}.`;
    }, 'The entry was not saved. Try again.');

  const limits =
    temperatureUnit === 'F' ? { min: celsiusToFahrenheit(TEMPERATURE_LIMITS_C.min), max: celsiusToFahrenheit(TEMPERATURE_LIMITS_C.max) } : TEMPERATURE_LIMITS_C;
  const temperatureError = checkNumber(temperature, { ...limits, decimals: 1 });
  const humidityError = checkNumber(humidity, { ...HUMIDITY_LIMITS, decimals: 0 });
  const noteError = checkText(note, { maxLength: TEXT_LIMITS.note });

  async function saveReadings() {
    if (temperatureError || humidityError) {
      setError('Correct the reading marked above first.');
      return;
    }
    const entries: CareLogRequest[] = [];
    const t = readNumber(temperature);
    const h = readNumber(humidity);
    if (t !== null) entries.push({ kind: 'temperature', temperature: { value: t, unit: temperatureUnit } });
    if (h !== null) entries.push({ kind: 'humidity', humidityPercent: h });
    if (entries.length === 0) {
      setError('Enter a temperature or a humidity first.');
      return;
    }
    if (await send(entries, entries.length === 2 ? 'Temperature and humidity' : entries[0]!.kind === 'temperature' ? 'Temperature' : 'Humidity')) {
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
          Day {sac.dayNumber} · {broodLabel(sac.broodStage)}
        </Text>
        {roll && rollText ? (
          <Box data-testid="next-roll">
            <Text size="xl" fw={800} className={rollText.tone}>
              {rollText.label}
            </Text>
            <Text size="md">due {formatInstant(roll.due, timeZone)}</Text>
            {roll.lastRollAt && (
              <Text size="sm" c="dimmed">
                last roll {formatInstant(roll.lastRollAt, timeZone)}
              </Text>
            )}
          </Box>
        ) : (
          <Text size="md" c="dimmed" data-testid="next-roll">
            {!sac.pulled
              ? 'No rolls for this sac (still with the mother).'
              : sac.rollingOff
                ? 'No rolls for this sac (rolling is off); checks and readings go on.'
                : `No more rolls: ${broodLabel(sac.rollingStopsAt).toLowerCase()} reached; checks and readings go on.`}
          </Text>
        )}
        {sac.container && (
          <Text size="sm" c="dimmed">
            In {sac.container}
          </Text>
        )}
        {sac.readingAlerts.map((a) => (
          <Text key={a.kind} size="sm" fw={700} className="tone-failed" data-testid="reading-alert">
            {readingAlertText(a, sac.band, temperatureUnit)}
          </Text>
        ))}
      </Stack>

      <Alert color="amber" variant="light" title="Heat sources" data-testid="heat-caution" role="note">
        <Text size="sm">
          {sac.incubatorCaution ??
            'Heat only behind a thermostat, away from bedding and cables, and never left running unattended without checks: unregulated heat can cook eggs and start fires. Local law and licensed practice come first.'}
        </Text>
        {speciesCautions.map((c) => (
          <Text size="sm" mt={4} key={c} fw={600}>
            {c}
          </Text>
        ))}
      </Alert>

      <Group grow align="flex-end">
        <NumberField
          label={`Temperature (°${temperatureUnit})`}
          size="lg"
          value={temperature}
          onChange={(e) => setTemperature(e.currentTarget.value)}
          description={`${tempHint ? `= ${tempHint} · ` : ''}band ${rangeText('temperature', sac.band.temperatureC, temperatureUnit)}`}
          error={temperatureError}
        />
        <NumberField
          label="Humidity (%)"
          size="lg"
          whole
          value={humidity}
          onChange={(e) => setHumidity(e.currentTarget.value)}
          error={humidityError}
          description={`band ${rangeText('humidity', sac.band.humidityPercent, temperatureUnit)}`}
        />
      </Group>
      <Button size="lg" variant="light" onClick={saveReadings} loading={add.isPending} disabled={add.isPending}>
        Save readings
      </Button>

      <Group grow align="flex-end">
        <TextField
          label="Note"
          size="lg"
          maxLength={TEXT_LIMITS.note}
          value={note}
          onChange={(e) => setNote(e.currentTarget.value)}
          error={noteError}
          placeholder="e.g. a little condensation"
        />
      </Group>
      <Group grow>
        <Button size="lg" variant="default" onClick={() => send([{ kind: 'check' }], 'Check')} loading={add.isPending}>
          Checked, all well
        </Button>
        <Button
          size="lg"
          variant="default"
          disabled={!note.trim() || !!noteError || add.isPending}
          onClick={async () => {
            if (await send([{ kind: 'note', text: note.trim() }], 'Note')) setNote('');
          }}
        >
          Add note
        </Button>
      </Group>
      <Group grow align="flex-end">
        <Select
          label="Stage now"
          description="The sac's one stage, also named by brood counts"
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
          onClick={() => send([{ kind: 'stage', stage: stage as BroodStage }], 'Stage')}
          loading={add.isPending}
        >
          Set stage
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
              Pulled, into the incubator
            </Button>
          ) : (
            <Text c="dimmed" data-testid="pull-not-mine">
              The keeper records the pull of this sac.
            </Text>
          )
        ) : (
          <Button
            fullWidth
            size="xl"
            h={76}
            fz={24}
            onClick={() => send([{ kind: 'roll' }], 'Roll')}
            loading={add.isPending}
            disabled={!roll}
            data-testid="rolled-now"
          >
            Rolled now
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
              return 'Pulled: the first roll is counted from the pull.';
            }, 'The pull was not saved. Try again.');
          }}
        />
      )}
    </Stack>
  );
}
