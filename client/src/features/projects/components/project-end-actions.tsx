import { Button, Group, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { useState } from 'react';
import { mayClose, mayReopen, type ProjectStage } from '@broodsilk/shared';
import { ConfirmAction } from '@/components/ui/confirm-action';
import { isApiError } from '@/lib/api-error';
import { useWords } from '@/lib/i18n';
import { useProjectEndStep } from '../api/projects';

/** The keeper's steps after the early end or at the close; their words are page.projects.endStep.<step>. */
type Step = 'close' | 'reopen';

function EndStep({ projectId, step }: { projectId: string; step: Step }) {
  const t = useWords();
  const [opened, { open, close }] = useDisclosure(false);
  const [message, setMessage] = useState<string | null>(null);
  const run = useProjectEndStep(projectId, step);
  const words = {
    button: t(`page.projects.endStep.${step}.button`),
    title: t(`page.projects.endStep.${step}.title`),
    says: t(`page.projects.endStep.${step}.says`),
  };
  const confirm = async () => {
    setMessage(null);
    try {
      await run.mutateAsync();
      close();
    } catch (e) {
      setMessage(isApiError(e) ? e.message : t('page.projects.endStep.failed'));
    }
  };
  return (
    <>
      <Button variant={step === 'close' ? 'default' : 'light'} onClick={open}>
        {words.button}
      </Button>
      <ConfirmAction
        opened={opened}
        onClose={close}
        title={words.title}
        message={message}
        confirmLabel={words.button}
        pending={run.isPending}
        onConfirm={confirm}
      >
        <Text size="sm">{words.says}</Text>
      </ConfirmAction>
    </>
  );
}

/** The keeper's "Close project" (while not closed) and "Reopen" (after an early end). */
export function ProjectEndActions({ projectId, stage }: { projectId: string; stage: ProjectStage }) {
  if (!mayClose(stage) && !mayReopen(stage)) return null;
  return (
    <Group>
      {mayReopen(stage) && <EndStep projectId={projectId} step="reopen" />}
      {mayClose(stage) && <EndStep projectId={projectId} step="close" />}
    </Group>
  );
}
