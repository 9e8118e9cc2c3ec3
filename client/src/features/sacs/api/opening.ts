import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import type { OpeningRequest, OpeningResponse, PhotoRef, SacResponse } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { queryRoots } from '@/lib/query-keys';
import { AFTER_SAC_CHANGE, sacQueries } from './sacs';

/** The opening of a sac; ask only for a sac whose `opened` is true (before that there is none: 404). */
export function fetchOpening(sacId: string, signal?: AbortSignal): Promise<OpeningResponse> {
  return api.get<OpeningResponse>(`/sacs/${sacId}/opening`, { signal });
}

/** ['sacs','opening',sacId] */
export const openingQueries = {
  detail: (sacId: string) =>
    queryOptions({
      queryKey: [...sacQueries.all(), 'opening', sacId] as const,
      queryFn: ({ signal }) => fetchOpening(sacId, signal),
    }),
};

/** Asks only once the sac is opened; before that the query stays idle with no data. */
export function useOpening(sac: Pick<SacResponse, 'id' | 'opened'>) {
  return useQuery({ ...openingQueries.detail(sac.id), enabled: sac.opened });
}

export function useRecordOpening(sacId: string) {
  return useMutation({
    mutationFn: (body: OpeningRequest) => api.post<OpeningResponse>(`/sacs/${sacId}/opening`, body),
    // The opening (or its correction) sets the brood's first count, so the account's shares follow.
    meta: { handlesErrors: true, invalidates: [...AFTER_SAC_CHANGE, queryRoots.account] },
  });
}

/** Photos of the opening, as multipart field `file`; re-encoded by the server without location data. */
export function useUploadOpeningPhoto(sacId: string) {
  return useMutation({
    mutationFn: (file: File) => {
      const body = new FormData();
      body.append('file', file);
      return api.post<PhotoRef>(`/sacs/${sacId}/opening/photos`, body);
    },
    meta: { invalidates: [openingQueries.detail(sacId).queryKey] },
  });
}
