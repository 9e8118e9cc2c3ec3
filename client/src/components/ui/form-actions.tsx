import { Alert, Button, Group } from '@mantine/core';

/** The end of every form: the server's refusal, if any, then the submit button. */
export function FormActions({ message, loading, submitLabel }: { message: string | null | undefined; loading: boolean; submitLabel: string }) {
  return (
    <>
      {message && (
        <Alert color="clay" role="alert">
          {message}
        </Alert>
      )}
      <Group>
        <Button type="submit" loading={loading}>
          {submitLabel}
        </Button>
      </Group>
    </>
  );
}
