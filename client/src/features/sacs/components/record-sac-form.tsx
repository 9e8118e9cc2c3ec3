import { Group, SegmentedControl, Stack, Text, Textarea } from '@mantine/core';
import { DateInput, TimeInput } from '@mantine/dates';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { todayIn, type CreateSacRequest } from '@broodsilk/shared';
import { dayjs } from '@/lib/dates';
import { applyServerErrors } from '@/lib/form-errors';
import { useCreateSac } from '../api/sacs';
import { FormActions } from '@/components/ui/form-actions';
import { WarningConfirm, useWarnedSave } from '@/components/ui/warning-confirm';

interface Values {
  layDate: string | null;
  where: 'mother' | 'pulled';
  pulledOn: string | null;
  pulledTime: string;
  notes: string;
}

/** Records a new sac: its lay date and whether it is still with the mother or already pulled. */
export function RecordSacForm({ projectId, timeZone, onDone }: { projectId: string; timeZone: string; onDone?: () => void }) {
  const create = useCreateSac(projectId);
  const [message, setMessage] = useState<string | null>(null);
  const today = todayIn(timeZone, new Date());
  const form = useForm<Values>({
    mode: 'uncontrolled',
    initialValues: { layDate: null, where: 'mother', pulledOn: null, pulledTime: '08:00', notes: '' },
    validate: {
      layDate: (v) => (!v ? 'On which day was the sac laid?' : v > today ? 'The lay date cannot be in the future.' : null),
      pulledOn: (v, values) =>
        values.where === 'pulled' && !v
          ? 'On which day was it pulled?'
          : v && values.layDate && v < values.layDate
            ? 'The pull comes after the lay date.'
            : null,
    },
  });
  const [where, setWhere] = useState<Values['where']>('mother');
  form.watch('where', ({ value }) => setWhere(value));

  const warned = useWarnedSave(
    (body: CreateSacRequest) => create.mutateAsync(body),
    () => {
      form.reset();
      onDone?.();
    },
    (e) => setMessage(applyServerErrors(form, e)),
  );
  const submit = form.onSubmit((v) => {
    setMessage(null);
    return warned.save({
      layDate: v.layDate!,
      pulledAt: v.where === 'pulled' && v.pulledOn ? dayjs.tz(`${v.pulledOn}T${v.pulledTime || '08:00'}`, timeZone).toISOString() : null,
      notes: v.notes.trim() || null,
    });
  });

  return (
    <form onSubmit={submit} noValidate>
      <Stack maw={480}>
        <DateInput
          label="Lay date"
          placeholder="YYYY-MM-DD"
          valueFormat="YYYY-MM-DD"
          maxDate={today}
          withAsterisk
          key={form.key('layDate')}
          {...form.getInputProps('layDate')}
        />
        <Stack gap={4}>
          <Text size="sm" fw={500}>
            Where is the sac?
          </Text>
          <SegmentedControl
            data={[
              { value: 'mother', label: 'Left with the mother' },
              { value: 'pulled', label: 'Pulled to the incubator' },
            ]}
            key={form.key('where')}
            {...form.getInputProps('where')}
          />
        </Stack>
        {where === 'pulled' && (
          <Group grow align="flex-start">
            <DateInput
              label="Pulled on"
              placeholder="YYYY-MM-DD"
              valueFormat="YYYY-MM-DD"
              maxDate={today}
              key={form.key('pulledOn')}
              {...form.getInputProps('pulledOn')}
            />
            <TimeInput label="At" key={form.key('pulledTime')} {...form.getInputProps('pulledTime')} />
          </Group>
        )}
        <Textarea label="Notes" autosize minRows={2} key={form.key('notes')} {...form.getInputProps('notes')} />
        {warned.warnings && <WarningConfirm warnings={warned.warnings} loading={create.isPending} onConfirm={warned.confirm} onCancel={warned.cancel} />}
        <FormActions message={message} loading={create.isPending} submitLabel="Save sac" />
      </Stack>
    </form>
  );
}
