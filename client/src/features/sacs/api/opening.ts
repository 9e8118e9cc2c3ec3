import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { OpeningRequest, OpeningResponse, PhotoRef } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { isApiError } from '@/lib/api-error';
import { invalidateAfterSacChange, sacQueries } from './sacs';

/** The opening of a sac, or null before it was opened. */
export async function fetchOpening(sacId: string, signal?: AbortSignal): Promise<OpeningResponse | null> {
  try {
    return (await api.get<OpeningResponse | null>(`/sacs/${sacId}/opening`, { signal })) || null;
  } catch (e) {
    if (isApiError(e) && e.statusCode === 404) return null;
    throw e;
  }
}

/** ['sacs','opening',sacId] */
export const openingQueries = {
  detail: (sacId: string) =>
    queryOptions({
      queryKey: [...sacQueries.all(), 'opening', sacId] as const,
      queryFn: ({ signal }) => fetchOpening(sacId, signal),
    }),
};

export function useOpening(sacId: string, enabled = true) {
  return useQuery({ ...openingQueries.detail(sacId), enabled });
}

export function useRecordOpening(sacId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: OpeningRequest) => api.post<OpeningResponse>(`/sacs/${sacId}/opening`, body),
    meta: { handlesErrors: true },
    onSuccess: () => invalidateAfterSacChange(qc),
  });
}

/** Photos of the opening, as multipart field `file`; re-encoded by the server without location data. */
export function useUploadOpeningPhoto(sacId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => {
      const body = new FormData();
      body.append('file', file);
      return api.post<PhotoRef>(`/sacs/${sacId}/opening/photos`, body);
    },
    onSuccess: () => qc.invalidateQueries({ queryKey: openingQueries.detail(sacId).queryKey }),
  });
}
