import { createHash, randomBytes } from 'node:crypto';

/**
 * The secret of a link sent to someone (an invitation, a progress page): 32 random bytes,
 * base64url (RFC 4648 §5); only its SHA-256 (FIPS 180-4) is stored, so a database leak opens nothing.
 */
export function newLinkToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashLinkToken(token) };
}

export function hashLinkToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}
