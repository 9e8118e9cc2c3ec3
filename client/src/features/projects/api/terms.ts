import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import type { AcceptTermsRequest, ProposeTermsRequest, TermsListResponse, TermsVersionResponse } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { afterProjectChange, projectQueries } from './projects';

export function fetchTerms(projectId: string, signal?: AbortSignal): Promise<TermsListResponse> {
  return api.get<TermsListResponse>(`/projects/${projectId}/terms`, { signal });
}

export function proposeTerms(projectId: string, body: ProposeTermsRequest): Promise<TermsVersionResponse> {
  return api.post<TermsVersionResponse>(`/projects/${projectId}/terms`, body);
}

/** ['projects','detail',id,'terms'] */
export const termsQueries = {
  list: (projectId: string) =>
    queryOptions({
      queryKey: [...projectQueries.detail(projectId).queryKey, 'terms'] as const,
      queryFn: ({ signal }) => fetchTerms(projectId, signal),
    }),
};

export function useTerms(projectId: string) {
  return useQuery(termsQueries.list(projectId));
}

export function useProposeTerms(projectId: string) {
  return useMutation({
    mutationFn: (body: ProposeTermsRequest) => proposeTerms(projectId, body),
    meta: { handlesErrors: true, invalidates: afterProjectChange(projectId) },
  });
}

export function useAcceptTerms(projectId: string) {
  return useMutation({
    mutationFn: ({ version, body }: { version: number; body?: AcceptTermsRequest }) =>
      api.post<TermsVersionResponse>(`/projects/${projectId}/terms/${version}/accept`, body ?? {}),
    meta: { invalidates: afterProjectChange(projectId) },
  });
}
