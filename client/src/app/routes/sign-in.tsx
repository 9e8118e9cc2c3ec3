import { useNavigate, useSearchParams } from 'react-router-dom';
import { PublicLayout } from '@/components/layouts/public-layout';
import { SignInForm } from '@/features/auth/components/sign-in-form';

/** Only same-site paths are followed after sign-in. */
function safeNext(next: string | null): string {
  return next && next.startsWith('/') && !next.startsWith('//') ? next : '/';
}

export function Component() {
  const navigate = useNavigate();
  const [params] = useSearchParams();
  return (
    <PublicLayout title="Sign in to Broodsilk" subtitle="Your pairings, sacs and partner accounts in one place.">
      <SignInForm onSignedIn={() => navigate(safeNext(params.get('next')), { replace: true })} />
    </PublicLayout>
  );
}
