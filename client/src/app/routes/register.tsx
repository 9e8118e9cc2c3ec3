import { matchPath, useSearchParams } from 'react-router';
import { PublicLayout } from '@/components/layouts/public-layout';
import { RegisterForm } from '@/features/auth/components/register-form';
import { paths } from '@/config/paths';
import { safeNext } from './safe-next';
import { useWords } from '@/lib/i18n';

export function Component() {
  const t = useWords();
  const [params] = useSearchParams();
  const next = params.get('next') ? safeNext(params.get('next')) : undefined;
  // Registering from an invitation: the confirmation e-mail carries it, and confirming accepts it.
  const invitationToken = next ? matchPath(paths.invitation.path, next)?.params.token : undefined;
  return (
    <PublicLayout title={t('page.auth.registerTitle')} subtitle={t('page.auth.registerSubtitle')}>
      <RegisterForm signInHref={paths.signIn.href(next)} invitationToken={invitationToken} />
    </PublicLayout>
  );
}
