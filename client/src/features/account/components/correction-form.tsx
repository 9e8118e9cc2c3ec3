import { NativeSelect, Stack } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { TEXT_LIMITS } from '@broodsilk/shared';
import { DateField } from '@/components/fields/date-field';
import { TextAreaField } from '@/components/fields/text-field';
import { checkText } from '@/components/fields/text-rule';
import { dateRule, readDate } from '@/components/fields/typed-date';
import { FormActions } from '@/components/ui/form-actions';
import { useCreateEntry, useEntries } from '../api/entries';
import { applyEntryErrors } from '../utils/entry-errors';
import { ENTRY_KIND_LABELS } from '../utils/labels';
import { formatDate } from '@/lib/dates';
import { useWords } from '@/lib/i18n';

interface Values {
  reversesId: string;
  reason: string;
  date: string;
}

/** Nothing is deleted: a correction reverses one earlier entry and says why. */
export function CorrectionForm({ projectId, today, onDone }: { projectId: string; today: string; onDone?: () => void }) {
  const entries = useEntries(projectId);
  const t = useWords();
  const create = useCreateEntry(projectId);
  const [message, setMessage] = useState<string | null>(null);
  const form = useForm<Values>({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: { reversesId: '', reason: '', date: today },
    validate: {
      reversesId: (v) => (v ? null : 'Which entry is wrong?'),
      reason: (v) => (v.trim().length >= 3 ? checkText(v, { maxLength: TEXT_LIMITS.correctionReason }) : 'Say in a few words why it is reversed.'),
      date: dateRule({ required: 'Give the date.', latest: today, latestMessage: 'This has happened, so it cannot be after today.' }),
    },
  });
  const submit = form.onSubmit(async (v) => {
    setMessage(null);
    try {
      await create.mutateAsync({ kind: 'correction', reversesId: v.reversesId, reason: v.reason.trim(), date: readDate(v.date)! });
      form.reset();
      onDone?.();
    } catch (e) {
      setMessage(applyEntryErrors(form, e, 'reversesId'));
    }
  });
  const reversible = (entries.data ?? []).filter((e) => e.status !== 'reversed' && e.kind !== 'confirmation' && e.source === 'manual');
  return (
    <form onSubmit={submit} noValidate aria-label="Record a correction">
      <Stack maw={520} gap="sm">
        <NativeSelect
          label="Entry to reverse"
          data={[
            { value: '', label: 'Choose an entry' },
            ...reversible.map((e) => ({
              value: e.id,
              label: `#${e.seq} ${ENTRY_KIND_LABELS[e.kind]} · ${formatDate(e.date)}${e.party ? ` · ${e.party.name}` : ''}${e.count !== null ? ` · ${e.count}` : ''}`,
            })),
          ]}
          withAsterisk
          key={form.key('reversesId')}
          {...form.getInputProps('reversesId')}
          description={entries.hasNextPage ? t('page.account.entriesNotAllShown') : undefined}
        />
        <TextAreaField label="Why" maxLength={TEXT_LIMITS.correctionReason} withAsterisk key={form.key('reason')} {...form.getInputProps('reason')} />
        <DateField label="Date" key={form.key('date')} {...form.getInputProps('date')} />
        <FormActions message={message} loading={create.isPending} submitLabel="Record correction" />
      </Stack>
    </form>
  );
}
