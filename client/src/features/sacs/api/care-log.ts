import { infiniteQueryOptions, useInfiniteQuery, useMutation } from '@tanstack/react-query';
import type { CareLogEntryResponse, CareLogRequest, KeysetPage } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { AFTER_SAC_CHANGE, sacQueries } from './sacs';

/** Entries per page of the care log (newest first); older ones come with "Show older entries". */
export const CARE_LOG_PAGE = 50;

export function fetchCareLog(sacId: string, after: string | null, signal?: AbortSignal): Promise<KeysetPage<CareLogEntryResponse>> {
  return api.get<KeysetPage<CareLogEntryResponse>>(`/sacs/${sacId}/log`, { signal, query: { limit: CARE_LOG_PAGE, after } });
}

export function addCareLogEntry(sacId: string, body: CareLogRequest): Promise<CareLogEntryResponse> {
  return api.post<CareLogEntryResponse>(`/sacs/${sacId}/log`, body);
}

/** ['sacs','log',sacId] */
export const careLogQueries = {
  list: (sacId: string) =>
    infiniteQueryOptions({
      queryKey: [...sacQueries.all(), 'log', sacId] as const,
      queryFn: ({ signal, pageParam }) => fetchCareLog(sacId, pageParam, signal),
      initialPageParam: null as string | null,
      getNextPageParam: (last) => last.nextCursor,
    }),
};

/** The care log page by page (keyset); `fetchNextPage` adds the next older page. */
export function useCareLog(sacId: string) {
  return useInfiniteQuery(careLogQueries.list(sacId));
}

/** Any log entry: a roll moves the next roll due, a stage entry may stop rolling, so the sac is refetched too. */
export function useAddCareLogEntry(sacId: string) {
  return useMutation({
    mutationFn: (body: CareLogRequest) => addCareLogEntry(sacId, body),
    meta: { handlesErrors: true, invalidates: AFTER_SAC_CHANGE },
  });
}
