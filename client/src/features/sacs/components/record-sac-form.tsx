import { Group, SegmentedControl, Stack, Text } from '@mantine/core';
import { TimeInput } from '@mantine/dates';
import '@mantine/dates/styles.css';
import { DateField } from '@/components/fields/date-field';
import { TextAreaField } from '@/components/fields/text-field';
import { textRule } from '@/components/fields/text-rule';
import { checkDate, readDate } from '@/components/fields/typed-date';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { TEXT_LIMITS, todayIn, type CreateSacRequest } from '@broodsilk/shared';
import { dayjs } from '@/lib/dates';
import { applyServerErrors } from '@/lib/form-errors';
import { useCreateSac } from '../api/sacs';
import { FormActions } from '@/components/ui/form-actions';
import { WarningConfirm, useWarnedSave } from '@/components/ui/warning-confirm';

interface Values {
  layDate: string;
  where: 'mother' | 'pulled';
  pulledOn: string;
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
    validateInputOnBlur: true,
    initialValues: { layDate: '', where: 'mother', pulledOn: '', pulledTime: '08:00', notes: '' },
    validate: {
      layDate: (v) => checkDate(v, { required: 'On which day was the sac laid?', latest: today, latestMessage: 'The lay date cannot be in the future.' }),
      pulledOn: (v, values) =>
        values.where === 'pulled'
          ? checkDate(v, {
              required: 'On which day was it pulled?',
              latest: today,
              latestMessage: 'A pull that has happened cannot be in the future.',
              earliest: readDate(values.layDate) ?? undefined,
              earliestMessage: 'The pull comes after the lay date.',
            })
          : null,
      notes: textRule({ maxLength: TEXT_LIMITS.note }),
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
      layDate: readDate(v.layDate)!,
      pulledAt: v.where === 'pulled' && v.pulledOn ? dayjs.tz(`${readDate(v.pulledOn)}T${v.pulledTime || '08:00'}`, timeZone).toISOString() : null,
      notes: v.notes.trim() || null,
    });
  });

  return (
    <form onSubmit={submit} noValidate>
      <Stack maw={480}>
        <DateField label="Lay date" withAsterisk key={form.key('layDate')} {...form.getInputProps('layDate')} />
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
            <DateField label="Pulled on" key={form.key('pulledOn')} {...form.getInputProps('pulledOn')} />
            <TimeInput label="At" key={form.key('pulledTime')} {...form.getInputProps('pulledTime')} />
          </Group>
        )}
        <TextAreaField label="Notes" maxLength={TEXT_LIMITS.note} key={form.key('notes')} {...form.getInputProps('notes')} />
        {warned.warnings && <WarningConfirm warnings={warned.warnings} loading={create.isPending} onConfirm={warned.confirm} onCancel={warned.cancel} />}
        <FormActions message={message} loading={create.isPending} submitLabel="Save sac" />
      </Stack>
    </form>
  );
}
