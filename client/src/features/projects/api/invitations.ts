import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateInvitationRequest, InvitationResponse } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { invalidateProject } from './projects';

export function sendInvitation(projectId: string, body: CreateInvitationRequest): Promise<InvitationResponse> {
  return api.post<InvitationResponse>(`/projects/${projectId}/invitations`, body);
}

/** Sends (or sends again: a new invitation to the same address replaces the old one). */
export function useSendInvitation(projectId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateInvitationRequest) => sendInvitation(projectId, body),
    onSuccess: () => invalidateProject(qc, projectId),
  });
}
