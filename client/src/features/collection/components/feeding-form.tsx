import { SegmentedControl, Stack } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { TEXT_LIMITS, type FeedingResponse } from '@broodsilk/shared';
import { DateField } from '@/components/fields/date-field';
import { readDate } from '@/components/fields/typed-date';
import { TextAreaField, TextField } from '@/components/fields/text-field';
import { textRule } from '@/components/fields/text-rule';
import { applyServerErrors } from '@/lib/form-errors';
import { useWords } from '@/lib/i18n';
import { ModalFormEnd } from './modal-form-end';
import { useAddFeeding } from '../api/animal-season';
import { localToday, pastDateError } from './dated-step-form';

interface FeedingFormValues {
  fedOn: string;
  prey: string;
  taken: 'taken' | 'refused';
  note: string;
  reason: string;
}

/** A new feeding, or (with `correcting`) the corrected version of an entry, which strikes it. */
export function FeedingForm({ animalId, correcting, onDone }: { animalId: string; correcting?: FeedingResponse; onDone: () => void }) {
  const t = useWords();
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
      prey: textRule({ required: t('page.collection.feeding.preyMissing'), maxLength: TEXT_LIMITS.prey }),
      note: textRule({ maxLength: TEXT_LIMITS.note }),
      reason: textRule({ required: correcting ? t('page.collection.feeding.reasonMissing') : undefined, maxLength: TEXT_LIMITS.correctionReason }),
    },
  });
  return (
    <form
      aria-label={t(correcting ? 'page.collection.feeding.correctTitle' : 'page.collection.feeding.record')}
      onSubmit={form.onSubmit((v) => {
        setMessage(null);
        add.mutate(
          {
            fedOn: readDate(v.fedOn)!,
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
        <DateField label={t('page.collection.feeding.fedOn')} withAsterisk key={form.key('fedOn')} {...form.getInputProps('fedOn')} />
        <TextField
          label={t('page.collection.feeding.prey')}
          withAsterisk
          maxLength={TEXT_LIMITS.prey}
          placeholder={t('page.collection.feeding.preyExample')}
          key={form.key('prey')}
          {...form.getInputProps('prey')}
        />
        <SegmentedControl
          aria-label={t('page.collection.feeding.takenOrRefused')}
          data={[
            { value: 'taken', label: t('page.collection.feeding.taken') },
            { value: 'refused', label: t('page.collection.feeding.refused') },
          ]}
          key={form.key('taken')}
          {...form.getInputProps('taken')}
        />
        <TextAreaField label={t('page.collection.feeding.note')} rows={2} maxLength={TEXT_LIMITS.note} key={form.key('note')} {...form.getInputProps('note')} />
        {correcting && (
          <TextField
            label={t('page.collection.feeding.reason')}
            withAsterisk
            maxLength={TEXT_LIMITS.correctionReason}
            key={form.key('reason')}
            {...form.getInputProps('reason')}
          />
        )}
        <ModalFormEnd
          message={message}
          loading={add.isPending}
          submitLabel={t(correcting ? 'page.collection.feeding.saveCorrection' : 'page.collection.feeding.save')}
          onCancel={onDone}
        />
      </Stack>
    </form>
  );
}
