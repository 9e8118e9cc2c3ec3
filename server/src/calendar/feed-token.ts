import { createHash, createHmac } from 'node:crypto';
import type { EntityManager } from '@mikro-orm/postgresql';
import { CalendarFeed } from './calendar-feed.entity';

/**
 * The feed's secret: an HMAC of its id under CALENDAR_SECRET, a key of its own so a leaked feed
 * key can sign no session (and the session key reveals no feed), domain-separated as well.
 */
export function feedToken(secret: string, feedId: string): string {
  return createHmac('sha256', secret).update(`broodsilk calendar feed ${feedId}`).digest('base64url');
}

export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

/** Revokes every live feed of a user (their URLs then 404); a password reset does this, as it ends sessions. */
export async function revokeFeeds(em: EntityManager, userId: string, at: Date): Promise<void> {
  await em.nativeUpdate(CalendarFeed, { user: userId, revokedAt: null }, { revokedAt: at });
}
