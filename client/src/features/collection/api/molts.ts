import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { CreateMoltRequest, MoltResponse } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { animalQueries } from './animals';

export function fetchMolts(animalId: string, signal?: AbortSignal): Promise<MoltResponse[]> {
  return api.get<MoltResponse[]>(`/animals/${animalId}/molts`, { signal });
}

/** ['animals','detail',id,'molts']: under the animal, so invalidating the animal refreshes its molts too. */
export const moltQueries = {
  list: (animalId: string) =>
    queryOptions({
      queryKey: [...animalQueries.detail(animalId).queryKey, 'molts'] as const,
      queryFn: ({ signal }) => fetchMolts(animalId, signal),
    }),
};

export function useMolts(animalId: string) {
  return useQuery(moltQueries.list(animalId));
}

export function useRecordMolt(animalId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateMoltRequest) => api.post<MoltResponse>(`/animals/${animalId}/molts`, body),
    meta: { handlesErrors: true },
    // A molt moves the last-molt date, readiness and (maturing) the male clock.
    onSuccess: async () => {
      await Promise.all([
        qc.invalidateQueries({ queryKey: animalQueries.detail(animalId).queryKey }),
        qc.invalidateQueries({ queryKey: animalQueries.lists() }),
        qc.invalidateQueries({ queryKey: animalQueries.males().queryKey }),
      ]);
    },
  });
}
