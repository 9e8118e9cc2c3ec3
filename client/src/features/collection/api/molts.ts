import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import type { CreateMoltRequest, MoltResponse } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { AFTER_ANIMAL_CHANGE, animalQueries } from './animals';

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
  return useMutation({
    mutationFn: (body: CreateMoltRequest) => api.post<MoltResponse>(`/animals/${animalId}/molts`, body),
    // A molt moves the last-molt date, readiness and (maturing) the male clock.
    meta: { handlesErrors: true, invalidates: [animalQueries.detail(animalId).queryKey, ...AFTER_ANIMAL_CHANGE] },
  });
}
