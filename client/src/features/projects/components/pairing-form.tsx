import { Select, Stack, Group, Text } from '@mantine/core';
import { TimeInput } from '@mantine/dates';
import '@mantine/dates/styles.css';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { label, PAIRING_OUTCOMES, TEXT_LIMITS, todayIn, type CreatePairingRequest, type PairingOutcome, type PairingResponse } from '@broodsilk/shared';
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
import { useWords } from '@/lib/i18n';
import { useRecordPairing } from '../api/pairings';
import { PAIRING_OUTCOME_LABELS } from '../utils/labels';

// A function, not a constant: the words follow the reader's language.
const outcomeOptions = () => PAIRING_OUTCOMES.map((o) => ({ value: o, label: PAIRING_OUTCOME_LABELS[o] }));

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
  const t = useWords();
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
      maleId: (v) => (v ? null : t('page.projects.pairing.maleRequired')),
      on: dateRule({
        required: t('page.projects.pairing.onRequired'),
        latest: today,
        latestMessage: t('page.projects.pairing.onFuture'),
      }),
      time: (v) => (/^\d{2}:\d{2}$/.test(v) ? null : t('page.shell.fields.timeAsHhMm')),
      durationMinutes: numberRule({
        required: t('page.projects.pairing.minutesRequired'),
        min: 1,
        max: 20_160,
        decimals: 0,
        rangeMessage: t('page.projects.pairing.minutesRange'),
      }),
      notes: textRule({ maxLength: TEXT_LIMITS.note }),
      reason: correcting ? textRule({ required: t('page.projects.pairing.reasonRequired'), maxLength: TEXT_LIMITS.correctionReason }) : () => null,
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
        {correcting && <Text size="sm">{t('page.projects.pairing.replaces')}</Text>}
        <Select label={label(t, 'sex', 'male')} data={males} allowDeselect={false} key={form.key('maleId')} {...form.getInputProps('maleId')} />
        <Group grow align="flex-start">
          <DateField label={t('page.projects.pairing.on')} withAsterisk key={form.key('on')} {...form.getInputProps('on')} />
          <TimeInput label={t('page.shell.fields.at')} key={form.key('time')} {...form.getInputProps('time')} />
        </Group>
        <NumberField label={t('page.projects.pairing.minutes')} whole key={form.key('durationMinutes')} {...form.getInputProps('durationMinutes')} />
        <Select
          label={t('page.projects.pairing.outcome')}
          data={outcomeOptions()}
          allowDeselect={false}
          key={form.key('outcome')}
          {...form.getInputProps('outcome')}
        />
        <TextAreaField label={t('page.projects.pairing.notes')} maxLength={TEXT_LIMITS.note} key={form.key('notes')} {...form.getInputProps('notes')} />
        {correcting && (
          <TextField
            label={t('page.projects.pairing.reason')}
            withAsterisk
            maxLength={TEXT_LIMITS.correctionReason}
            key={form.key('reason')}
            {...form.getInputProps('reason')}
          />
        )}
        {warned.warnings && <WarningConfirm warnings={warned.warnings} loading={record.isPending} onConfirm={warned.confirm} onCancel={warned.cancel} />}
        <SafetyNote text="pairing" />
        <FormActions
          message={message}
          loading={record.isPending}
          submitLabel={t(correcting ? 'page.projects.pairing.saveCorrection' : 'page.projects.pairing.save')}
          onCancel={onDone}
        />
      </Stack>
    </form>
  );
}
