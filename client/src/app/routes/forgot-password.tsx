import { PublicLayout } from '@/components/layouts/public-layout';
import { ForgotPasswordForm } from '@/features/auth/components/forgot-password-form';
import { useWords } from '@/lib/i18n';
import { RESET_LINK_MINUTES } from '@broodsilk/shared';

export function Component() {
  const t = useWords();
  return (
    <PublicLayout title={t('page.auth.forgotTitle')} subtitle={t('page.auth.forgotSubtitle', { minutes: RESET_LINK_MINUTES })}>
      <ForgotPasswordForm />
    </PublicLayout>
  );
}
