import { useNavigate, useSearchParams } from 'react-router';
import { PublicLayout } from '@/components/layouts/public-layout';
import { RegisterForm } from '@/features/auth/components/register-form';
import { paths } from '@/config/paths';
import { safeNext } from './safe-next';
import { useWords } from '@/lib/i18n';

export function Component() {
  const t = useWords();
  const navigate = useNavigate();
  const [params] = useSearchParams();
  return (
    <PublicLayout title={t('page.auth.registerTitle')} subtitle={t('page.auth.registerSubtitle')}>
      <RegisterForm
        onRegistered={() => navigate(safeNext(params.get('next')), { replace: true })}
        signInHref={paths.signIn.href(params.get('next') ? safeNext(params.get('next')) : undefined)}
      />
    </PublicLayout>
  );
}
