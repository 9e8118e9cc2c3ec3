import { infiniteQueryOptions, queryOptions, useInfiniteQuery, useMutation, useQuery } from '@tanstack/react-query';
import type { ConfirmEntryRequest, CreateEntryRequest, HandOverFormResponse, KeysetPage, LedgerEntryResponse } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { accountKeys } from './keys';

/** Entries per page of the ledger (in ledger order); later ones come with "Show later entries". */
export const ENTRIES_PAGE = 200;

export function fetchEntries(projectId: string, after: string | null, signal?: AbortSignal): Promise<KeysetPage<LedgerEntryResponse>> {
  return api.get<KeysetPage<LedgerEntryResponse>>(`/projects/${projectId}/entries`, { signal, query: { limit: ENTRIES_PAGE, after } });
}

export function fetchHandOverForm(projectId: string, signal?: AbortSignal): Promise<HandOverFormResponse> {
  return api.get<HandOverFormResponse>(`/projects/${projectId}/entries/hand-over-form`, { signal });
}

export const entriesQueries = {
  list: (projectId: string) =>
    infiniteQueryOptions({
      queryKey: accountKeys.entries(projectId),
      queryFn: ({ signal, pageParam }) => fetchEntries(projectId, pageParam, signal),
      initialPageParam: null as string | null,
      getNextPageParam: (last) => last.nextCursor,
    }),
  handOverForm: (projectId: string) =>
    queryOptions({
      queryKey: accountKeys.handOverForm(projectId),
      queryFn: ({ signal }) => fetchHandOverForm(projectId, signal),
    }),
};

/** The ledger page by page (keyset); `entries` is every page loaded so far, in ledger order. */
export function useEntries(projectId: string) {
  return useInfiniteQuery({ ...entriesQueries.list(projectId), select: (data) => data.pages.flatMap((p) => p.items) });
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
