import type { CookieOptions, Response } from 'express';
import { SESSION_COOKIE, SESSION_HOURS } from '@broodsilk/shared';

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
