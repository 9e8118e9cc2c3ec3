import type { QueryClient } from '@tanstack/react-query';
import { createBrowserRouter, redirect } from 'react-router';
import { APP_PAGE_ALIASES } from '@broodsilk/shared';
import { paths } from '@/config/paths';
import { PageLoader } from '@/components/ui/page-loader';
import { lazyRoutes } from './lazy-route';
import { RouteError } from './routes/route-error';

/** Route modules are loaded lazily; loaders get the query client to prefetch with. */
export function createRouter(queryClient: QueryClient) {
  const lazy = lazyRoutes(queryClient);
  return createBrowserRouter([
    {
      path: paths.home.path,
      ErrorBoundary: RouteError,
      HydrateFallback: PageLoader,
      lazy: lazy(() => import('./routes/protected-layout')),
      children: [
        { index: true, lazy: lazy(() => import('./routes/home')) },
        { path: paths.settings.path, lazy: lazy(() => import('./routes/settings')) },
        { path: paths.notifications.path, lazy: lazy(() => import('./routes/notifications')) },
        { path: paths.collection.path, lazy: lazy(() => import('./routes/collection')) },
        { path: paths.animal.path, ErrorBoundary: RouteError, lazy: lazy(() => import('./routes/animal')) },
        { path: paths.species.path, lazy: lazy(() => import('./routes/species')) },
        { path: paths.projects.path, lazy: lazy(() => import('./routes/projects')) },
        { path: paths.newProject.path, lazy: lazy(() => import('./routes/project-new')) },
        { path: paths.project.path, ErrorBoundary: RouteError, lazy: lazy(() => import('./routes/project')) },
        { path: paths.projectAccount.path, ErrorBoundary: RouteError, lazy: lazy(() => import('./routes/project-account')) },
        { path: paths.payouts.path, lazy: lazy(() => import('./routes/payouts')) },
        { path: paths.sac.path, ErrorBoundary: RouteError, lazy: lazy(() => import('./routes/sac')) },
        { path: paths.incubator.path, lazy: lazy(() => import('./routes/incubator')) },
        { path: paths.incubatorSac.path, ErrorBoundary: RouteError, lazy: lazy(() => import('./routes/incubator-sac')) },
      ],
    },
    { path: paths.signIn.path, ErrorBoundary: RouteError, lazy: lazy(() => import('./routes/sign-in')) },
    // Addresses people guess (/login) lead to the page they mean instead of to the 404 page.
    ...Object.entries(APP_PAGE_ALIASES).map(([path, to]) => ({ path, loader: () => redirect(to) })),
    { path: paths.register.path, ErrorBoundary: RouteError, lazy: lazy(() => import('./routes/register')) },
    { path: paths.forgotPassword.path, ErrorBoundary: RouteError, lazy: lazy(() => import('./routes/forgot-password')) },
    { path: paths.resetPassword.path, ErrorBoundary: RouteError, lazy: lazy(() => import('./routes/reset-password')) },
    { path: paths.confirmEmail.path, ErrorBoundary: RouteError, lazy: lazy(() => import('./routes/confirm-email')) },
    { path: paths.invitation.path, ErrorBoundary: RouteError, lazy: lazy(() => import('./routes/invitation')) },
    { path: paths.progress.path, ErrorBoundary: RouteError, lazy: lazy(() => import('./routes/progress')) },
    { path: '*', lazy: lazy(() => import('./routes/not-found')) },
  ]);
}
