import { createHash, randomBytes } from 'node:crypto';

/** Seven days to accept; after that the owner sends a new one. */
export const INVITATION_DAYS = 7;

/** 32 random bytes, URL-safe; only its SHA-256 is stored, so a database leak opens no project. */
export function newInvitationToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashInvitationToken(token) };
}

export function hashInvitationToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}
