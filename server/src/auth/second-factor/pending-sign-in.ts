import { createHmac } from 'node:crypto';
import type { JwtService } from '@nestjs/jwt';
import { PENDING_SIGN_IN_MINUTES } from '@broodsilk/shared';

const PURPOSE = 'pending-sign-in';

interface PendingPayload {
  sub: string;
  ver: number;
  typ: typeof PURPOSE;
}

/**
 * The proof of a right password while the code is still owed. It is signed with a key derived
 * from JWT_SECRET for this purpose only, so the session check (which uses JWT_SECRET itself)
 * never accepts it as a session.
 */
const keyFor = (jwtSecret: string) => createHmac('sha256', jwtSecret).update(PURPOSE).digest('hex');

const seconds = (at: Date) => Math.floor(at.getTime() / 1000);

/** Issued and checked against the app's Clock (not the process clock), so tests can move time for it alone. */
export function signPendingSignIn(jwt: JwtService, jwtSecret: string, user: { id: string; tokenVersion: number }, now: Date): string {
  const payload: PendingPayload & { iat: number; exp: number } = {
    sub: user.id,
    ver: user.tokenVersion,
    typ: PURPOSE,
    iat: seconds(now),
    exp: seconds(now) + PENDING_SIGN_IN_MINUTES * 60,
  };
  return jwt.sign(payload, { secret: keyFor(jwtSecret), algorithm: 'HS256' });
}

/** The user id and token version, or null when the token is forged, expired or of another kind. */
export function readPendingSignIn(jwt: JwtService, jwtSecret: string, token: string, now: Date): { userId: string; ver: number } | null {
  try {
    const p = jwt.verify<PendingPayload>(token, { secret: keyFor(jwtSecret), algorithms: ['HS256'], clockTimestamp: seconds(now) });
    return p.typ === PURPOSE ? { userId: p.sub, ver: p.ver } : null;
  } catch {
    return null;
  }
}
