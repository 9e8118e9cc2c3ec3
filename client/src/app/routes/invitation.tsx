import { Alert } from '@mantine/core';
import { useNavigate, useParams } from 'react-router';
import { PublicLayout } from '@/components/layouts/public-layout';
import { PageLoader } from '@/components/ui/page-loader';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/me';
import { useInvitationPreview } from '@/features/invitations/api/invitation';
import { InvitationCard } from '@/features/invitations/components/invitation-card';
import { useWords } from '@/lib/i18n';

export function Component() {
  const { token } = useParams() as { token: string };
  const t = useWords();
  const navigate = useNavigate();
  const me = useMe();
  const preview = useInvitationPreview(token);
  const here = paths.invitation.href(token);
  return (
    <PublicLayout title={t('page.invitations.title')} subtitle={t('page.invitations.subtitle')}>
      {preview.isPending || me.isPending ? (
        <PageLoader />
      ) : preview.isError ? (
        <Alert color="clay">{preview.error.message}</Alert>
      ) : (
        <InvitationCard
          token={token}
          preview={preview.data}
          signedInAs={me.data ? t('page.invitations.who', { name: me.data.displayName, email: me.data.email }) : null}
          signInHref={paths.signIn.href(here)}
          registerHref={paths.register.href(here)}
          onJoined={(r) => navigate(paths.project.href(r.projectId), { replace: true })}
        />
      )}
    </PublicLayout>
  );
}
