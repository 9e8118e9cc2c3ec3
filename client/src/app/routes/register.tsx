import { useNavigate, useSearchParams } from 'react-router';
import { PublicLayout } from '@/components/layouts/public-layout';
import { RegisterForm } from '@/features/auth/components/register-form';
import { safeNext } from './safe-next';

export function Component() {
  const navigate = useNavigate();
  const [params] = useSearchParams();
  return (
    <PublicLayout title="Create your account" subtitle="Free for keepers. Invite partners when a pairing is planned.">
      <RegisterForm onRegistered={() => navigate(safeNext(params.get('next')), { replace: true })} />
    </PublicLayout>
  );
}
