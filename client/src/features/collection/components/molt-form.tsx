import { Alert, Button, Checkbox, Group, NumberInput, Select, Stack, Text, Textarea } from '@mantine/core';
import { DateInput } from '@mantine/dates';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { EXUVIA_SEXES, type AnimalSex, type ExuviaSex } from '@broodsilk/shared';
import { applyServerErrors } from '@/lib/form-errors';
import { useRecordMolt } from '../api/molts';
import { EXUVIA_LABELS } from '../utils/animal-view';

interface MoltFormValues {
  moltedOn: string | null;
  exuviaSex: ExuviaSex | null;
  sizeCm: number | string;
  maturing: boolean;
  notes: string;
}

export function MoltForm({ animalId, sex, onDone }: { animalId: string; sex: AnimalSex; onDone: () => void }) {
  const record = useRecordMolt(animalId);
  const [message, setMessage] = useState<string | null>(null);
  const form = useForm<MoltFormValues>({
    mode: 'uncontrolled',
    initialValues: { moltedOn: null, exuviaSex: null, sizeCm: '', maturing: false, notes: '' },
    validate: { moltedOn: (v) => (v ? null : 'Give the date of the molt.') },
  });
  return (
    <form
      aria-label="Record a molt"
      onSubmit={form.onSubmit((v) => {
        setMessage(null);
        record.mutate(
          {
            moltedOn: v.moltedOn!,
            exuviaSex: v.exuviaSex,
            sizeCm: v.sizeCm === '' ? null : Number(v.sizeCm),
            maturing: sex === 'male' ? v.maturing : false,
            notes: v.notes.trim() || null,
          },
          { onSuccess: onDone, onError: (e) => setMessage(applyServerErrors(form, e)) },
        );
      })}
    >
      <Stack>
        {message && (
          <Alert color="clay" variant="light" role="alert">
            <Text size="sm" className="tone-failed">
              {message}
            </Text>
          </Alert>
        )}
        <DateInput
          label="Molted on"
          withAsterisk
          valueFormat="YYYY-MM-DD"
          placeholder="YYYY-MM-DD"
          maxDate={new Date()}
          key={form.key('moltedOn')}
          {...form.getInputProps('moltedOn')}
        />
        <Select
          label="Sexed from the exuvia"
          placeholder="Not checked"
          clearable
          data={EXUVIA_SEXES.map((s) => ({ value: s, label: EXUVIA_LABELS[s] }))}
          key={form.key('exuviaSex')}
          {...form.getInputProps('exuviaSex')}
        />
        <NumberInput label="Leg span (cm)" min={0} max={40} decimalScale={1} step={0.5} key={form.key('sizeCm')} {...form.getInputProps('sizeCm')} />
        {sex === 'male' && (
          <Checkbox
            label="This was his maturing molt"
            description="Sets his maturing date and starts the male clock."
            size="md"
            key={form.key('maturing')}
            {...form.getInputProps('maturing', { type: 'checkbox' })}
          />
        )}
        <Textarea label="Notes" rows={2} key={form.key('notes')} {...form.getInputProps('notes')} />
        <Group justify="flex-end">
          <Button variant="default" onClick={onDone} size="md">
            Cancel
          </Button>
          <Button type="submit" loading={record.isPending} size="md">
            Save molt
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
