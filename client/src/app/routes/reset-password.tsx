import { useNavigate, useSearchParams } from 'react-router';
import { notifications } from '@mantine/notifications';
import { PublicLayout } from '@/components/layouts/public-layout';
import { ResetPasswordForm } from '@/features/auth/components/reset-password-form';
import { paths } from '@/config/paths';

export function Component() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  return (
    <PublicLayout title="Choose a new password">
      <ResetPasswordForm
        token={params.get('token') ?? ''}
        onDone={() => {
          notifications.show({ color: 'moss', message: 'Password set. Sign in with it now.' });
          navigate(paths.signIn.href(), { replace: true });
        }}
      />
    </PublicLayout>
  );
}
