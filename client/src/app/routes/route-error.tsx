import { isRouteErrorResponse, useRouteError } from 'react-router';
import { ErrorPage } from '@/components/ui/error-page';
import { isApiError } from '@/lib/api-error';

/** Root and local error boundary: a missing record is a real 404 page. */
export function RouteError() {
  const error = useRouteError();
  const status = isRouteErrorResponse(error) ? error.status : isApiError(error) ? error.statusCode : undefined;
  if (status === 404) return <ErrorPage status={404} title="Not found" message="This record does not exist, or it is not yours to see." />;
  if (status === 403) return <ErrorPage status={403} title="Not allowed" message="Your role in this project does not allow this." />;
  const message = error instanceof Error ? error.message : 'Something went wrong while loading this page.';
  return <ErrorPage status={status} title="This page could not be shown" message={message} />;
}
