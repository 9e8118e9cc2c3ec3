import { SegmentedControl, Stack, TextInput, Textarea } from '@mantine/core';
import { DateInput } from '@mantine/dates';
import '@mantine/dates/styles.css';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import type { FeedingResponse } from '@broodsilk/shared';
import { applyServerErrors } from '@/lib/form-errors';
import { ModalFormEnd } from './modal-form-end';
import { useAddFeeding } from '../api/animal-season';
import { localToday, pastDateError } from './dated-step-form';

interface FeedingFormValues {
  fedOn: string | null;
  prey: string;
  taken: 'taken' | 'refused';
  note: string;
  reason: string;
}

/** A new feeding, or (with `correcting`) the corrected version of an entry, which strikes it. */
export function FeedingForm({ animalId, correcting, onDone }: { animalId: string; correcting?: FeedingResponse; onDone: () => void }) {
  const add = useAddFeeding(animalId);
  const [message, setMessage] = useState<string | null>(null);
  const form = useForm<FeedingFormValues>({
    mode: 'uncontrolled',
    initialValues: {
      fedOn: correcting?.fedOn ?? localToday(),
      prey: correcting?.prey ?? '',
      taken: correcting && !correcting.taken ? 'refused' : 'taken',
      note: correcting?.note ?? '',
      reason: '',
    },
    validate: {
      fedOn: (v) => pastDateError(v),
      prey: (v) => (v.trim() ? null : 'Say what prey was offered, e.g. "2 adult crickets".'),
      reason: (v) => (correcting && !v.trim() ? 'Say briefly why the entry is corrected.' : null),
    },
  });
  return (
    <form
      aria-label={correcting ? 'Correct a feeding' : 'Record a feeding'}
      onSubmit={form.onSubmit((v) => {
        setMessage(null);
        add.mutate(
          {
            fedOn: v.fedOn!,
            prey: v.prey.trim(),
            taken: v.taken === 'taken',
            note: v.note.trim() || null,
            ...(correcting ? { strikes: correcting.id, reason: v.reason.trim() } : {}),
          },
          { onSuccess: onDone, onError: (e) => setMessage(applyServerErrors(form, e)) },
        );
      })}
    >
      <Stack>
        <DateInput label="Fed on" withAsterisk valueFormat="YYYY-MM-DD" placeholder="YYYY-MM-DD" key={form.key('fedOn')} {...form.getInputProps('fedOn')} />
        <TextInput label="Prey" withAsterisk placeholder="2 adult crickets" key={form.key('prey')} {...form.getInputProps('prey')} />
        <SegmentedControl
          aria-label="Taken or refused"
          data={[
            { value: 'taken', label: 'Taken' },
            { value: 'refused', label: 'Refused' },
          ]}
          key={form.key('taken')}
          {...form.getInputProps('taken')}
        />
        <Textarea label="Note" rows={2} key={form.key('note')} {...form.getInputProps('note')} />
        {correcting && <TextInput label="Why the old entry was wrong" withAsterisk key={form.key('reason')} {...form.getInputProps('reason')} />}
        <ModalFormEnd message={message} loading={add.isPending} submitLabel={correcting ? 'Save the correction' : 'Save feeding'} onCancel={onDone} />
      </Stack>
    </form>
  );
}
