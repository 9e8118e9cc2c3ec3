import { useMutation } from '@tanstack/react-query';
import type { FailureNoticePreview, FailureNoticePreviewRequest } from '@broodsilk/shared';
import { api } from '@/lib/api-client';

/** What the partners will read if the sac is recorded as failed now; writes nothing, so it changes no query. */
export function useFailureNoticePreview(sacId: string) {
  return useMutation({
    mutationFn: (body: FailureNoticePreviewRequest) => api.post<FailureNoticePreview>(`/sacs/${sacId}/failure-notice-preview`, body),
    meta: { handlesErrors: true },
  });
}
