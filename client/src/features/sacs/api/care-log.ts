import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import type { CareLogEntryResponse, CareLogRequest } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { AFTER_SAC_CHANGE, sacQueries } from './sacs';

export function fetchCareLog(sacId: string, signal?: AbortSignal): Promise<CareLogEntryResponse[]> {
  return api.get<CareLogEntryResponse[]>(`/sacs/${sacId}/log`, { signal });
}

export function addCareLogEntry(sacId: string, body: CareLogRequest): Promise<CareLogEntryResponse> {
  return api.post<CareLogEntryResponse>(`/sacs/${sacId}/log`, body);
}

/** ['sacs','log',sacId] */
export const careLogQueries = {
  list: (sacId: string) =>
    queryOptions({
      queryKey: [...sacQueries.all(), 'log', sacId] as const,
      queryFn: ({ signal }) => fetchCareLog(sacId, signal),
    }),
};

export function useCareLog(sacId: string) {
  return useQuery(careLogQueries.list(sacId));
}

/** Any log entry: a roll moves the next roll due, a stage entry may stop rolling, so the sac is refetched too. */
export function useAddCareLogEntry(sacId: string) {
  return useMutation({
    mutationFn: (body: CareLogRequest) => addCareLogEntry(sacId, body),
    meta: { handlesErrors: true, invalidates: AFTER_SAC_CHANGE },
  });
}
