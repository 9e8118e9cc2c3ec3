import { Alert } from '@mantine/core';
import { useNavigate, useParams } from 'react-router';
import { PublicLayout } from '@/components/layouts/public-layout';
import { PageLoader } from '@/components/ui/page-loader';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/me';
import { useInvitationPreview } from '@/features/invitations/api/invitation';
import { InvitationCard } from '@/features/invitations/components/invitation-card';

export function Component() {
  const { token } = useParams() as { token: string };
  const navigate = useNavigate();
  const me = useMe();
  const preview = useInvitationPreview(token);
  const here = paths.invitation.href(token);
  return (
    <PublicLayout title="You are invited" subtitle="A breeding project on Broodsilk">
      {preview.isPending || me.isPending ? (
        <PageLoader />
      ) : preview.isError ? (
        <Alert color="clay">{preview.error.message}</Alert>
      ) : (
        <InvitationCard
          token={token}
          preview={preview.data}
          signedInAs={me.data ? `${me.data.displayName} (${me.data.email})` : null}
          signInHref={paths.signIn.href(here)}
          registerHref={paths.register.href(here)}
          onJoined={(r) => navigate(paths.project.href(r.projectId), { replace: true })}
        />
      )}
    </PublicLayout>
  );
}
