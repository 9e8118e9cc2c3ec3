import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { AcceptInvitationResponse, InvitationPreview } from '@broodsilk/shared';
import { api } from '@/lib/api-client';

/** Anyone with the link may see what it invites to, signed in or not. */
export function fetchInvitationPreview(token: string, signal?: AbortSignal): Promise<InvitationPreview> {
  return api.get<InvitationPreview>(`/invitations/${encodeURIComponent(token)}`, { signal, allowAnonymous: true });
}

/** ['invitations','detail',token] */
export const invitationQueries = {
  preview: (token: string) =>
    queryOptions({
      queryKey: ['invitations', 'detail', token] as const,
      queryFn: ({ signal }) => fetchInvitationPreview(token, signal),
    }),
};

export function useInvitationPreview(token: string) {
  return useQuery(invitationQueries.preview(token));
}

export function useAcceptInvitation(token: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<AcceptInvitationResponse>(`/invitations/${encodeURIComponent(token)}/accept`),
    meta: { handlesErrors: true },
    onSuccess: async () => {
      await Promise.all([qc.invalidateQueries({ queryKey: invitationQueries.preview(token).queryKey }), qc.invalidateQueries({ queryKey: ['projects'] })]);
    },
  });
}
