import { Alert, Button, Stack, Text } from '@mantine/core';
import { EMAIL_CONFIRMATION_HOURS } from '@broodsilk/shared';
import { errorMessage } from '@/lib/form-errors';
import { useWords } from '@/lib/i18n';
import { useResendConfirmation } from '../api/session';

/** "Send the e-mail again" for an address still waiting for its confirmation; the answer is the same for any address. */
export function ResendConfirmation({ email }: { email: string }) {
  const t = useWords();
  const resend = useResendConfirmation();
  return (
    <Stack gap="xs">
      <Button variant="light" w="fit-content" loading={resend.isPending} disabled={resend.isSuccess} onClick={() => resend.mutate({ email })}>
        {t('page.auth.sendAgain')}
      </Button>
      {resend.isSuccess ? (
        <Text size="sm" role="status">
          {t('page.auth.sentAgain', { hours: EMAIL_CONFIRMATION_HOURS })}
        </Text>
      ) : null}
      {resend.isError ? (
        <Alert color="clay" role="alert">
          {errorMessage(resend.error)}
        </Alert>
      ) : null}
    </Stack>
  );
}
