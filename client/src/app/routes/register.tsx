import { useNavigate } from 'react-router-dom';
import { PublicLayout } from '@/components/layouts/public-layout';
import { RegisterForm } from '@/features/auth/components/register-form';

export function Component() {
  const navigate = useNavigate();
  return (
    <PublicLayout title="Create your account" subtitle="Free for keepers. Invite partners when a pairing is planned.">
      <RegisterForm onRegistered={() => navigate('/', { replace: true })} />
    </PublicLayout>
  );
}
