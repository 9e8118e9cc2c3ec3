import { useNavigate, useSearchParams } from 'react-router';
import { PublicLayout } from '@/components/layouts/public-layout';
import { RegisterForm } from '@/features/auth/components/register-form';
import { paths } from '@/config/paths';
import { safeNext } from './safe-next';

export function Component() {
  const navigate = useNavigate();
  const [params] = useSearchParams();
  return (
    <PublicLayout title="Create your account" subtitle="Free for keepers. Invite partners when a pairing is planned.">
      <RegisterForm
        onRegistered={() => navigate(safeNext(params.get('next')), { replace: true })}
        signInHref={paths.signIn.href(params.get('next') ? safeNext(params.get('next')) : undefined)}
      />
    </PublicLayout>
  );
}
