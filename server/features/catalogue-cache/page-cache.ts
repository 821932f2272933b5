import type { NextFunction, Request, Response } from 'express';
import { parse } from 'cookie';
import { brotliCompressSync, constants, gzipSync } from 'node:zlib';
import { SESSION_COOKIE_NAMES } from '@shared/contracts/cookies';
import { localeOfHeader } from '@shared/contracts/locales';
import type { CachedPage, CatalogueCache } from './catalogue-cache';

/** Renders a page; undefined when the renderer has no page for the URL. */
type Render = (req: Request) => Promise<globalThis.Response | null | undefined>;

/**
 * Serves server-rendered pages, keeping a visitor's page (no session cookie, GET, 200, no cookie set by
 * the renderer) for the cache's short life so the next visitor to the same URL in the same locale gets it
 * without rendering.
 * A kept page is also kept compressed (brotli, gzip) once asked for, so a hit costs no compression.
 */
export function cachedPages(render: Render, write: (response: globalThis.Response, res: Response) => Promise<void>, cache: CatalogueCache | undefined) {
  return async (req: Request, res: Response, next: NextFunction): Promise<void> => {
    const cookies = parse(req.headers.cookie ?? '');
    const anonymous = req.method === 'GET' && !SESSION_COOKIE_NAMES.some((name) => cookies[name]);
    // Pages are rendered in the reader's locale (dates, numbers, money), so each locale keeps its own copy.
    const key = `${localeOfHeader(req.headers['accept-language'])} ${req.originalUrl}`;
    const hit = anonymous ? cache?.pages.get(key) : undefined;
    if (hit) return send(hit, req, res);
    const response = await render(req);
    if (!response) return next();
    if (!cache || !anonymous || response.status !== 200 || response.headers.has('set-cookie')) return write(response, res);
    const page: CachedPage = { status: response.status, headers: [...response.headers], body: Buffer.from(await response.arrayBuffer()) };
    cache.pages.set(key, page);
    send(page, req, res);
  };
}

function send(page: CachedPage, req: Request, res: Response): void {
  res.status(page.status);
  for (const [name, value] of page.headers) if (name !== 'content-length') res.setHeader(name, value);
  res.vary('Accept-Encoding');
  res.vary('Accept-Language');
  const encoding = preferredEncoding(req);
  if (!encoding) return void res.end(page.body);
  const body = (page.encoded ??= {})[encoding] ?? (page.encoded[encoding] = compress(page.body, encoding));
  // Already encoded: the compression middleware leaves the response alone.
  res.setHeader('Content-Encoding', encoding);
  res.setHeader('Content-Length', body.length);
  res.end(body);
}

/** Brotli when the browser takes it (browsers list gzip first at equal weight, brotli is smaller), else gzip, else none. */
function preferredEncoding(req: Request): 'br' | 'gzip' | undefined {
  if (!req.headers['accept-encoding']) return undefined;
  return (['br', 'gzip'] as const).find((encoding) => req.acceptsEncodings(encoding) === encoding);
}

/** Brotli at quality 5 and gzip at level 6: near the best size for HTML at a few milliseconds, once per kept page. */
function compress(body: Buffer, encoding: 'br' | 'gzip'): Buffer {
  return encoding === 'br'
    ? brotliCompressSync(body, { params: { [constants.BROTLI_PARAM_QUALITY]: 5, [constants.BROTLI_PARAM_SIZE_HINT]: body.length } })
    : gzipSync(body, { level: 6 });
}
