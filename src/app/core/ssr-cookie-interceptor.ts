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
  if (!incoming || !req.url.startsWith('/api/')) return next(req);
  // Who is asking (address as the server saw it, and browser), so the API counts a visitor's lot view as theirs.
  const visitor: Record<string, string> = {};
  const agent = incoming.headers.get('user-agent');
  if (agent) visitor['user-agent'] = agent;
  // Set by the server on the render request (server/middleware/render-request); the API trusts it from loopback.
  const address = incoming.headers.get('x-baleproof-visitor-address');
  if (address) visitor['x-forwarded-for'] = address;
  const cookie = incoming.headers.get('cookie');
  if (!cookie || (req.method === 'GET' && PUBLIC_READS.test(req.url))) return next(req.clone({ setHeaders: visitor }));
  return next(req.clone({ setHeaders: { ...visitor, cookie } }));
};
