import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import type { AcceptInvitationResponse, InvitationPreview } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { queryRoots } from '@/lib/query-keys';

/** Anyone with the link may see what it invites to, signed in or not. */
export function fetchInvitationPreview(token: string, signal?: AbortSignal): Promise<InvitationPreview> {
  return api.get<InvitationPreview>(`/invitations/${encodeURIComponent(token)}`, { signal, allowAnonymous: true });
}

/** ['invitations','detail',token] */
export const invitationQueries = {
  preview: (token: string) =>
    queryOptions({
      queryKey: [...queryRoots.invitations, 'detail', token] as const,
      queryFn: ({ signal }) => fetchInvitationPreview(token, signal),
    }),
};

export function useInvitationPreview(token: string) {
  return useQuery(invitationQueries.preview(token));
}

export function useAcceptInvitation(token: string) {
  return useMutation({
    mutationFn: () => api.post<AcceptInvitationResponse>(`/invitations/${encodeURIComponent(token)}/accept`),
    // The new membership shows in the project list, which the projects feature owns.
    meta: { handlesErrors: true, invalidates: [invitationQueries.preview(token).queryKey, queryRoots.projects] },
  });
}
