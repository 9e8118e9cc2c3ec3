import { queryOptions, useQuery } from '@tanstack/react-query';
import type { BalancesResponse } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { accountKeys } from './keys';

export function fetchBalances(projectId: string, signal?: AbortSignal): Promise<BalancesResponse> {
  return api.get<BalancesResponse>(`/projects/${projectId}/balances`, { signal });
}

export const balancesQueries = {
  detail: (projectId: string) =>
    queryOptions({
      queryKey: accountKeys.balances(projectId),
      queryFn: ({ signal }) => fetchBalances(projectId, signal),
    }),
};

export function useBalances(projectId: string) {
  return useQuery(balancesQueries.detail(projectId));
}
