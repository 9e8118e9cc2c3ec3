import { Button, Collapse, Group, Select, Stack } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useDisclosure } from '@mantine/hooks';
import { useState } from 'react';
import { ENDED_EARLY_REASONS, TEXT_LIMITS, type EndedEarlyReason } from '@broodsilk/shared';
import { TextAreaField, TextField } from '@/components/fields/text-field';
import { textRule } from '@/components/fields/text-rule';
import { FormActions } from '@/components/ui/form-actions';

import { applyServerErrors } from '@/lib/form-errors';
import { useWords } from '@/lib/i18n';
import { useEndProject } from '../api/projects';
import { ENDED_EARLY_LABELS } from '../utils/labels';

// A function, not a constant: the words follow the reader's language.
const reasonOptions = () => ENDED_EARLY_REASONS.map((r) => ({ value: r, label: ENDED_EARLY_LABELS[r].replace(/^./, (c: string) => c.toUpperCase()) }));

/** The keeper calls a project off, with the reason the stage line will show; a setback in the facts pre-fills it. */
export function EndProjectForm({ projectId, setback }: { projectId: string; setback?: EndedEarlyReason }) {
  const [opened, { toggle }] = useDisclosure(false);
  const [message, setMessage] = useState<string | null>(null);
  const end = useEndProject(projectId);
  const t = useWords();
  const form = useForm<{ reason: EndedEarlyReason | null; note: string; partnerMessage: string }>({
    mode: 'uncontrolled',
    initialValues: { reason: setback ?? null, note: '', partnerMessage: '' },
    validate: {
      reason: (v) => (v ? null : t('page.projects.end.reasonRequired')),
      note: textRule({ maxLength: TEXT_LIMITS.note }),
      partnerMessage: textRule({ maxLength: TEXT_LIMITS.partnerMessage }),
    },
  });
  const submit = form.onSubmit(async (v) => {
    setMessage(null);
    try {
      // The message to the partners is sent as typed, and only when something was written.
      await end.mutateAsync({ reason: v.reason!, note: v.note.trim() || null, ...(v.partnerMessage.trim() ? { partnerMessage: v.partnerMessage } : {}) });
    } catch (e) {
      setMessage(applyServerErrors(form, e));
    }
  });
  return (
    <Stack gap="xs">
      <Group>
        <Button variant="subtle" color="clay" onClick={toggle}>
          {t(opened ? 'page.projects.end.keepGoing' : 'page.projects.end.endEarly')}
        </Button>
      </Group>
      <Collapse expanded={opened}>
        <form onSubmit={submit} noValidate>
          <Stack maw={420}>
            <Select label={t('page.projects.end.reason')} data={reasonOptions()} key={form.key('reason')} {...form.getInputProps('reason')} />
            <TextField label={t('page.projects.end.note')} maxLength={TEXT_LIMITS.note} key={form.key('note')} {...form.getInputProps('note')} />
            <TextAreaField
              label={t('page.failureNotice.messageLabel')}
              description={t('page.failureNotice.endMessageHint')}
              maxLength={TEXT_LIMITS.partnerMessage}
              minRows={3}
              key={form.key('partnerMessage')}
              {...form.getInputProps('partnerMessage')}
            />
            <FormActions message={message} loading={end.isPending} submitLabel={t('page.projects.end.submit')} />
          </Stack>
        </form>
      </Collapse>
    </Stack>
  );
}
