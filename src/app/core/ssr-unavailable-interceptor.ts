import { HttpErrorResponse, type HttpInterceptorFn } from '@angular/common/http';
import { inject, RESPONSE_INIT } from '@angular/core';
import { catchError, throwError } from 'rxjs';

/**
 * During server rendering, an API call answered 503 (the database is unreachable) makes the page itself
 * 503 with Retry-After, so browsers, caches and crawlers see that it is unavailable, not a normal page; the
 * page shows its own message for the failed data. In the browser RESPONSE_INIT is null and nothing changes.
 */
export const pageUnavailableOnServer: HttpInterceptorFn = (req, next) => {
  const response = inject(RESPONSE_INIT, { optional: true });
  if (!response) return next(req);
  return next(req).pipe(
    catchError((err: unknown) => {
      if (err instanceof HttpErrorResponse && err.status === 503) {
        response.status = 503;
        response.headers = { ...(response.headers as Record<string, string> | undefined), 'Retry-After': '30', 'Cache-Control': 'no-store' };
      }
      return throwError(() => err);
    }),
  );
};
