import { queryOptions, useQuery } from '@tanstack/react-query';
import type { DashboardResponse } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { queryRoots } from '@/lib/query-keys';

export function fetchDashboard(signal?: AbortSignal): Promise<DashboardResponse> {
  return api.get<DashboardResponse>('/dashboard', { signal });
}

/** ['dashboard','today']: computed by the server for the viewer's own date and zone. */
export const dashboardQueries = {
  today: () =>
    queryOptions({
      queryKey: [...queryRoots.dashboard, 'today'] as const,
      queryFn: ({ signal }) => fetchDashboard(signal),
      // Rolls fall due by the hour: refresh while the page stays open.
      refetchInterval: 5 * 60_000,
    }),
};

export function useDashboard() {
  return useQuery(dashboardQueries.today());
}
