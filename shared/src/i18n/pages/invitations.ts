import type { Widen } from '../catalogue-shape.js';

/** Page text: invitations (client/src/features/invitations). English first; German must fill the same keys. */
export const invitationsEn = {} as const;

export const invitationsDe: Widen<typeof invitationsEn> = {};
