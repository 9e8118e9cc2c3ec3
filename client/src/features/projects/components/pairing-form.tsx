import { Select, Stack, Group, Text } from '@mantine/core';
import { TimeInput } from '@mantine/dates';
import '@mantine/dates/styles.css';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { PAIRING_OUTCOMES, TEXT_LIMITS, todayIn, type CreatePairingRequest, type PairingOutcome, type PairingResponse } from '@broodsilk/shared';
import { DateField } from '@/components/fields/date-field';
import { NumberField } from '@/components/fields/number-field';
import { TextAreaField, TextField } from '@/components/fields/text-field';
import { textRule } from '@/components/fields/text-rule';
import { dateRule, readDate } from '@/components/fields/typed-date';
import { numberRule, readNumber } from '@/components/fields/typed-number';
import { FormActions } from '@/components/ui/form-actions';
import { SafetyNote } from '@/components/ui/safety-note';
import { WarningConfirm, useWarnedSave } from '@/components/ui/warning-confirm';
import { dayjs } from '@/lib/dates';
import { applyServerErrors } from '@/lib/form-errors';
import { useRecordPairing } from '../api/pairings';
import { PAIRING_OUTCOME_LABELS } from '../utils/labels';

const outcomeOptions = PAIRING_OUTCOMES.map((o) => ({ value: o, label: PAIRING_OUTCOME_LABELS[o] }));

export interface MaleOption {
  value: string;
  label: string;
}

interface Values {
  maleId: string;
  on: string;
  time: string;
  durationMinutes: string;
  outcome: PairingOutcome;
  notes: string;
  reason: string;
}

interface PairingFormProps {
  projectId: string;
  timeZone: string;
  /** The project's males and the keeper's other mature males; the first is the default. */
  males: MaleOption[];
  /** Set to correct this pairing: the form starts from its values and asks why. */
  correcting?: PairingResponse;
  onDone: () => void;
}

/** The values a correction starts from: the recorded pairing, read in the keeper's zone. */
function startFrom(p: PairingResponse, timeZone: string): Omit<Values, 'reason'> {
  const at = dayjs(p.startedAt).tz(timeZone);
  return {
    maleId: p.male.id,
    on: p.on,
    time: at.format('HH:mm'),
    durationMinutes: String(p.durationMinutes),
    outcome: p.outcome,
    notes: p.notes ?? '',
  };
}

/** Records a pairing, or corrects one (a new row that strikes the old one, with a reason). */
export function PairingForm({ projectId, timeZone, males, correcting, onDone }: PairingFormProps) {
  const today = todayIn(timeZone, new Date());
  const record = useRecordPairing(projectId);
  const [message, setMessage] = useState<string | null>(null);
  const form = useForm<Values>({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: correcting
      ? { ...startFrom(correcting, timeZone), reason: '' }
      : { maleId: males[0]?.value ?? '', on: '', time: '20:00', durationMinutes: '20', outcome: 'connected', notes: '', reason: '' },
    validate: {
      maleId: (v) => (v ? null : 'Which male went in?'),
      on: dateRule({ required: 'On which day was the male put in?', latest: today, latestMessage: 'A pairing that has happened cannot be in the future.' }),
      time: (v) => (/^\d{2}:\d{2}$/.test(v) ? null : 'The time as HH:MM.'),
      durationMinutes: numberRule({
        required: 'How many minutes?',
        min: 1,
        max: 20_160,
        decimals: 0,
        rangeMessage: 'From 1 minute to 14 days (20160 minutes).',
      }),
      notes: textRule({ maxLength: TEXT_LIMITS.note }),
      reason: correcting ? textRule({ required: 'Say briefly why the recorded pairing was wrong.', maxLength: TEXT_LIMITS.correctionReason }) : () => null,
    },
  });

  const warned = useWarnedSave(
    (body: CreatePairingRequest) => record.mutateAsync(body),
    () => {
      form.reset();
      onDone();
    },
    (e) => setMessage(applyServerErrors(form, e)),
  );
  const submit = form.onSubmit((v) => {
    setMessage(null);
    // Day and wall-clock time are read in the keeper's own zone.
    const startedAt = dayjs.tz(`${readDate(v.on)}T${v.time}`, timeZone).toISOString();
    return warned.save({
      startedAt,
      maleId: v.maleId,
      durationMinutes: readNumber(v.durationMinutes)!,
      outcome: v.outcome,
      notes: v.notes.trim() || null,
      ...(correcting ? { corrects: correcting.id, reason: v.reason.trim() } : {}),
    });
  });

  return (
    <form onSubmit={submit} noValidate data-testid={correcting ? 'pairing-correction-form' : 'pairing-form'}>
      <Stack maw={480}>
        {correcting && <Text size="sm">The recorded pairing stays in the list, struck through; this one counts in its place.</Text>}
        <Select label="Male" data={males} allowDeselect={false} key={form.key('maleId')} {...form.getInputProps('maleId')} />
        <Group grow align="flex-start">
          <DateField label="Day the male went in" withAsterisk key={form.key('on')} {...form.getInputProps('on')} />
          <TimeInput label="At" key={form.key('time')} {...form.getInputProps('time')} />
        </Group>
        <NumberField label="How long (minutes)" whole key={form.key('durationMinutes')} {...form.getInputProps('durationMinutes')} />
        <Select label="Outcome" data={outcomeOptions} allowDeselect={false} key={form.key('outcome')} {...form.getInputProps('outcome')} />
        <TextAreaField label="Notes" maxLength={TEXT_LIMITS.note} key={form.key('notes')} {...form.getInputProps('notes')} />
        {correcting && (
          <TextField
            label="Why the recorded pairing was wrong"
            withAsterisk
            maxLength={TEXT_LIMITS.correctionReason}
            key={form.key('reason')}
            {...form.getInputProps('reason')}
          />
        )}
        {warned.warnings && <WarningConfirm warnings={warned.warnings} loading={record.isPending} onConfirm={warned.confirm} onCancel={warned.cancel} />}
        <SafetyNote text="pairing" />
        <FormActions message={message} loading={record.isPending} submitLabel={correcting ? 'Save correction' : 'Save pairing'} onCancel={onDone} />
      </Stack>
    </form>
  );
}
