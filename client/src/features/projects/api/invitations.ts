import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { CreateInvitationRequest, InvitationResponse } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { projectQueries } from './projects';

export function fetchProjectInvitations(projectId: string, signal?: AbortSignal): Promise<InvitationResponse[]> {
  return api.get<InvitationResponse[]>(`/projects/${projectId}/invitations`, { signal });
}

export function sendInvitation(projectId: string, body: CreateInvitationRequest): Promise<InvitationResponse> {
  return api.post<InvitationResponse>(`/projects/${projectId}/invitations`, body);
}

/** ['projects','detail',id,'invitations'] (owner only) */
export const projectInvitationQueries = {
  list: (projectId: string) =>
    queryOptions({
      queryKey: [...projectQueries.detail(projectId).queryKey, 'invitations'] as const,
      queryFn: ({ signal }) => fetchProjectInvitations(projectId, signal),
    }),
};

export function useProjectInvitations(projectId: string, enabled: boolean) {
  return useQuery({ ...projectInvitationQueries.list(projectId), enabled });
}

export function useSendInvitation(projectId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateInvitationRequest) => sendInvitation(projectId, body),
    meta: { handlesErrors: true },
    onSuccess: () => qc.invalidateQueries({ queryKey: projectInvitationQueries.list(projectId).queryKey }),
  });
}

export function useResendInvitation(projectId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (invitationId: string) => api.post<InvitationResponse>(`/projects/${projectId}/invitations/${invitationId}/resend`),
    onSuccess: () => qc.invalidateQueries({ queryKey: projectInvitationQueries.list(projectId).queryKey }),
  });
}
