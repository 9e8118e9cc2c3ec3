import { MutationCache, QueryClient, type QueryKey } from '@tanstack/react-query';
import { notifications } from '@mantine/notifications';
import { isApiError } from './api-error';

/**
 * Mutations show their failure unless the form handles it (meta.handlesErrors), and after success
 * refresh every query under the keys in meta.invalidates (awaited, so `mutateAsync` resolves on fresh data).
 */
export function createQueryClient(): QueryClient {
  const queryClient: QueryClient = new QueryClient({
    defaultOptions: {
      queries: { staleTime: 30_000, retry: (count, error) => !(isApiError(error) && error.statusCode < 500) && count < 2, refetchOnWindowFocus: false },
    },
    mutationCache: new MutationCache({
      onSuccess: async (_data, _vars, _ctx, mutation) => {
        await Promise.all((mutation.meta?.invalidates ?? []).map((queryKey) => queryClient.invalidateQueries({ queryKey })));
      },
      onError: (error, _vars, _ctx, mutation) => {
        if (mutation.meta?.handlesErrors) return;
        notifications.show({ color: 'clay', title: 'That did not work', message: error.message });
      },
    }),
  });
  return queryClient;
}

declare module '@tanstack/react-query' {
  interface Register {
    mutationMeta: {
      /** The form shows the error itself; no notification. */
      handlesErrors?: boolean;
      /** Keys whose queries are refreshed after the mutation succeeds (a root from `queryRoots` or a feature's own key). */
      invalidates?: readonly QueryKey[];
    };
  }
}
