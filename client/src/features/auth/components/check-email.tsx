import { Alert, Stack, Text } from '@mantine/core';
import { EMAIL_CONFIRMATION_HOURS } from '@broodsilk/shared';
import { useWords } from '@/lib/i18n';
import { ResendConfirmation } from './resend-confirmation';

/** What the register form shows once it is sent: the next step is in the e-mail, whatever the address. */
export function CheckEmail({ email, withInvitation }: { email: string; withInvitation: boolean }) {
  const t = useWords();
  return (
    <Stack>
      <Alert color="moss" title={t('page.auth.checkEmail.title')} role="status">
        {t('page.auth.checkEmail.body', { email, hours: EMAIL_CONFIRMATION_HOURS })}
      </Alert>
      {withInvitation ? <Text>{t('page.auth.checkEmail.invitation')}</Text> : null}
      <Text size="sm">{t('page.auth.checkEmail.nothingCame')}</Text>
      <ResendConfirmation email={email} />
    </Stack>
  );
}
