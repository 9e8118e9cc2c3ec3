import { Button, Group } from '@mantine/core';
import { FormActions } from '@/components/ui/form-actions';
import { useWords } from '@/lib/i18n';

/** The end of a form in a modal: the app's form actions, then a way out. */
export function ModalFormEnd({
  message,
  loading,
  submitLabel,
  onCancel,
}: {
  message: string | null;
  loading: boolean;
  submitLabel: string;
  onCancel: () => void;
}) {
  const t = useWords();
  return (
    <>
      <FormActions message={message} loading={loading} submitLabel={submitLabel} />
      <Group>
        <Button variant="default" onClick={onCancel}>
          {t('page.shell.cancel')}
        </Button>
      </Group>
    </>
  );
}
