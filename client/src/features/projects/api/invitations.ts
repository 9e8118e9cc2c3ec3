import { useMutation } from '@tanstack/react-query';
import type { CreateInvitationRequest, InvitationResponse } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { afterProjectChange } from './projects';

export function sendInvitation(projectId: string, body: CreateInvitationRequest): Promise<InvitationResponse> {
  return api.post<InvitationResponse>(`/projects/${projectId}/invitations`, body);
}

/** Sends (or sends again: a new invitation to the same address replaces the old one). */
export function useSendInvitation(projectId: string) {
  return useMutation({
    mutationFn: (body: CreateInvitationRequest) => sendInvitation(projectId, body),
    meta: { invalidates: afterProjectChange(projectId) },
  });
}
