import { HttpInterceptorFn } from '@angular/common/http';
import { inject, REQUEST } from '@angular/core';

/**
 * Public catalogue reads. They are rendered without the visitor's cookies so their responses can travel to
 * the browser in the page's transfer cache (Angular never caches credentialed responses there), and the
 * browser does not fetch them again.
 */
const PUBLIC_READS = /^\/api\/lots(\/|\?|$)/;

/**
 * During server rendering, API calls are made by the server to itself; forward the visitor's cookies so
 * signed-in pages are rendered for that user. In the browser REQUEST is null and nothing changes.
 */
export const forwardCookiesOnServer: HttpInterceptorFn = (req, next) => {
  const incoming = inject(REQUEST, { optional: true });
  const cookie = incoming?.headers.get('cookie');
  if (!cookie || !req.url.startsWith('/api/')) return next(req);
  if (req.method === 'GET' && PUBLIC_READS.test(req.url)) return next(req);
  return next(req.clone({ setHeaders: { cookie } }));
};
