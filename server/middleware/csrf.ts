import { parse as parseCookie } from 'cookie';
import { createHmac, randomBytes, timingSafeEqual } from 'node:crypto';
import type { Request, RequestHandler, Response } from 'express';
import { HttpError } from './http-error';

/** Cookie and header names Angular's HttpClient uses by default for XSRF protection. */
export const CSRF_COOKIE = 'XSRF-TOKEN';
export const CSRF_HEADER = 'x-xsrf-token';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Signed double-submit token: the server sets a readable cookie holding `nonce.signature`; state-changing
 * requests must echo it in the X-XSRF-TOKEN header. A cross-site page can neither read the cookie nor
 * forge a signed value, and SameSite=Lax cookies add a second wall.
 *
 * The cookie is handed out by page responses and by GET /api/auth/me only, never by other API reads:
 * Angular's server-side rendering will not put a response that sets a cookie into the page's transfer
 * cache, so public catalogue reads must stay cookie-free.
 */
export function createCsrf(secret: string, secure: boolean) {
  const sign = (nonce: string) => createHmac('sha256', secret).update(nonce).digest('base64url');
  const isValid = (token: string | undefined): token is string => {
    if (!token) return false;
    const [nonce, signature] = token.split('.');
    if (!nonce || !signature) return false;
    const expected = Buffer.from(sign(nonce));
    const given = Buffer.from(signature);
    return expected.length === given.length && timingSafeEqual(expected, given);
  };
  const issue = (req: Request, res: Response) => {
    if (isValid(readCookie(req.headers.cookie, CSRF_COOKIE))) return;
    const nonce = randomBytes(18).toString('base64url');
    res.cookie(CSRF_COOKIE, `${nonce}.${sign(nonce)}`, { sameSite: 'lax', secure, httpOnly: false, path: '/' });
  };

  /** Sets the token cookie when the visitor has no valid one. */
  const issueCookie: RequestHandler = (req, res, next) => {
    issue(req, res);
    next();
  };

  /** Rejects state-changing requests whose header does not match a valid cookie (and hands out a fresh one). */
  const requireToken: RequestHandler = (req, res, next) => {
    if (SAFE_METHODS.has(req.method)) return next();
    const cookieToken = readCookie(req.headers.cookie, CSRF_COOKIE);
    if (!isValid(cookieToken) || req.get(CSRF_HEADER) !== cookieToken) {
      issue(req, res);
      return next(new HttpError(403, 'csrf_failed', 'The form expired or came from another site. Reload the page and try again.'));
    }
    next();
  };

  return { issueCookie, requireToken };
}

/** One cookie's value; a malformed header or value reads as absent (never an exception, so never a 500). */
function readCookie(header: string | undefined, name: string): string | undefined {
  if (!header) return undefined;
  return parseCookie(header)[name];
}
