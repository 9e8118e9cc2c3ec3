import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PhotoRef } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { animalQueries } from './animals';

/** Photos are sent as multipart field `file`; the server re-encodes them and strips metadata. */
export function uploadAnimalPhoto(animalId: string, file: File): Promise<PhotoRef> {
  const body = new FormData();
  body.append('file', file);
  return api.post<PhotoRef>(`/animals/${animalId}/photos`, body);
}

export function useUploadAnimalPhoto(animalId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => uploadAnimalPhoto(animalId, file),
    meta: { handlesErrors: true },
    onSuccess: async () => {
      await qc.invalidateQueries({ queryKey: animalQueries.detail(animalId).queryKey, exact: true });
    },
  });
}

/** The server gives photo URLs under /api; keep them as they are when already absolute. */
export function photoSrc(url: string): string {
  return url.startsWith('/api/') || /^https?:/.test(url) ? url : `/api${url.startsWith('/') ? '' : '/'}${url}`;
}
