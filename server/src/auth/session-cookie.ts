import type { CookieOptions, Request, Response } from 'express';
import { SESSION_COOKIE, SESSION_HOURS, type LoginResponse } from '@broodsilk/shared';
import { mintCsrfToken, type Csrf } from '../common/csrf/csrf';
import type { IssuedSession } from './auth.service';

export function sessionCookieOptions(secure: boolean): CookieOptions {
  return { httpOnly: true, sameSite: 'lax', secure, path: '/', maxAge: SESSION_HOURS * 3600_000 };
}

export function setSessionCookie(res: Response, token: string, secure: boolean): void {
  res.cookie(SESSION_COOKIE, token, sessionCookieOptions(secure));
}

export function clearSessionCookie(res: Response, secure: boolean): void {
  const { maxAge: _maxAge, ...rest } = sessionCookieOptions(secure);
  res.clearCookie(SESSION_COOKIE, rest);
}

/** Puts a new session on the response (cookie + CSRF token) and answers with it; used by sign-in and password change. */
export function startSession(csrf: Csrf, session: IssuedSession, req: Request, res: Response, secure: boolean): LoginResponse {
  setSessionCookie(res, session.accessToken, secure);
  const csrfToken = mintCsrfToken(csrf, req, res, session.accessToken);
  return { user: session.user, accessToken: session.accessToken, csrfToken, expiresAt: session.expiresAt.toISOString() };
}
