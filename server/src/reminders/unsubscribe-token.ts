import { createHmac, timingSafeEqual } from 'node:crypto';
import { NOTIFICATION_KINDS, type NotificationKind } from '@broodsilk/shared';

/**
 * A link that stops one kind of e-mail for one user without signing in: `<user>.<kind>.<mac>`,
 * the mac an HMAC-SHA-256 under a key derived from the app secret for this use only (so the
 * session key signs no link and a link reveals nothing of it).
 */
function mac(secret: string, userId: string, kind: string): Buffer {
  const key = createHmac('sha256', secret).update('broodsilk unsubscribe key').digest();
  return createHmac('sha256', key).update(`${userId}\n${kind}`).digest();
}

export function unsubscribeToken(secret: string, userId: string, kind: NotificationKind): string {
  return `${userId}.${kind}.${mac(secret, userId, kind).toString('base64url')}`;
}

/** The user and kind of a token, or null when it was not made by us (changed, cut short, made up). */
export function readUnsubscribeToken(secret: string, token: string): { userId: string; kind: NotificationKind } | null {
  const [userId, kind, given, ...rest] = token.split('.');
  if (rest.length || !userId || !given || !(NOTIFICATION_KINDS as readonly string[]).includes(kind)) return null;
  // Compared as text: base64url's last character carries spare bits a decoder ignores, so a
  // changed last character could decode to the same bytes; only our exact spelling counts.
  const expected = Buffer.from(mac(secret, userId, kind).toString('base64url'));
  const actual = Buffer.from(given);
  if (actual.length !== expected.length || !timingSafeEqual(actual, expected)) return null;
  return { userId, kind: kind as NotificationKind };
}
