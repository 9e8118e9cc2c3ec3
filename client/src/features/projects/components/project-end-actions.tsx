import { Button, Group, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { useState } from 'react';
import { mayClose, mayReopen, type ProjectStage } from '@broodsilk/shared';
import { ConfirmAction } from '@/components/ui/confirm-action';
import { isApiError } from '@/lib/api-error';
import { useProjectEndStep } from '../api/projects';

const STEPS = {
  close: {
    button: 'Close project',
    title: 'Close this project?',
    says: 'Closing says the project is done: no more pairings or sacs. Payments, receipt confirmations and ledger corrections still go in. A closed project cannot be reopened.',
  },
  reopen: {
    button: 'Reopen',
    title: 'Reopen this project?',
    says: 'The early end is undone: the project takes pairings and sacs again. The timeline keeps both steps.',
  },
} as const;

function EndStep({ projectId, step }: { projectId: string; step: keyof typeof STEPS }) {
  const [opened, { open, close }] = useDisclosure(false);
  const [message, setMessage] = useState<string | null>(null);
  const run = useProjectEndStep(projectId, step);
  const words = STEPS[step];
  const confirm = async () => {
    setMessage(null);
    try {
      await run.mutateAsync();
      close();
    } catch (e) {
      setMessage(isApiError(e) ? e.message : 'That did not work. Please try again.');
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
