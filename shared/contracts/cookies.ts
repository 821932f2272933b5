/**
 * Cookie names. When cookies are Secure they carry the `__Host-` prefix: a browser keeps such a cookie only
 * when it is Secure, has Path=/ and no Domain, so no sibling subdomain can set or overwrite it (RFC 6265bis).
 * The browser app reads the CSRF cookie under either name; the server reads only the one its mode uses.
 */
export function cookieNames(secure: boolean): { session: string; csrf: string } {
  return secure ? { session: '__Host-baleproof.sid', csrf: '__Host-XSRF-TOKEN' } : { session: 'baleproof.sid', csrf: 'XSRF-TOKEN' };
}

/** Every name the session cookie may have, for code that only asks whether someone is signed in. */
export const SESSION_COOKIE_NAMES = [cookieNames(false).session, cookieNames(true).session] as const;

/** Both CSRF cookie names, the secure one first. */
export const CSRF_COOKIE_NAMES = [cookieNames(true).csrf, cookieNames(false).csrf] as const;

/** The header a state-changing request echoes the CSRF token in (Angular's default name). */
export const CSRF_HEADER = 'X-XSRF-TOKEN';
