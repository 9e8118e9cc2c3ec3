import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Paged, SpeciesListQuery, SpeciesResponse } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { queryRoots } from '@/lib/query-keys';

export function fetchSpeciesList(query: SpeciesListQuery, signal?: AbortSignal): Promise<Paged<SpeciesResponse>> {
  return api.get<Paged<SpeciesResponse>>('/species', { query: { ...query }, signal });
}

export function fetchSpecies(id: string, signal?: AbortSignal): Promise<SpeciesResponse> {
  return api.get<SpeciesResponse>(`/species/${id}`, { signal });
}

/** Keys from generic to specific: ['species'] → ['species','list',query] / ['species','detail',id]. */
export const speciesQueries = {
  all: () => queryRoots.species,
  lists: () => [...speciesQueries.all(), 'list'] as const,
  list: (query: SpeciesListQuery) =>
    queryOptions({
      queryKey: [...speciesQueries.lists(), query] as const,
      queryFn: ({ signal }) => fetchSpeciesList(query, signal),
      // The catalogue changes rarely (admin edits only).
      staleTime: 10 * 60_000,
    }),
  detail: (id: string) =>
    queryOptions({
      queryKey: [...speciesQueries.all(), 'detail', id] as const,
      queryFn: ({ signal }) => fetchSpecies(id, signal),
      staleTime: 10 * 60_000,
    }),
};

export function useSpeciesList(query: SpeciesListQuery, options: { enabled?: boolean } = {}) {
  return useQuery({ ...speciesQueries.list(query), enabled: options.enabled ?? true, placeholderData: (prev) => prev });
}

export function useSpecies(id: string | undefined) {
  return useQuery({ ...speciesQueries.detail(id ?? ''), enabled: Boolean(id) });
}
