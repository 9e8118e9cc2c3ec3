import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import type { AnimalBreedingRow, AnimalDateRequest, AnimalResponse, CreateFeedingRequest, FeedingResponse } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { queryRoots } from '@/lib/query-keys';
import { AFTER_ANIMAL_CHANGE, animalQueries } from './animals';

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
  return useMutation({
    mutationFn: (body: CreateFeedingRequest) => api.post<FeedingResponse>(`/animals/${animalId}/feedings`, body),
    meta: { handlesErrors: true, invalidates: [seasonQueries.feedings(animalId).queryKey] },
  });
}

/** The dated steps of `POST /animals/:id/<step>`. */
export type AnimalStep = 'premolt' | 'premolt/end' | 'sperm-web' | 'return' | 'death';

export function useAnimalStep(animalId: string, step: AnimalStep) {
  return useMutation({
    mutationFn: (body: AnimalDateRequest) => api.post<AnimalResponse>(`/animals/${animalId}/${step}`, body),
    // Status, readiness and the males list all move; projects show the event on their timelines.
    meta: { handlesErrors: true, invalidates: [animalQueries.detail(animalId).queryKey, ...AFTER_ANIMAL_CHANGE, queryRoots.projects] },
  });
}
