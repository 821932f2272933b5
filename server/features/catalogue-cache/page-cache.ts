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
 * without rendering. A kept page past its life but within the cache's stale time is still sent, and a fresh
 * one is rendered behind it (one render per page at a time), so a visitor waits for a render only when
 * nobody asked for that page for a while or the catalogue has changed.
 * A kept page is also kept compressed (brotli, gzip) once asked for, so a hit costs no compression.
 * Every rendered page, kept or not, gets a Content-Security-Policy hashed from its own inline scripts.
 * `onHit` runs after a kept page is sent, unless a render behind it does what it stands for.
 * `onRefreshError` hears of a render behind a sent page that failed (the stale page stays until its time).
 */
export function cachedPages(
  render: Render,
  write: (response: globalThis.Response, res: Response) => Promise<void>,
  cache: CatalogueCache | undefined,
  onHit?: (req: Request) => void,
  onRefreshError?: (error: unknown, req: Request) => void,
) {
  const refreshing = new Set<string>();

  /** Renders the page and keeps it when it may be kept; the response to send, or null for next(). */
  async function renderAndKeep(req: Request, key: string, keep: boolean): Promise<{ response: globalThis.Response; kept?: KeptAnswer } | null> {
    const mark = cache?.pages.mark;
    const rendered = await render(req);
    if (!rendered) return null;
    const response = await withPagePolicy(rendered);
    if (!cache || !keep || response.status !== 200 || response.headers.has('set-cookie')) return { response };
    const page: KeptAnswer = { status: response.status, headers: [...response.headers], body: Buffer.from(await response.arrayBuffer()) };
    cache.pages.set(key, page, mark);
    return { response, kept: page };
  }

  function refreshBehind(req: Request, key: string): boolean {
    if (refreshing.has(key)) return false;
    refreshing.add(key);
    renderAndKeep(req, key, true)
      .catch((error: unknown) => onRefreshError?.(error, req))
      .finally(() => refreshing.delete(key));
    return true;
  }

  return async (req: Request, res: Response, next: NextFunction): Promise<void> => {
    const anonymous = req.method === 'GET' && !carriesSessionCookie(req);
    // Pages are rendered in the reader's locale (dates, numbers, money), so each locale keeps its own copy.
    const key = `${localeOfHeader(req.headers['accept-language'])} ${req.originalUrl}`;
    const hit = anonymous ? cache?.pages.peek(key) : undefined;
    if (hit) {
      send(hit.value, req, res);
      // The render behind a stale page is made for this visitor (it counts a lot's view, as a render does);
      // otherwise, what a render would have done besides rendering, after the page is sent.
      if (!hit.fresh && refreshBehind(req, key)) return;
      return onHit?.(req);
    }
    const done = await renderAndKeep(req, key, anonymous);
    if (!done) return next();
    if (done.kept) send(done.kept, req, res);
    else await write(done.response, res);
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
