import { MutationCache, QueryClient } from '@tanstack/react-query';
import { notifications } from '@mantine/notifications';
import { isApiError } from './api-error';

/** Mutations show their failure unless the form handles it (meta.handlesErrors). */
export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: { staleTime: 30_000, retry: (count, error) => !(isApiError(error) && error.statusCode < 500) && count < 2, refetchOnWindowFocus: false },
    },
    mutationCache: new MutationCache({
      onError: (error, _vars, _ctx, mutation) => {
        if (mutation.meta?.handlesErrors) return;
        notifications.show({ color: 'clay', title: 'That did not work', message: error.message });
      },
    }),
  });
}

declare module '@tanstack/react-query' {
  interface Register {
    mutationMeta: { handlesErrors?: boolean };
  }
}
