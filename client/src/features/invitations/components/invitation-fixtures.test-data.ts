import type { InvitationPreview } from '@broodsilk/shared';

/** A valid invitation to a partner, as the preview route answers it. */
export const invitationPreview: InvitationPreview = {
  projectTitle: 'Regalis 2027',
  inviterName: 'Mira',
  role: 'partner',
  valid: true,
  problem: null,
  expiresAt: '2026-12-15T00:00:00Z',
};
