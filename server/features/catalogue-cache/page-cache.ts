import type { NextFunction, Request, Response } from 'express';
import { localeOfHeader } from '@shared/contracts/locales';
import { pageContentSecurityPolicy } from '../../middleware/page-csp';
import { carriesSessionCookie } from '../../middleware/session-cookie';
import type { CatalogueCache } from './catalogue-cache';
import { sendKept, type KeptAnswer } from './kept-answer';

/** Renders a page; undefined when the renderer has no page for the URL. */
type Render = (req: Request) => Promise<globalThis.Response | null | undefined>;

/**
 * Serves server-rendered pages, keeping a visitor's page (no session cookie, GET, 200, no cookie set by
 * the renderer) for the cache's short life so the next visitor to the same URL in the same locale gets it
 * without rendering.
 * A kept page is also kept compressed (brotli, gzip) once asked for, so a hit costs no compression.
 * Every rendered page, kept or not, gets a Content-Security-Policy hashed from its own inline scripts.
 * `onHit` runs after a kept page is sent.
 */
export function cachedPages(render: Render, write: (response: globalThis.Response, res: Response) => Promise<void>, cache: CatalogueCache | undefined, onHit?: (req: Request) => void) {
  return async (req: Request, res: Response, next: NextFunction): Promise<void> => {
    const anonymous = req.method === 'GET' && !carriesSessionCookie(req);
    // Pages are rendered in the reader's locale (dates, numbers, money), so each locale keeps its own copy.
    const key = `${localeOfHeader(req.headers['accept-language'])} ${req.originalUrl}`;
    const hit = anonymous ? cache?.pages.get(key) : undefined;
    if (hit) {
      send(hit, req, res);
      // What a render would have done besides rendering (counting a lot's view), after the page is sent.
      return onHit?.(req);
    }
    const rendered = await render(req);
    if (!rendered) return next();
    const response = await withPagePolicy(rendered);
    if (!cache || !anonymous || response.status !== 200 || response.headers.has('set-cookie')) return write(response, res);
    const page: KeptAnswer = { status: response.status, headers: [...response.headers], body: Buffer.from(await response.arrayBuffer()) };
    cache.pages.set(key, page);
    send(page, req, res);
  };
}

/**
 * The rendered page with its Content-Security-Policy, worked out from its HTML once: a kept page keeps the
 * header, so the hashes always match the bytes sent (no per-request nonce to stamp into a kept copy).
 */
async function withPagePolicy(response: globalThis.Response): Promise<globalThis.Response> {
  if (!response.body || !response.headers.get('content-type')?.startsWith('text/html')) return response;
  const html = await response.text();
  const headers = new Headers(response.headers);
  headers.set('content-security-policy', pageContentSecurityPolicy(html));
  headers.delete('content-length');
  return new Response(html, { status: response.status, statusText: response.statusText, headers });
}

function send(page: KeptAnswer, req: Request, res: Response): void {
  // Each locale keeps its own page (RFC 9110 §12.5.5), so shared caches must keep them apart too.
  res.vary('Accept-Language');
  sendKept(page, req, res);
}
