import type { NextFunction, Request, Response } from 'express';
import { parse } from 'cookie';
import { SESSION_COOKIE_NAMES } from '@shared/contracts/cookies';
import type { CachedPage, CatalogueCache } from './catalogue-cache';

/** Renders a page; undefined when the renderer has no page for the URL. */
type Render = (req: Request) => Promise<globalThis.Response | null | undefined>;

/**
 * Serves server-rendered pages, keeping a visitor's page (no session cookie, GET, 200, no cookie set by
 * the renderer) for the cache's short life so the next visitor to the same URL gets it without rendering.
 */
export function cachedPages(render: Render, write: (response: globalThis.Response, res: Response) => Promise<void>, cache: CatalogueCache | undefined) {
  return async (req: Request, res: Response, next: NextFunction): Promise<void> => {
    const cookies = parse(req.headers.cookie ?? '');
    const anonymous = req.method === 'GET' && !SESSION_COOKIE_NAMES.some((name) => cookies[name]);
    const key = req.originalUrl;
    const hit = anonymous ? cache?.pages.get(key) : undefined;
    if (hit) return send(hit, res);
    const response = await render(req);
    if (!response) return next();
    if (!cache || !anonymous || response.status !== 200 || response.headers.has('set-cookie')) return write(response, res);
    const page: CachedPage = { status: response.status, headers: [...response.headers], body: Buffer.from(await response.arrayBuffer()) };
    cache.pages.set(key, page);
    send(page, res);
  };
}

function send(page: CachedPage, res: Response): void {
  res.status(page.status);
  for (const [name, value] of page.headers) if (name !== 'content-length') res.setHeader(name, value);
  res.end(page.body);
}
