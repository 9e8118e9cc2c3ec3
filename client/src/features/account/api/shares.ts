import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SharesResponse } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { accountKeys } from './keys';

export function fetchShares(projectId: string, signal?: AbortSignal): Promise<SharesResponse> {
  return api.get<SharesResponse>(`/projects/${projectId}/shares`, { signal });
}

export const sharesQueries = {
  detail: (projectId: string) =>
    queryOptions({
      queryKey: accountKeys.shares(projectId),
      queryFn: ({ signal }) => fetchShares(projectId, signal),
    }),
};

export function useShares(projectId: string) {
  return useQuery(sharesQueries.detail(projectId));
}
