import { doubleCsrf } from 'csrf-csrf';
import type { Request, Response } from 'express';
import { CSRF_HEADER, SESSION_COOKIE } from '@broodsilk/shared';

export const CSRF_COOKIE = 'broodsilk_csrf';

/** Paths that are called by machines with their own proof (signed webhooks, token feeds, signed unsubscribe links). */
const EXEMPT_PREFIXES = ['/api/webhooks/', '/api/unsubscribe/'];

function sessionCookie(req: Request): string {
  return (req.cookies as Record<string, string> | undefined)?.[SESSION_COOKIE] ?? '';
}

/**
 * Double-submit CSRF defence for writes that ride on the session cookie.
 * A Bearer-token call cannot be forged by another site, and a call with no
 * session cookie has no session to abuse, so neither needs the header.
 */
export function createCsrf(secret: string, secure: boolean) {
  return doubleCsrf({
    getSecret: () => secret,
    getSessionIdentifier: sessionCookie,
    cookieName: CSRF_COOKIE,
    cookieOptions: { sameSite: 'lax', secure, httpOnly: true, path: '/' },
    getCsrfTokenFromRequest: (req) => req.headers[CSRF_HEADER] as string | undefined,
    skipCsrfProtection: (req) =>
      !sessionCookie(req) || /^Bearer /i.test(req.headers.authorization ?? '') || EXEMPT_PREFIXES.some((p) => req.path.startsWith(p)),
    errorConfig: { statusCode: 403, message: 'This form is out of date. Reload the page and try again.', code: 'EBADCSRFTOKEN' },
  });
}

export type Csrf = ReturnType<typeof createCsrf>;

/** Mints a token for the session the response is about to carry. */
export function mintCsrfToken(csrf: Csrf, req: Request, res: Response, sessionToken: string): string {
  (req.cookies as Record<string, string>)[SESSION_COOKIE] = sessionToken;
  return csrf.generateCsrfToken(req, res, { overwrite: true });
}
