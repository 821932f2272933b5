import type { RequestHandler } from 'express';
import type { UserRole } from '@shared/contracts/auth';
import { forbidden, unauthenticated } from './http-error';

/** 401 when nobody is signed in; 403 when the user lacks every one of the roles. */
export function requireRole(...roles: UserRole[]): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) return next(unauthenticated());
    if (roles.length > 0 && !roles.includes(req.user.role)) return next(forbidden());
    next();
  };
}

export const requireSignedIn = requireRole();
