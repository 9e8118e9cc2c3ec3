import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ProgressView } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { queryRoots } from '@/lib/query-keys';

/** The outside party's page: the token in the address is the permission, nobody signs in. */
export function fetchProgress(token: string, signal?: AbortSignal): Promise<ProgressView> {
  return api.get<ProgressView>(`/progress/${encodeURIComponent(token)}`, { signal, allowAnonymous: true });
}

/** ['progress', token] */
export const progressQueries = {
  view: (token: string) =>
    queryOptions({
      queryKey: [...queryRoots.progress, token] as const,
      queryFn: ({ signal }) => fetchProgress(token, signal),
    }),
};

export function useProgress(token: string) {
  return useQuery(progressQueries.view(token));
}
