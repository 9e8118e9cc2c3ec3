import { Alert, Button, Group, NativeSelect, Stack, Textarea, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { useCreateEntry, useEntries } from '../api/entries';
import { applyEntryErrors } from '../utils/entry-errors';
import { ENTRY_KIND_LABELS } from '../utils/labels';
import { formatDate } from '@/lib/dates';

interface Values {
  reversesId: string;
  reason: string;
  date: string;
}

/** Nothing is deleted: a correction reverses one earlier entry and says why. */
export function CorrectionForm({ projectId, today, onDone }: { projectId: string; today: string; onDone?: () => void }) {
  const entries = useEntries(projectId);
  const create = useCreateEntry(projectId);
  const [message, setMessage] = useState<string | null>(null);
  const form = useForm<Values>({
    mode: 'uncontrolled',
    initialValues: { reversesId: '', reason: '', date: today },
    validate: {
      reversesId: (v) => (v ? null : 'Which entry is wrong?'),
      reason: (v) => (v.trim().length >= 3 ? null : 'Say in a few words why it is reversed.'),
    },
  });
  const submit = form.onSubmit(async (v) => {
    setMessage(null);
    try {
      await create.mutateAsync({ kind: 'correction', reversesId: v.reversesId, reason: v.reason.trim(), date: v.date });
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
        />
        <Textarea label="Why" autosize minRows={2} withAsterisk key={form.key('reason')} {...form.getInputProps('reason')} />
        <TextInput label="Date" type="date" max={today} key={form.key('date')} {...form.getInputProps('date')} />
        {message && (
          <Alert color="clay" role="alert">
            {message}
          </Alert>
        )}
        <Group>
          <Button type="submit" color="clay" loading={create.isPending}>
            Record correction
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
