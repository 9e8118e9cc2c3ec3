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
import { useWords } from '@/lib/i18n';
import { useCreateSac } from '../api/sacs';
import { FormActions } from '@/components/ui/form-actions';
import { WarningConfirm, useWarnedSave } from '@/components/ui/warning-confirm';

interface Values {
  layDate: string;
  /** `mother`: to be pulled in its window; `kept`: left with the mother on purpose; `pulled`: already in the incubator. */
  where: 'mother' | 'kept' | 'pulled';
  pulledOn: string;
  pulledTime: string;
  notes: string;
}

/** Records a new sac: its lay date and whether it is still with the mother or already pulled. */
export function RecordSacForm({ projectId, timeZone, onDone }: { projectId: string; timeZone: string; onDone?: () => void }) {
  const t = useWords();
  const create = useCreateSac(projectId);
  const [message, setMessage] = useState<string | null>(null);
  const today = todayIn(timeZone, new Date());
  const form = useForm<Values>({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: { layDate: '', where: 'mother', pulledOn: '', pulledTime: '08:00', notes: '' },
    validate: {
      layDate: (v) => checkDate(v, { required: t('page.sacs.sacForm.layRequired'), latest: today, latestMessage: t('page.sacs.sacForm.layFuture') }),
      pulledOn: (v, values) =>
        values.where === 'pulled'
          ? checkDate(v, {
              required: t('page.sacs.sacForm.pullRequired'),
              latest: today,
              latestMessage: t('page.sacs.sacForm.pullFuture'),
              earliest: readDate(values.layDate) ?? undefined,
              earliestMessage: t('page.sacs.sacForm.pullBeforeLay'),
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
      leftWithMother: v.where === 'kept',
      notes: v.notes.trim() || null,
    });
  });

  return (
    <form onSubmit={submit} noValidate>
      <Stack maw={480}>
        <DateField label={t('page.sacs.sacForm.layDate')} withAsterisk key={form.key('layDate')} {...form.getInputProps('layDate')} />
        <Stack gap={4}>
          <Text size="sm" fw={500}>
            {t('page.sacs.sacForm.where')}
          </Text>
          <SegmentedControl
            data={[
              { value: 'mother', label: t('page.sacs.sacForm.withMother') },
              { value: 'kept', label: t('page.sacs.sacForm.stays') },
              { value: 'pulled', label: t('page.sacs.sacForm.pulled') },
            ]}
            key={form.key('where')}
            {...form.getInputProps('where')}
          />
        </Stack>
        {where === 'kept' && (
          <Text size="sm" c="dimmed">
            {t('page.sacs.sacForm.staysHint')}
          </Text>
        )}
        {where === 'pulled' && (
          <Group grow align="flex-start">
            <DateField label={t('page.sacs.pull.pulledOn')} key={form.key('pulledOn')} {...form.getInputProps('pulledOn')} />
            <TimeInput label={t('page.shell.fields.at')} key={form.key('pulledTime')} {...form.getInputProps('pulledTime')} />
          </Group>
        )}
        <TextAreaField label={t('page.sacs.notes')} maxLength={TEXT_LIMITS.note} key={form.key('notes')} {...form.getInputProps('notes')} />
        {warned.warnings && <WarningConfirm warnings={warned.warnings} loading={create.isPending} onConfirm={warned.confirm} onCancel={warned.cancel} />}
        <FormActions message={message} loading={create.isPending} submitLabel={t('page.sacs.sacForm.save')} />
      </Stack>
    </form>
  );
}
