import { inject } from '@angular/core';
import { CanMatchFn, Router } from '@angular/router';
import type { UserRole } from '@shared/contracts/auth';
import { Session } from './session';

/** Lets a route match only for the given roles; others are sent to sign in (with a way back). */
export function roleGuard(...roles: UserRole[]): CanMatchFn {
  return (_route, segments) => {
    const session = inject(Session);
    const router = inject(Router);
    const role = session.role();
    if (role && (roles.length === 0 || roles.includes(role))) return true;
    const returnTo = '/' + segments.map((s) => s.path).join('/');
    return router.createUrlTree(['/sign-in'], { queryParams: { returnTo, need: roles.join(',') || undefined } });
  };
}
