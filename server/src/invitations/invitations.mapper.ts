import type { InvitationPreview, InvitationResponse } from '@broodsilk/shared';
import type { Invitation } from './invitation.entity';

export function toInvitationResponse(i: Invitation): InvitationResponse {
  return { id: i.id, email: i.email, role: i.role, memberId: i.member?.id ?? null, expiresAt: i.expiresAt.toISOString(), createdAt: i.createdAt.toISOString() };
}

/** Why a link no longer works, in words; null while it does. */
export function invitationProblem(i: Invitation, now: Date): string | null {
  if (i.acceptedAt) return 'This invitation has already been used.';
  if (i.replacedAt) return 'This invitation was replaced by a newer one; use the link in the latest e-mail.';
  if (i.expiresAt.getTime() <= now.getTime()) return 'This invitation has expired; ask the project owner to send a new one.';
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
    problem,
    expiresAt: i.expiresAt.toISOString(),
  };
}
