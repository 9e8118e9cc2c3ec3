import { useMutation } from '@tanstack/react-query';
import type { ImportResult } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { AFTER_ANIMAL_CHANGE } from './animals';

/** A plain link downloads it: the browser sends the session cookie, the server names the file. */
export const ANIMALS_CSV_EXPORT_URL = '/api/animals/export.csv';

export function importAnimalsCsv(file: File): Promise<ImportResult> {
  const body = new FormData();
  body.append('file', file);
  return api.post<ImportResult>('/animals/import', body);
}

export function useImportAnimalsCsv() {
  return useMutation({
    mutationFn: importAnimalsCsv,
    meta: { handlesErrors: true, invalidates: AFTER_ANIMAL_CHANGE },
  });
}
