import { Alert, Button, Group } from '@mantine/core';
import { useWords } from '@/lib/i18n';

interface FormActionsProps {
  /** The server's refusal, if any. */
  message: string | null | undefined;
  /** While the request is under way the button is disabled, so a double tap sends once. */
  loading: boolean;
  submitLabel: string;
  onCancel?: () => void;
  cancelLabel?: string;
}

/** The end of every form: the server's refusal, if any, then cancel and submit. */
export function FormActions({ message, loading, submitLabel, onCancel, cancelLabel }: FormActionsProps) {
  const t = useWords();
  return (
    <>
      {message && (
        <Alert color="clay" role="alert">
          {message}
        </Alert>
      )}
      <Group justify={onCancel ? 'flex-end' : undefined}>
        {onCancel && (
          <Button variant="default" onClick={onCancel} disabled={loading}>
            {cancelLabel ?? t('page.shell.cancel')}
          </Button>
        )}
        <Button type="submit" loading={loading} disabled={loading}>
          {submitLabel}
        </Button>
      </Group>
    </>
  );
}
