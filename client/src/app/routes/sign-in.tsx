import { useNavigate, useSearchParams } from 'react-router';
import { PublicLayout } from '@/components/layouts/public-layout';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { safeNext } from './safe-next';
import { paths } from '@/config/paths';

export function Component() {
  const navigate = useNavigate();
  const [params] = useSearchParams();
  return (
    <PublicLayout title="Sign in to Broodsilk" subtitle="Your pairings, sacs and partner accounts in one place.">
      <SignInForm
        onSignedIn={() => navigate(safeNext(params.get('next')), { replace: true })}
        registerHref={paths.register.href(params.get('next') ? safeNext(params.get('next')) : undefined)}
      />
    </PublicLayout>
  );
}
