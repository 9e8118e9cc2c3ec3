import { Alert, Button, Stack, Text } from '@mantine/core';
import { useState } from 'react';
import { Link } from 'react-router';
import type { AcceptInvitationResponse, InvitationPreview } from '@broodsilk/shared';
import { Trans } from 'react-i18next';
import { isApiError } from '@/lib/api-error';
import { useWords } from '@/lib/i18n';
import { useAcceptInvitation } from '../api/invitation';

interface InvitationCardProps {
  token: string;
  preview: InvitationPreview;
  signedInAs: string | null;
  signInHref: string;
  registerHref: string;
  onJoined: (r: AcceptInvitationResponse) => void;
}

/** What an invitation offers and the one action: join (after signing in, if needed). */
export function InvitationCard({ token, preview, signedInAs, signInHref, registerHref, onJoined }: InvitationCardProps) {
  const t = useWords();
  const accept = useAcceptInvitation(token);
  const [error, setError] = useState<string | null>(null);
  const [waiting, setWaiting] = useState(false);
  return (
    <Stack data-testid="invitation">
      <Text>
        {/* The names go in as elements, not as values, so a title with angle brackets is shown as typed. */}
        <Trans
          i18nKey={`page.invitations.invites.${preview.role}`}
          components={{ inviter: <b>{preview.inviterName}</b>, project: <b>{preview.projectTitle}</b> }}
        />
      </Text>
      {!preview.valid ? (
        <Alert color="clay" title={t('page.invitations.noLongerWorks')}>
          {preview.problem ?? t('page.invitations.askForNew')}
        </Alert>
      ) : waiting ? (
        <Alert color="moss" title={t('page.invitations.waitingTitle')} data-testid="invitation-waiting">
          {t('page.invitations.waiting')}
        </Alert>
      ) : signedInAs ? (
        <>
          <Text size="sm" c="dimmed">
            {t('page.invitations.signedInAs', { who: signedInAs })}
          </Text>
          {error && (
            <Alert color="clay" role="alert">
              {error}
            </Alert>
          )}
          <Button
            size="md"
            loading={accept.isPending}
            onClick={async () => {
              setError(null);
              try {
                const result = await accept.mutateAsync();
                if (result.status === 'awaiting-owner') setWaiting(true);
                else onJoined(result);
              } catch (e) {
                setError(isApiError(e) ? e.message : t('page.invitations.joinFailed'));
              }
            }}
          >
            {t('page.invitations.join')}
          </Button>
        </>
      ) : (
        <>
          <Text size="sm">{t('page.invitations.signInFirst')}</Text>
          <Button component={Link} to={signInHref} size="md">
            {t('page.invitations.signIn')}
          </Button>
          <Button component={Link} to={registerHref} variant="light">
            {t('page.auth.createAccount')}
          </Button>
        </>
      )}
    </Stack>
  );
}
