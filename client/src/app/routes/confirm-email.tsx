import { useNavigate, useSearchParams } from 'react-router';
import { PublicLayout } from '@/components/layouts/public-layout';
import { ConfirmEmail } from '@/features/auth/components/confirm-email';
import { paths } from '@/config/paths';
import { useWords } from '@/lib/i18n';

export function Component() {
  const t = useWords();
  const [params] = useSearchParams();
  const navigate = useNavigate();
  return (
    <PublicLayout title={t('page.auth.confirm.title')} subtitle={t('page.auth.confirm.subtitle')}>
      <ConfirmEmail
        token={params.get('token') ?? ''}
        signInHref={paths.signIn.href()}
        homeHref={paths.home.href()}
        onSignedIn={(r) => navigate(r.invitation ? paths.project.href(r.invitation.projectId) : paths.home.href(), { replace: true })}
      />
    </PublicLayout>
  );
}
