import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import type { BroodCountRequest, BroodCountResponse, BroodCountsResponse } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { queryRoots } from '@/lib/query-keys';
import { AFTER_SAC_CHANGE, sacQueries } from './sacs';

export function fetchBroodCounts(sacId: string, signal?: AbortSignal): Promise<BroodCountsResponse> {
  return api.get<BroodCountsResponse>(`/sacs/${sacId}/counts`, { signal });
}

/** ['sacs','brood',sacId] */
export const broodQueries = {
  counts: (sacId: string) =>
    queryOptions({
      queryKey: [...sacQueries.all(), 'brood', sacId] as const,
      queryFn: ({ signal }) => fetchBroodCounts(sacId, signal),
    }),
};

export function useBroodCounts(sacId: string, enabled = true) {
  return useQuery({ ...broodQueries.counts(sacId), enabled });
}

export function useRecordBroodCount(sacId: string) {
  return useMutation({
    mutationFn: (body: BroodCountRequest) => api.post<BroodCountResponse>(`/sacs/${sacId}/counts`, body),
    // A count (or its correction) changes the shares of the project's account.
    meta: { handlesErrors: true, invalidates: [...AFTER_SAC_CHANGE, queryRoots.account] },
  });
}
