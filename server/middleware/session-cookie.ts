import { parse } from 'cookie';
import type { Request } from 'express';
import { SESSION_COOKIE_NAMES } from '@shared/contracts/cookies';

/**
 * Whether the request carries a session cookie (under either name), i.e. may belong to someone signed in.
 * Answers kept for every visitor are served only to requests without one; the rest go through the session.
 */
export function carriesSessionCookie(req: Request): boolean {
  const header = req.headers.cookie;
  if (!header) return false;
  const cookies = parse(header);
  return SESSION_COOKIE_NAMES.some((name) => cookies[name]);
}
