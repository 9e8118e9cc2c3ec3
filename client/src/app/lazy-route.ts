import type { QueryClient } from '@tanstack/react-query';
import type { ComponentType } from 'react';
import type { LoaderFunction, ShouldRevalidateFunction } from 'react-router';

/** What a route module in `routes/` exports: its page, and optionally a loader that gets the query client. */
export interface RouteModule {
  Component: ComponentType;
  clientLoader?: (queryClient: QueryClient) => LoaderFunction;
  shouldRevalidate?: ShouldRevalidateFunction;
}

/** Makes the `lazy` of each route: the module loads on first visit, and its loader is handed the query client. */
export function lazyRoutes(queryClient: QueryClient) {
  return (load: () => Promise<RouteModule>) => async () => {
    const { Component, clientLoader, shouldRevalidate } = await load();
    return { Component, ...(clientLoader && { loader: clientLoader(queryClient) }), ...(shouldRevalidate && { shouldRevalidate }) };
  };
}
