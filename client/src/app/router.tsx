import type { QueryClient } from '@tanstack/react-query';
import { createBrowserRouter, redirect } from 'react-router-dom';
import { paths } from '@/config/paths';
import { RouteError } from './routes/route-error';
import { PageLoader } from '@/components/ui/page-loader';

/** Route modules are loaded lazily; loaders get the query client to prefetch with. */
export function createRouter(queryClient: QueryClient) {
  return createBrowserRouter([
    {
      path: paths.home.path,
      ErrorBoundary: RouteError,
      HydrateFallback: PageLoader,
      lazy: async () => {
        const m = await import('./routes/protected-layout');
        return { Component: m.Component, loader: m.clientLoader(queryClient) };
      },
      children: [
        {
          index: true,
          lazy: async () => {
            const m = await import('./routes/home');
            return { Component: m.Component, loader: m.clientLoader(queryClient) };
          },
        },
        { path: paths.settings.path, lazy: () => import('./routes/settings') },
        {
          path: paths.collection.path,
          lazy: async () => {
            const m = await import('./routes/collection');
            return { Component: m.Component, loader: m.clientLoader(queryClient), shouldRevalidate: m.shouldRevalidate };
          },
        },
        {
          path: paths.animal.path,
          ErrorBoundary: RouteError,
          lazy: async () => {
            const m = await import('./routes/animal');
            return { Component: m.Component, loader: m.clientLoader(queryClient) };
          },
        },
        { path: paths.species.path, lazy: () => import('./routes/species') },
        {
          path: paths.projects.path,
          lazy: async () => {
            const m = await import('./routes/projects');
            return { Component: m.Component, loader: m.clientLoader(queryClient) };
          },
        },
        { path: paths.newProject.path, lazy: () => import('./routes/project-new') },
        {
          path: paths.project.path,
          ErrorBoundary: RouteError,
          lazy: async () => {
            const m = await import('./routes/project');
            return { Component: m.Component, loader: m.clientLoader(queryClient) };
          },
        },
        {
          path: paths.projectAccount.path,
          ErrorBoundary: RouteError,
          lazy: async () => {
            const m = await import('./routes/project-account');
            return { Component: m.Component, loader: m.clientLoader(queryClient) };
          },
        },
        { path: paths.payouts.path, lazy: () => import('./routes/payouts') },
        {
          path: paths.sac.path,
          ErrorBoundary: RouteError,
          lazy: async () => {
            const m = await import('./routes/sac');
            return { Component: m.Component, loader: m.clientLoader(queryClient) };
          },
        },
        { path: paths.incubator.path, lazy: () => import('./routes/incubator') },
        {
          path: paths.incubatorSac.path,
          ErrorBoundary: RouteError,
          lazy: async () => {
            const m = await import('./routes/incubator-sac');
            return { Component: m.Component, loader: m.clientLoader(queryClient) };
          },
        },
      ],
    },
    { path: paths.signIn.path, lazy: () => import('./routes/sign-in'), ErrorBoundary: RouteError },
    // The usual guess for the sign-in address leads there instead of to the 404 page.
    { path: '/login', loader: () => redirect(paths.signIn.href()) },
    { path: paths.register.path, lazy: () => import('./routes/register'), ErrorBoundary: RouteError },
    { path: paths.forgotPassword.path, lazy: () => import('./routes/forgot-password'), ErrorBoundary: RouteError },
    { path: paths.resetPassword.path, lazy: () => import('./routes/reset-password'), ErrorBoundary: RouteError },
    { path: paths.invitation.path, lazy: () => import('./routes/invitation'), ErrorBoundary: RouteError },
    { path: '*', lazy: () => import('./routes/not-found') },
  ]);
}
