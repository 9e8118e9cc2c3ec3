import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import type { KeptBackBatchResponse, KeptBackEndRequest, KeptBackLogRequest } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { queryRoots } from '@/lib/query-keys';
import { AFTER_SAC_CHANGE, sacQueries } from './sacs';

/** The eggs kept back at the opening; ask only for a sac whose opening kept some back (else 404). */
export function fetchKeptBack(sacId: string, signal?: AbortSignal): Promise<KeptBackBatchResponse> {
  return api.get<KeptBackBatchResponse>(`/sacs/${sacId}/kept-back`, { signal });
}

/** ['sacs','kept-back',sacId] */
export const keptBackQueries = {
  detail: (sacId: string) =>
    queryOptions({
      queryKey: [...sacQueries.all(), 'kept-back', sacId] as const,
      queryFn: ({ signal }) => fetchKeptBack(sacId, signal),
    }),
};

export function useKeptBack(sacId: string, enabled: boolean) {
  return useQuery({ ...keptBackQueries.detail(sacId), enabled });
}

export function useLogKeptBack(sacId: string) {
  return useMutation({
    mutationFn: (body: KeptBackLogRequest) => api.post<KeptBackBatchResponse>(`/sacs/${sacId}/kept-back/log`, body),
    meta: { handlesErrors: true, invalidates: [keptBackQueries.detail(sacId).queryKey, queryRoots.projects] },
  });
}

/** Ending the batch may let the brood grow (joined), so the sac, its counts and the shares refresh. */
export function useEndKeptBack(sacId: string) {
  return useMutation({
    mutationFn: (body: KeptBackEndRequest) => api.post<KeptBackBatchResponse>(`/sacs/${sacId}/kept-back/end`, body),
    meta: { handlesErrors: true, invalidates: [...AFTER_SAC_CHANGE, queryRoots.account] },
  });
}
