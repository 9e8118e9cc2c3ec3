import type { CookieOptions, Request, Response } from 'express';
import { SESSION_COOKIE, SESSION_HOURS, type LoginResponse } from '@broodsilk/shared';
import { mintCsrfToken, type Csrf } from '../common/csrf/csrf';
import type { IssuedSession } from './auth.service';

export function sessionCookieOptions(secure: boolean): CookieOptions {
  return { httpOnly: true, sameSite: 'lax', secure, path: '/', maxAge: SESSION_HOURS * 3600_000 };
}

/**
 * `Secure` whenever the request came over HTTPS, directly or through the trusted proxy
 * (`req.secure` follows X-Forwarded-Proto only from TRUST_PROXY), or always with SECURE_COOKIES.
 */
const isSecure = (req: Request, alwaysSecure: boolean): boolean => alwaysSecure || req.secure;

export function clearSessionCookie(req: Request, res: Response, alwaysSecure: boolean): void {
  const { maxAge: _maxAge, ...rest } = sessionCookieOptions(isSecure(req, alwaysSecure));
  res.clearCookie(SESSION_COOKIE, rest);
}

/** Puts a new session on the response (cookie + CSRF token) and answers with it; used by sign-in and password change. */
export function startSession(csrf: Csrf, session: IssuedSession, req: Request, res: Response, alwaysSecure: boolean): LoginResponse {
  res.cookie(SESSION_COOKIE, session.accessToken, sessionCookieOptions(isSecure(req, alwaysSecure)));
  const csrfToken = mintCsrfToken(csrf, req, res, session.accessToken);
  return { user: session.user, accessToken: session.accessToken, csrfToken, expiresAt: session.expiresAt.toISOString() };
}
