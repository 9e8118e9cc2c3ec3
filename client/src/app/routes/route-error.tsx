import { isRouteErrorResponse, useRouteError } from 'react-router';
import { ErrorPage } from '@/components/ui/error-page';
import { isApiError } from '@/lib/api-error';
import { useWords } from '@/lib/i18n';

/** Root and local error boundary: a missing record is a real 404 page. */
export function RouteError() {
  const t = useWords();
  const error = useRouteError();
  const status = isRouteErrorResponse(error) ? error.status : isApiError(error) ? error.statusCode : undefined;
  if (status === 404) return <ErrorPage status={404} title={t('page.shell.errorPage.notFound')} message={t('page.shell.errorPage.noSuchRecord')} />;
  if (status === 403) return <ErrorPage status={403} title={t('page.shell.errorPage.notAllowed')} message={t('page.shell.errorPage.roleForbids')} />;
  const message = error instanceof Error ? error.message : t('page.shell.errorPage.failedLoading');
  return <ErrorPage status={status} title={t('page.shell.errorPage.failed')} message={message} />;
}
