import { useMutation } from '@tanstack/react-query';
import type { ProgressLinkResponse } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { projectQueries } from './projects';

const linksPath = (projectId: string, memberId: string) => `/projects/${projectId}/members/${memberId}/progress-links`;

/** Issues (or rotates) an outside party's progress link; the address comes back once. Both writes appear on the timeline. */
export function useIssueProgressLink(projectId: string) {
  return useMutation({
    mutationFn: (memberId: string) => api.post<ProgressLinkResponse>(linksPath(projectId, memberId)),
    meta: { handlesErrors: true, invalidates: [projectQueries.activity(projectId).queryKey] },
  });
}

export function useRevokeProgressLink(projectId: string) {
  return useMutation({
    mutationFn: (memberId: string) => api.delete<void>(linksPath(projectId, memberId)),
    meta: { handlesErrors: true, invalidates: [projectQueries.activity(projectId).queryKey] },
  });
}
