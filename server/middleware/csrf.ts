import { createHmac, randomBytes, timingSafeEqual } from 'node:crypto';
import type { RequestHandler } from 'express';
import { HttpError } from './http-error';

/** Cookie and header names Angular's HttpClient uses by default for XSRF protection. */
export const CSRF_COOKIE = 'XSRF-TOKEN';
export const CSRF_HEADER = 'x-xsrf-token';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Signed double-submit token: the server sets a readable cookie holding `nonce.signature`; state-changing
 * requests must echo it in the X-XSRF-TOKEN header. A cross-site page can neither read the cookie nor
 * forge a signed value, and SameSite=Lax cookies add a second wall.
 */
export function csrfProtection(secret: string, secure: boolean): RequestHandler {
  const sign = (nonce: string) => createHmac('sha256', secret).update(nonce).digest('base64url');
  const isValid = (token: string | undefined) => {
    if (!token) return false;
    const [nonce, signature] = token.split('.');
    if (!nonce || !signature) return false;
    const expected = Buffer.from(sign(nonce));
    const given = Buffer.from(signature);
    return expected.length === given.length && timingSafeEqual(expected, given);
  };

  return (req, res, next) => {
    const cookieToken = readCookie(req.headers.cookie, CSRF_COOKIE);
    if (!isValid(cookieToken)) {
      const nonce = randomBytes(18).toString('base64url');
      res.cookie(CSRF_COOKIE, `${nonce}.${sign(nonce)}`, { sameSite: 'lax', secure, httpOnly: false, path: '/' });
    }
    if (SAFE_METHODS.has(req.method)) return next();
    const headerToken = req.get(CSRF_HEADER);
    if (!isValid(cookieToken) || headerToken !== cookieToken) {
      return next(new HttpError(403, 'csrf_failed', 'The form expired or came from another site. Reload the page and try again.'));
    }
    next();
  };
}

function readCookie(header: string | undefined, name: string): string | undefined {
  if (!header) return undefined;
  for (const part of header.split(';')) {
    const [key, ...rest] = part.trim().split('=');
    if (key === name) return decodeURIComponent(rest.join('='));
  }
  return undefined;
}
