import { Alert, Anchor, Stack, Text } from '@mantine/core';
import { useState } from 'react';
import { Link } from 'react-router';
import type { EmailConfirmationResult } from '@broodsilk/shared';
import { FormActions } from '@/components/ui/form-actions';
import { errorMessage } from '@/lib/form-errors';
import { useWords } from '@/lib/i18n';
import { useConfirmEmail } from '../api/session';

interface ConfirmEmailProps {
  token: string;
  /** Where a signed-in reader goes on: the joined project, or home. */
  onSignedIn: (result: EmailConfirmationResult) => void;
  signInHref: string;
  homeHref: string;
}

/**
 * The page the confirmation e-mail links to. It confirms only when the reader presses the button,
 * so a mail scanner that opens links starts no session.
 */
export function ConfirmEmail({ token, onSignedIn, signInHref, homeHref }: ConfirmEmailProps) {
  const t = useWords();
  const confirm = useConfirmEmail();
  const [done, setDone] = useState<EmailConfirmationResult | null>(null);

  if (!token) return <Alert color="clay">{t('page.auth.confirm.missingToken')}</Alert>;
  if (done) {
    if (!done.session) {
      return (
        <Stack>
          <Alert color="moss" role="status">
            {t('page.auth.confirm.confirmedSignIn')}
          </Alert>
          <Anchor component={Link} to={signInHref}>
            {t('page.auth.confirm.signIn')}
          </Anchor>
        </Stack>
      );
    }
    return (
      <Stack>
        <Alert color={done.invitationProblem ? 'clay' : 'moss'} role="status">
          {done.invitationProblem ? t('page.auth.confirm.invitationProblem', { problem: done.invitationProblem }) : t('page.auth.confirm.awaitingOwner')}
        </Alert>
        <Anchor component={Link} to={homeHref}>
          {t('page.auth.confirm.goOn')}
        </Anchor>
      </Stack>
    );
  }
  return (
    <form
      onSubmit={(e) => {
        e.preventDefault();
        confirm.mutate(
          { token },
          {
            onSuccess: (result) => {
              // A plain confirmation, or a joined project, goes straight on; anything to read stays on this page.
              if (result.session && !result.invitationProblem && result.invitation?.status !== 'awaiting-owner') onSignedIn(result);
              else setDone(result);
            },
          },
        );
      }}
    >
      <Stack>
        <Text>{t('page.auth.confirm.intro')}</Text>
        <FormActions message={confirm.isError ? errorMessage(confirm.error) : null} loading={confirm.isPending} submitLabel={t('page.auth.confirm.button')} />
      </Stack>
    </form>
  );
}
