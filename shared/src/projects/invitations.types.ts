import type { InvitableRole } from './project.types.js';

export interface CreateInvitationRequest {
  email: string;
  role: InvitableRole;
  /** The outside party this invitation lets sign in (their account gets linked on acceptance). */
  memberId?: string;
}

export interface InvitationResponse {
  id: string;
  email: string;
  role: InvitableRole;
  memberId: string | null;
  expiresAt: string;
  createdAt: string;
}

/** What the invitation page shows before signing in. */
export interface InvitationPreview {
  projectTitle: string;
  inviterName: string;
  role: InvitableRole;
  valid: boolean;
  /** Why it no longer works, in words, when `valid` is false. */
  problem: string | null;
  expiresAt: string;
}

export interface AcceptInvitationResponse {
  projectId: string;
  role: InvitableRole;
  /**
   * `joined`: the account is now a member. `awaiting-owner`: the link was sent to another address,
   * so the project owner must approve this account first.
   */
  status: 'joined' | 'awaiting-owner';
}
