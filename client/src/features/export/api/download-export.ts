import { api, type Download } from '@/lib/api-client';

/** All of the signed-in keeper's data as one zip, streamed by the server (its size is not known in advance). */
export const downloadExport = (onBytes: (received: number) => void, signal?: AbortSignal): Promise<Download> => api.download('/export', onBytes, signal);

/** Hands a downloaded file to the browser's own save. */
export function saveFile({ blob, filename }: Download, fallbackName: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = filename ?? fallbackName;
  document.body.append(link);
  link.click();
  link.remove();
  URL.revokeObjectURL(url);
}
