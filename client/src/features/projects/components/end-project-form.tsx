import { Button, Collapse, Group, Select, Stack } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useDisclosure } from '@mantine/hooks';
import { useState } from 'react';
import { ENDED_EARLY_REASONS, TEXT_LIMITS, type EndedEarlyReason } from '@broodsilk/shared';
import { TextField } from '@/components/fields/text-field';
import { textRule } from '@/components/fields/text-rule';
import { FormActions } from '@/components/ui/form-actions';

import { applyServerErrors } from '@/lib/form-errors';
import { useEndProject } from '../api/projects';
import { ENDED_EARLY_LABELS } from '../utils/labels';

const reasonOptions = ENDED_EARLY_REASONS.map((r) => ({ value: r, label: ENDED_EARLY_LABELS[r].replace(/^./, (c: string) => c.toUpperCase()) }));

/** The keeper calls a project off, with the reason the stage line will show; a setback in the facts pre-fills it. */
export function EndProjectForm({ projectId, setback }: { projectId: string; setback?: EndedEarlyReason }) {
  const [opened, { toggle }] = useDisclosure(false);
  const [message, setMessage] = useState<string | null>(null);
  const end = useEndProject(projectId);
  const form = useForm<{ reason: EndedEarlyReason | null; note: string }>({
    mode: 'uncontrolled',
    initialValues: { reason: setback ?? null, note: '' },
    validate: { reason: (v) => (v ? null : 'Why does it end?'), note: textRule({ maxLength: TEXT_LIMITS.note }) },
  });
  const submit = form.onSubmit(async (v) => {
    setMessage(null);
    try {
      await end.mutateAsync({ reason: v.reason!, note: v.note.trim() || null });
    } catch (e) {
      setMessage(applyServerErrors(form, e));
    }
  });
  return (
    <Stack gap="xs">
      <Group>
        <Button variant="subtle" color="clay" onClick={toggle}>
          {opened ? 'Keep the project going' : 'End this project early'}
        </Button>
      </Group>
      <Collapse expanded={opened}>
        <form onSubmit={submit} noValidate>
          <Stack maw={420}>
            <Select label="Reason" data={reasonOptions} key={form.key('reason')} {...form.getInputProps('reason')} />
            <TextField label="Note" maxLength={TEXT_LIMITS.note} key={form.key('note')} {...form.getInputProps('note')} />
            <FormActions message={message} loading={end.isPending} submitLabel="End project" />
          </Stack>
        </form>
      </Collapse>
    </Stack>
  );
}
