import { queryOptions, useMutation, useQuery, useQueryClient, type QueryClient, type QueryKey } from '@tanstack/react-query';
import type { AnimalListQuery, AnimalResponse, AnimalSummary, CreateAnimalRequest, MaleClockRow, Paged, UpdateAnimalRequest } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { queryRoots } from '@/lib/query-keys';

export function fetchAnimals(query: AnimalListQuery, signal?: AbortSignal): Promise<Paged<AnimalSummary>> {
  return api.get<Paged<AnimalSummary>>('/animals', { query: { ...query }, signal });
}

export function fetchAnimal(id: string, signal?: AbortSignal): Promise<AnimalResponse> {
  return api.get<AnimalResponse>(`/animals/${id}`, { signal });
}

export function fetchMalesByClock(signal?: AbortSignal): Promise<MaleClockRow[]> {
  return api.get<MaleClockRow[]>('/animals/males/clock', { signal });
}

/** ['animals'] → ['animals','list',query] · ['animals','detail',id] · ['animals','males'] */
export const animalQueries = {
  all: () => queryRoots.animals,
  lists: () => [...animalQueries.all(), 'list'] as const,
  list: (query: AnimalListQuery) =>
    queryOptions({
      queryKey: [...animalQueries.lists(), query] as const,
      queryFn: ({ signal }) => fetchAnimals(query, signal),
    }),
  details: () => [...animalQueries.all(), 'detail'] as const,
  detail: (id: string) =>
    queryOptions({
      queryKey: [...animalQueries.details(), id] as const,
      queryFn: ({ signal }) => fetchAnimal(id, signal),
    }),
  males: () =>
    queryOptions({
      queryKey: [...animalQueries.all(), 'males'] as const,
      queryFn: ({ signal }) => fetchMalesByClock(signal),
    }),
};

/** Lists and the male clock show every animal: any change to one refreshes them (`meta.invalidates`). */
export const AFTER_ANIMAL_CHANGE: readonly QueryKey[] = [animalQueries.lists(), animalQueries.males().queryKey];

export function useAnimals(query: AnimalListQuery) {
  return useQuery({ ...animalQueries.list(query), placeholderData: (prev) => prev });
}

export function useAnimal(id: string) {
  return useQuery(animalQueries.detail(id));
}

/** `enabled` false skips the request (a viewer who may not pair them). */
export function useMalesByClock(enabled = true) {
  return useQuery({ ...animalQueries.males(), enabled });
}

export function useCreateAnimal() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateAnimalRequest) => api.post<AnimalResponse>('/animals', body),
    meta: { handlesErrors: true, invalidates: AFTER_ANIMAL_CHANGE },
    onSuccess: (animal) => qc.setQueryData(animalQueries.detail(animal.id).queryKey, animal),
  });
}

export function useUpdateAnimal(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateAnimalRequest) => api.patch<AnimalResponse>(`/animals/${id}`, body),
    meta: { handlesErrors: true, invalidates: AFTER_ANIMAL_CHANGE },
    onSuccess: (animal) => qc.setQueryData(animalQueries.detail(id).queryKey, animal),
  });
}

export function useDeleteAnimal(id: string) {
  return useMutation({
    mutationFn: () => api.delete<void>(`/animals/${id}`),
    // The detail stays cached while its page is still shown (removing it there would refetch a 404);
    // call forgetAnimal once the page has moved on.
    meta: { handlesErrors: true, invalidates: AFTER_ANIMAL_CHANGE },
  });
}

/** Drops a deleted animal and its molts from the cache, so its old page cannot come back from it. */
export function forgetAnimal(qc: QueryClient, id: string): void {
  qc.removeQueries({ queryKey: animalQueries.detail(id).queryKey });
}
