import { Alert } from '@mantine/core';
import { useParams } from 'react-router';
import { PublicLayout } from '@/components/layouts/public-layout';
import { PageLoader } from '@/components/ui/page-loader';
import { browserTimeZone } from '@/components/fields/time-zone-field';
import { isApiError } from '@/lib/api-error';
import { useWords } from '@/lib/i18n';
import { useProgress } from '@/features/progress/api/progress';
import { ProgressView } from '@/features/progress/components/progress-view';

/** The outside party's read-only page: no sign-in, the token in the address is the permission. */
export function Component() {
  const { token } = useParams() as { token: string };
  const t = useWords();
  const progress = useProgress(token);
  return (
    <PublicLayout
      title={t('page.progress.title')}
      subtitle={progress.data ? t('page.progress.subtitle', { name: progress.data.party.name }) : undefined}
      size={720}
    >
      {progress.isPending ? (
        <PageLoader />
      ) : progress.isError ? (
        <Alert color="clay" role="alert">
          {isApiError(progress.error) && progress.error.statusCode === 404 ? t('page.progress.notFound') : progress.error.message}
        </Alert>
      ) : (
        <ProgressView view={progress.data} timeZone={browserTimeZone()} />
      )}
    </PublicLayout>
  );
}
