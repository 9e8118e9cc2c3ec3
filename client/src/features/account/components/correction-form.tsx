import { NativeSelect, Stack } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { TEXT_LIMITS } from '@broodsilk/shared';
import { DateField } from '@/components/fields/date-field';
import { TextAreaField } from '@/components/fields/text-field';
import { checkText } from '@/components/fields/text-rule';
import { readDate } from '@/components/fields/typed-date';
import { FormActions } from '@/components/ui/form-actions';
import { useCreateEntry, useEntries } from '../api/entries';
import { applyEntryErrors } from '../utils/entry-errors';
import { ENTRY_KIND_LABELS } from '../utils/labels';
import { pastDateRule } from './sac-count-date-fields';
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
      reversesId: (v) => (v ? null : t('page.account.correction.whichEntry')),
      reason: (v) => (v.trim().length >= 3 ? checkText(v, { maxLength: TEXT_LIMITS.correctionReason }) : t('page.account.correction.sayWhy')),
      date: pastDateRule(t, today),
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
    <form onSubmit={submit} noValidate aria-label={t('page.account.action.correction')}>
      <Stack maw={520} gap="sm">
        <NativeSelect
          label={t('page.account.correction.entry')}
          data={[
            { value: '', label: t('page.account.form.chooseEntry') },
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
        <TextAreaField
          label={t('page.account.correction.why')}
          maxLength={TEXT_LIMITS.correctionReason}
          withAsterisk
          key={form.key('reason')}
          {...form.getInputProps('reason')}
        />
        <DateField label={t('page.account.form.date')} key={form.key('date')} {...form.getInputProps('date')} />
        <FormActions message={message} loading={create.isPending} submitLabel={t('page.account.submit.correction')} />
      </Stack>
    </form>
  );
}
