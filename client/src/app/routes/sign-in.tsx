import { useNavigate, useSearchParams } from 'react-router';
import { useQueryClient } from '@tanstack/react-query';
import type { Me } from '@broodsilk/shared';
import { meQueryKey } from '@/lib/query-keys';
import { PublicLayout } from '@/components/layouts/public-layout';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { safeNext } from './safe-next';
import { paths } from '@/config/paths';
import { useWords } from '@/lib/i18n';

/** An administrator who must set up a second factor is sent to it before anything else. */
const mustEnrol = (me: Me | null | undefined) => !!me && me.secondFactorRequired && !me.secondFactorEnabled;

export function Component() {
  const t = useWords();
  const navigate = useNavigate();
  const qc = useQueryClient();
  const [params] = useSearchParams();
  return (
    <PublicLayout title={t('page.auth.signInTitle')} subtitle={t('page.auth.signInSubtitle')}>
      <SignInForm
        onSignedIn={() =>
          navigate(mustEnrol(qc.getQueryData<Me | null>(meQueryKey)) ? `${paths.settings.href()}#security` : safeNext(params.get('next')), { replace: true })
        }
        registerHref={paths.register.href(params.get('next') ? safeNext(params.get('next')) : undefined)}
      />
    </PublicLayout>
  );
}
