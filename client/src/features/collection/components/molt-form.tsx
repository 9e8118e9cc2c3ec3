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
import { useWords } from '@/lib/i18n';
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
  const t = useWords();
  const record = useRecordMolt(animalId);
  const today = deviceToday();
  const [message, setMessage] = useState<string | null>(null);
  const form = useForm<MoltFormValues>({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: { moltedOn: '', exuviaSex: null, sizeCm: '', maturing: false, notes: '' },
    validate: {
      moltedOn: dateRule({ required: t('page.collection.molts.dateMissing'), latest: today, latestMessage: t('page.collection.molts.dateInFuture') }),
      sizeCm: numberRule({ min: 0.1, max: 40, decimals: 1, rangeMessage: t('page.collection.molts.legSpanRange') }),
      notes: textRule({ maxLength: TEXT_LIMITS.note }),
    },
  });
  return (
    <form
      aria-label={t('page.collection.molts.record')}
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
        <DateField label={t('page.collection.molts.moltedOn')} withAsterisk key={form.key('moltedOn')} {...form.getInputProps('moltedOn')} />
        <Select
          label={t('page.collection.molts.exuviaSex')}
          placeholder={t('page.collection.molts.notChecked')}
          clearable
          data={EXUVIA_SEXES.map((s) => ({ value: s, label: EXUVIA_LABELS[s] }))}
          key={form.key('exuviaSex')}
          {...form.getInputProps('exuviaSex')}
        />
        <NumberField label={t('page.collection.molts.legSpan')} key={form.key('sizeCm')} {...form.getInputProps('sizeCm')} />
        {sex === 'male' && (
          <Checkbox
            label={t('page.collection.molts.maturing')}
            description={t('page.collection.molts.maturingHint')}
            size="md"
            key={form.key('maturing')}
            {...form.getInputProps('maturing', { type: 'checkbox' })}
          />
        )}
        <TextAreaField label={t('page.collection.molts.notes')} maxLength={TEXT_LIMITS.note} key={form.key('notes')} {...form.getInputProps('notes')} />
        <FormActions message={message} loading={record.isPending} submitLabel={t('page.collection.molts.save')} onCancel={onDone} />
      </Stack>
    </form>
  );
}
