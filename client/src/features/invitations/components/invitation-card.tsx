import { Alert, Button, Stack, Text } from '@mantine/core';
import { useState } from 'react';
import { Link } from 'react-router';
import type { AcceptInvitationResponse, InvitationPreview } from '@broodsilk/shared';
import { isApiError } from '@/lib/api-error';
import { useAcceptInvitation } from '../api/invitation';

const ROLE_TEXT = {
  partner: 'a partner (you share in the brood and agree the terms)',
  caretaker: 'the caretaker (you roll the eggs and keep the care log)',
} as const;

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
  const accept = useAcceptInvitation(token);
  const [error, setError] = useState<string | null>(null);
  const [waiting, setWaiting] = useState(false);
  return (
    <Stack data-testid="invitation">
      <Text>
        <b>{preview.inviterName}</b> invites you to the project <b>{preview.projectTitle}</b> as {ROLE_TEXT[preview.role]}.
      </Text>
      {!preview.valid ? (
        <Alert color="clay" title="This invitation no longer works">
          {preview.problem ?? 'Ask the keeper to send a new one.'}
        </Alert>
      ) : waiting ? (
        <Alert color="moss" title="Waiting for the owner" data-testid="invitation-waiting">
          This invitation was sent to another e-mail address, so the project owner must approve your account before you join. You will see the project once they
          have.
        </Alert>
      ) : signedInAs ? (
        <>
          <Text size="sm" c="dimmed">
            Signed in as {signedInAs}.
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
                setError(isApiError(e) ? e.message : 'Joining did not work. Try again.');
              }
            }}
          >
            Join the project
          </Button>
        </>
      ) : (
        <>
          <Text size="sm">Sign in to join. New to Broodsilk? Create an account with the address the invitation went to; you come back here to join.</Text>
          <Button component={Link} to={signInHref} size="md">
            Sign in to join
          </Button>
          <Button component={Link} to={registerHref} variant="light">
            Create an account
          </Button>
        </>
      )}
    </Stack>
  );
}
