import { HttpInterceptorFn } from '@angular/common/http';
import { inject, REQUEST } from '@angular/core';

/**
 * During server rendering, API calls are made by the server to itself; forward the visitor's cookies so
 * the page is rendered for the signed-in user. In the browser REQUEST is null and nothing changes.
 */
export const forwardCookiesOnServer: HttpInterceptorFn = (req, next) => {
  const incoming = inject(REQUEST, { optional: true });
  const cookie = incoming?.headers.get('cookie');
  if (!cookie || !req.url.startsWith('/api/')) return next(req);
  return next(req.clone({ setHeaders: { cookie } }));
};
