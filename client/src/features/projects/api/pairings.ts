import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import type { CreatePairingRequest, PairingResponse } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { afterProjectChange, projectQueries } from './projects';

export function fetchPairings(projectId: string, signal?: AbortSignal): Promise<PairingResponse[]> {
  return api.get<PairingResponse[]>(`/projects/${projectId}/pairings`, { signal });
}

/** ['projects','detail',id,'pairings'] */
export const pairingQueries = {
  list: (projectId: string) =>
    queryOptions({
      queryKey: [...projectQueries.detail(projectId).queryKey, 'pairings'] as const,
      queryFn: ({ signal }) => fetchPairings(projectId, signal),
    }),
};

export function usePairings(projectId: string) {
  return useQuery(pairingQueries.list(projectId));
}

export function useRecordPairing(projectId: string) {
  return useMutation({
    mutationFn: (body: CreatePairingRequest) => api.post<PairingResponse>(`/projects/${projectId}/pairings`, body),
    meta: { handlesErrors: true, invalidates: afterProjectChange(projectId) },
  });
}
