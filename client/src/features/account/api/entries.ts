import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import type { ConfirmEntryRequest, CreateEntryRequest, HandOverFormResponse, LedgerEntryResponse } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { accountKeys } from './keys';

export function fetchEntries(projectId: string, signal?: AbortSignal): Promise<LedgerEntryResponse[]> {
  return api.get<LedgerEntryResponse[]>(`/projects/${projectId}/entries`, { signal });
}

export function fetchHandOverForm(projectId: string, signal?: AbortSignal): Promise<HandOverFormResponse> {
  return api.get<HandOverFormResponse>(`/projects/${projectId}/entries/hand-over-form`, { signal });
}

export const entriesQueries = {
  list: (projectId: string) =>
    queryOptions({
      queryKey: accountKeys.entries(projectId),
      queryFn: ({ signal }) => fetchEntries(projectId, signal),
    }),
  handOverForm: (projectId: string) =>
    queryOptions({
      queryKey: accountKeys.handOverForm(projectId),
      queryFn: ({ signal }) => fetchHandOverForm(projectId, signal),
    }),
};

export function useEntries(projectId: string) {
  return useQuery(entriesQueries.list(projectId));
}

export function useHandOverForm(projectId: string) {
  return useQuery(entriesQueries.handOverForm(projectId));
}

/** Any entry moves shares, entries and balances: refresh the whole account of the project. */
export function useCreateEntry(projectId: string) {
  return useMutation({
    mutationFn: (body: CreateEntryRequest) => api.post<LedgerEntryResponse>(`/projects/${projectId}/entries`, body),
    meta: { handlesErrors: true, invalidates: [accountKeys.project(projectId)] },
  });
}

export function useConfirmEntry(projectId: string) {
  return useMutation({
    mutationFn: ({ entryId, body }: { entryId: string; body: ConfirmEntryRequest }) =>
      api.post<LedgerEntryResponse>(`/projects/${projectId}/entries/${entryId}/confirm`, body),
    meta: { handlesErrors: true, invalidates: [accountKeys.project(projectId)] },
  });
}
