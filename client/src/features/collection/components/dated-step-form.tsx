import { Stack, Text } from '@mantine/core';
import { DateInput } from '@mantine/dates';
import '@mantine/dates/styles.css';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { dayjs } from '@/lib/dates';
import { applyServerErrors } from '@/lib/form-errors';
import { useWords, words } from '@/lib/i18n';
import { ModalFormEnd } from './modal-form-end';
import { useAnimalStep, type AnimalStep } from '../api/animal-season';

export const localToday = () => dayjs().format('YYYY-MM-DD');

/** A dated step may be today or earlier, never later (ISO dates compare as strings). */
export function pastDateError(v: string | null, today = localToday()): string | null {
  return !v ? words('page.collection.step.dateMissing') : v > today ? words('page.collection.step.dateInFuture') : null;
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
  const t = useWords();
  const save = useAnimalStep(animalId, step);
  const [message, setMessage] = useState<string | null>(null);
  const form = useForm<{ on: string | null }>({
    mode: 'uncontrolled',
    initialValues: { on: localToday() },
    validate: { on: (v) => pastDateError(v) },
  });
  return (
    <form
      aria-label={submitLabel}
      onSubmit={form.onSubmit((v) => {
        setMessage(null);
        save.mutate({ on: v.on! }, { onSuccess: onDone, onError: (e) => setMessage(applyServerErrors(form, e)) });
      })}
    >
      <Stack>
        {explanation && <Text size="sm">{explanation}</Text>}
        <DateInput
          label={dateLabel}
          withAsterisk
          valueFormat="YYYY-MM-DD"
          placeholder={t('page.collection.datePlaceholder')}
          key={form.key('on')}
          {...form.getInputProps('on')}
        />
        <ModalFormEnd message={message} loading={save.isPending} submitLabel={submitLabel} onCancel={onDone} />
      </Stack>
    </form>
  );
}
