import { Checkbox, Select, Stack } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { EXUVIA_SEXES, TEXT_LIMITS, type AnimalSex, type ExuviaSex } from '@broodsilk/shared';
import { DateField } from '@/components/fields/date-field';
import { NumberField } from '@/components/fields/number-field';
import { TextAreaField } from '@/components/fields/text-field';
import { dateRule, deviceToday, readDate } from '@/components/fields/typed-date';
import { numberRule, readNumber } from '@/components/fields/typed-number';
import { textRule } from '@/components/fields/text-rule';
import { FormActions } from '@/components/ui/form-actions';
import { applyServerErrors } from '@/lib/form-errors';
import { useRecordMolt } from '../api/molts';
import { EXUVIA_LABELS } from '../utils/animal-view';

interface MoltFormValues {
  moltedOn: string;
  exuviaSex: ExuviaSex | null;
  sizeCm: string;
  maturing: boolean;
  notes: string;
}

export function MoltForm({ animalId, sex, onDone }: { animalId: string; sex: AnimalSex; onDone: () => void }) {
  const record = useRecordMolt(animalId);
  const today = deviceToday();
  const [message, setMessage] = useState<string | null>(null);
  const form = useForm<MoltFormValues>({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: { moltedOn: '', exuviaSex: null, sizeCm: '', maturing: false, notes: '' },
    validate: {
      moltedOn: dateRule({ required: 'Give the date of the molt.', latest: today, latestMessage: 'A molt that has happened cannot be in the future.' }),
      sizeCm: numberRule({ min: 0.1, max: 40, decimals: 1, rangeMessage: 'The leg span is from 0.1 to 40 cm.' }),
      notes: textRule({ maxLength: TEXT_LIMITS.note }),
    },
  });
  return (
    <form
      aria-label="Record a molt"
      onSubmit={form.onSubmit((v) => {
        setMessage(null);
        record.mutate(
          {
            moltedOn: readDate(v.moltedOn)!,
            exuviaSex: v.exuviaSex,
            sizeCm: readNumber(v.sizeCm),
            maturing: sex === 'male' ? v.maturing : false,
            notes: v.notes.trim() || null,
          },
          { onSuccess: onDone, onError: (e) => setMessage(applyServerErrors(form, e)) },
        );
      })}
    >
      <Stack>
        <DateField label="Molted on" withAsterisk key={form.key('moltedOn')} {...form.getInputProps('moltedOn')} />
        <Select
          label="Sexed from the exuvia"
          placeholder="Not checked"
          clearable
          data={EXUVIA_SEXES.map((s) => ({ value: s, label: EXUVIA_LABELS[s] }))}
          key={form.key('exuviaSex')}
          {...form.getInputProps('exuviaSex')}
        />
        <NumberField label="Leg span (cm)" key={form.key('sizeCm')} {...form.getInputProps('sizeCm')} />
        {sex === 'male' && (
          <Checkbox
            label="This was his maturing molt"
            description="Sets his maturing date and starts the male clock."
            size="md"
            key={form.key('maturing')}
            {...form.getInputProps('maturing', { type: 'checkbox' })}
          />
        )}
        <TextAreaField label="Notes" maxLength={TEXT_LIMITS.note} key={form.key('notes')} {...form.getInputProps('notes')} />
        <FormActions message={message} loading={record.isPending} submitLabel="Save molt" onCancel={onDone} />
      </Stack>
    </form>
  );
}
