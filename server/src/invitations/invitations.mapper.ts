import type { InvitationPreview, InvitationResponse } from '@broodsilk/shared';
import type { Invitation } from './invitation.entity';
import { refusal, type Refusal } from '../common/refusal';

export function toInvitationResponse(i: Invitation): InvitationResponse {
  return { id: i.id, email: i.email, role: i.role, memberId: i.member?.id ?? null, expiresAt: i.expiresAt.toISOString(), createdAt: i.createdAt.toISOString() };
}

/** Why a link no longer works, in words; null while it does. */
export function invitationProblem(i: Invitation, now: Date): Refusal | null {
  if (i.acceptedAt) return refusal('invitation.used');
  if (i.replacedAt) return refusal('invitation.replaced');
  if (i.expiresAt.getTime() <= now.getTime()) return refusal('invitation.expired');
  return null;
}

/** Needs `project` and `invitedBy` loaded. */
export function toInvitationPreview(i: Invitation, now: Date): InvitationPreview {
  const problem = invitationProblem(i, now);
  return {
    projectTitle: i.project.title,
    inviterName: i.invitedBy.displayName,
    role: i.role,
    valid: problem === null,
    problem: problem?.message ?? null,
    expiresAt: i.expiresAt.toISOString(),
  };
}
