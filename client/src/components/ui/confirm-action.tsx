import { Alert, Button, Group, Modal, Stack } from '@mantine/core';
import type { ReactNode } from 'react';
import { useWords } from '@/lib/i18n';

interface ConfirmActionProps {
  opened: boolean;
  onClose: () => void;
  title: string;
  /** What the action will do, in words, and any fields it needs (e.g. when it happened). */
  children: ReactNode;
  /** A warning that does not stop the action (e.g. outside the usual window). */
  warning?: ReactNode;
  /** The server's refusal, if any. */
  message?: string | null;
  confirmLabel: string;
  pending: boolean;
  /** False while a field in the dialog is refused. */
  ready?: boolean;
  onConfirm: () => void;
}

/** Asks once before an action that cannot be taken back; the confirm button is disabled while it runs. */
export function ConfirmAction({ opened, onClose, title, children, warning, message, confirmLabel, pending, ready = true, onConfirm }: ConfirmActionProps) {
  const t = useWords();
  return (
    <Modal opened={opened} onClose={onClose} title={title} centered>
      <Stack>
        {children}
        {warning && (
          <Alert color="amber" variant="light" title={t('page.shell.checkBeforeGoingOn')} data-testid="confirm-warning">
            {warning}
          </Alert>
        )}
        {message && (
          <Alert color="clay" role="alert">
            {message}
          </Alert>
        )}
        <Group justify="flex-end">
          <Button variant="default" onClick={onClose} disabled={pending}>
            {t('page.shell.notNow')}
          </Button>
          <Button onClick={onConfirm} loading={pending} disabled={pending || !ready}>
            {confirmLabel}
          </Button>
        </Group>
      </Stack>
    </Modal>
  );
}
