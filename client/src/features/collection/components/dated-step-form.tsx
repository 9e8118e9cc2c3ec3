import { Stack, Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { DateField } from '@/components/fields/date-field';
import { checkDate, readDate } from '@/components/fields/typed-date';
import { dayjs } from '@/lib/dates';
import { applyServerErrors } from '@/lib/form-errors';
import { words } from '@/lib/i18n';
import { ModalFormEnd } from './modal-form-end';
import { useAnimalStep, type AnimalStep } from '../api/animal-season';

export const localToday = () => dayjs().format('YYYY-MM-DD');

/** A dated step is typed as a date (ISO or the reader's own order) and may be today or earlier, never later. */
export function pastDateError(v: string | null, today = localToday()): string | null {
  return checkDate(v ?? '', { required: words('page.collection.step.dateMissing'), latest: today, latestMessage: words('page.collection.step.dateInFuture') });
}

interface DatedStepFormProps {
  animalId: string;
  step: AnimalStep;
  /** The date field's label, e.g. "Died on". */
  dateLabel: string;
  submitLabel: string;
  /** What saving does, said before the keeper confirms. */
  explanation?: string;
  onDone: () => void;
}

/**
 * One dated step (premolt, sperm web, return, death): the date defaults to today, a past date is
 * fine, a future one is refused here and by the server.
 */
export function DatedStepForm({ animalId, step, dateLabel, submitLabel, explanation, onDone }: DatedStepFormProps) {
  const save = useAnimalStep(animalId, step);
  const [message, setMessage] = useState<string | null>(null);
  const form = useForm<{ on: string }>({
    mode: 'uncontrolled',
    initialValues: { on: localToday() },
    validate: { on: (v) => pastDateError(v) },
  });
  return (
    <form
      aria-label={submitLabel}
      onSubmit={form.onSubmit((v) => {
        setMessage(null);
        save.mutate({ on: readDate(v.on)! }, { onSuccess: onDone, onError: (e) => setMessage(applyServerErrors(form, e)) });
      })}
    >
      <Stack>
        {explanation && <Text size="sm">{explanation}</Text>}
        <DateField label={dateLabel} withAsterisk key={form.key('on')} {...form.getInputProps('on')} />
        <ModalFormEnd message={message} loading={save.isPending} submitLabel={submitLabel} onCancel={onDone} />
      </Stack>
    </form>
  );
}
