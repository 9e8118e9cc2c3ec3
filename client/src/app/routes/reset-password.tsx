import { useNavigate, useSearchParams } from 'react-router';
import { notifications } from '@mantine/notifications';
import { PublicLayout } from '@/components/layouts/public-layout';
import { ResetPasswordForm } from '@/features/auth/components/reset-password-form';
import { paths } from '@/config/paths';
import { useWords } from '@/lib/i18n';

export function Component() {
  const t = useWords();
  const [params] = useSearchParams();
  const navigate = useNavigate();
  return (
    <PublicLayout title={t('page.auth.resetTitle')}>
      <ResetPasswordForm
        token={params.get('token') ?? ''}
        onDone={() => {
          notifications.show({ color: 'moss', message: t('page.auth.passwordSet') });
          navigate(paths.signIn.href(), { replace: true });
        }}
      />
    </PublicLayout>
  );
}
