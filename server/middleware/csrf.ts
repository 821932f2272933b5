import { parse as parseCookie } from 'cookie';
import { createHmac, randomBytes, timingSafeEqual } from 'node:crypto';
import type { Request, RequestHandler, Response } from 'express';
import { cookieNames, CSRF_HEADER } from '@shared/contracts/cookies';
import { HttpError } from './http-error';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Signed double-submit token bound to the session (OWASP's "signed double-submit cookie"): the server sets a
 * readable cookie holding `nonce.signature`, where the signature is an HMAC over the signed-in session's id
 * and the nonce; state-changing requests must echo it in the X-XSRF-TOKEN header. A cross-site page can
 * neither read the cookie nor forge a signature, a token planted from elsewhere belongs to another session,
 * and SameSite=Lax cookies add a further wall. Visitors who are not signed in have no session; their tokens
 * are bound to "visitor", and sign-in, sign-up and sign-out hand out a new token (`renew`).
 *
 * The cookie is handed out by page responses and by GET /api/auth/me only, never by other API reads:
 * Angular's server-side rendering will not put a response that sets a cookie into the page's transfer
 * cache, so public catalogue reads must stay cookie-free. It needs the session middleware and passport
 * before it, to know whose session a request belongs to.
 */
export function createCsrf(secret: string, secure: boolean) {
  const cookieName = cookieNames(secure).csrf;
  const bindingOf = (req: Request) => (req.user ? `session:${req.sessionID}` : 'visitor');
  const sign = (binding: string, nonce: string) => createHmac('sha256', secret).update(`${binding}\n${nonce}`).digest('base64url');
  const isValid = (token: string | undefined, binding: string): token is string => {
    if (!token) return false;
    const [nonce, signature] = token.split('.');
    if (!nonce || !signature) return false;
    const expected = Buffer.from(sign(binding, nonce));
    const given = Buffer.from(signature);
    return expected.length === given.length && timingSafeEqual(expected, given);
  };
  const issue = (req: Request, res: Response, always: boolean) => {
    const binding = bindingOf(req);
    if (!always && isValid(readCookie(req.headers.cookie, cookieName), binding)) return;
    const nonce = randomBytes(18).toString('base64url');
    res.cookie(cookieName, `${nonce}.${sign(binding, nonce)}`, { sameSite: 'lax', secure, httpOnly: false, path: '/' });
  };

  /** Sets the token cookie when the visitor has no valid one for their session. */
  const issueCookie: RequestHandler = (req, res, next) => {
    issue(req, res, false);
    next();
  };

  /** A new token for the session the request now has: call after signing in or out. */
  const renew = (req: Request, res: Response) => issue(req, res, true);

  /** Rejects state-changing requests whose header does not match a valid cookie (and hands out a fresh one). */
  const requireToken: RequestHandler = (req, res, next) => {
    if (SAFE_METHODS.has(req.method)) return next();
    const cookieToken = readCookie(req.headers.cookie, cookieName);
    if (!isValid(cookieToken, bindingOf(req)) || req.get(CSRF_HEADER) !== cookieToken) {
      issue(req, res, false);
      return next(new HttpError(403, 'csrf_failed', 'The form expired or came from another site. Reload the page and try again.'));
    }
    next();
  };

  return { issueCookie, requireToken, renew };
}

export type Csrf = ReturnType<typeof createCsrf>;

/** One cookie's value; a malformed header or value reads as absent (never an exception, so never a 500). */
function readCookie(header: string | undefined, name: string): string | undefined {
  if (!header) return undefined;
  return parseCookie(header)[name];
}
