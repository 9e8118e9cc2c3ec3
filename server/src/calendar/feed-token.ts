import { createHash, createHmac } from 'node:crypto';

/** The feed's secret: an HMAC of its id under the server secret (domain-separated from other uses). */
export function feedToken(secret: string, feedId: string): string {
  return createHmac('sha256', secret).update(`broodsilk calendar feed ${feedId}`).digest('base64url');
}

export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}
