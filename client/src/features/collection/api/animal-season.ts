import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { AnimalBreedingRow, AnimalDateRequest, AnimalResponse, CreateFeedingRequest, FeedingResponse } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { animalQueries } from './animals';

/** Under the animal's key, so invalidating the animal refreshes its feedings and breeding record too. */
export const seasonQueries = {
  feedings: (animalId: string) =>
    queryOptions({
      queryKey: [...animalQueries.detail(animalId).queryKey, 'feedings'] as const,
      queryFn: ({ signal }) => api.get<FeedingResponse[]>(`/animals/${animalId}/feedings`, { signal }),
    }),
  breeding: (animalId: string) =>
    queryOptions({
      queryKey: [...animalQueries.detail(animalId).queryKey, 'breeding'] as const,
      queryFn: ({ signal }) => api.get<AnimalBreedingRow[]>(`/animals/${animalId}/breeding`, { signal }),
    }),
};

export function useFeedings(animalId: string) {
  return useQuery(seasonQueries.feedings(animalId));
}

export function useAnimalBreeding(animalId: string) {
  return useQuery(seasonQueries.breeding(animalId));
}

export function useAddFeeding(animalId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateFeedingRequest) => api.post<FeedingResponse>(`/animals/${animalId}/feedings`, body),
    meta: { handlesErrors: true },
    onSuccess: () => qc.invalidateQueries({ queryKey: seasonQueries.feedings(animalId).queryKey }),
  });
}

/** The dated steps of `POST /animals/:id/<step>`. */
export type AnimalStep = 'premolt' | 'premolt/end' | 'sperm-web' | 'return' | 'death';

export function useAnimalStep(animalId: string, step: AnimalStep) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: AnimalDateRequest) => api.post<AnimalResponse>(`/animals/${animalId}/${step}`, body),
    meta: { handlesErrors: true },
    // Status, readiness and the males list all move; projects show the event on their timelines.
    onSuccess: async () => {
      await Promise.all([
        qc.invalidateQueries({ queryKey: animalQueries.detail(animalId).queryKey }),
        qc.invalidateQueries({ queryKey: animalQueries.lists() }),
        qc.invalidateQueries({ queryKey: animalQueries.males().queryKey }),
        qc.invalidateQueries({ queryKey: ['projects'] }),
      ]);
    },
  });
}
