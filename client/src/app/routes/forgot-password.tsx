import { PublicLayout } from '@/components/layouts/public-layout';
import { ForgotPasswordForm } from '@/features/auth/components/forgot-password-form';

export function Component() {
  return (
    <PublicLayout title="Reset your password" subtitle="We e-mail you a link that works once, within 45 minutes.">
      <ForgotPasswordForm />
    </PublicLayout>
  );
}
