import type { Request, RequestHandler } from 'express';
import { LotSearchSchema, type LotSearch } from '@shared/contracts/lots';
import { carriesSessionCookie } from '../../middleware/session-cookie';
import type { CatalogueCache } from '../catalogue-cache/catalogue-cache';
import { keepJson, sendKept, type KeptAnswer } from '../catalogue-cache/kept-answer';
import type { LotsService } from './lots.service';

/** Catalogue reads are the same for every visitor: browsers and proxies may keep them briefly and revalidate by ETag. */
export const CATALOGUE_READ_CACHE_CONTROL = 'public, max-age=10, stale-while-revalidate=60';

/** One key per search, however its query string was written (order of parameters, defaults left out). */
const searchKey = (query: LotSearch) => JSON.stringify(query);
/** The same answer under the URL exactly as it was asked, so a repeat of it needs no query parsing at all. */
const urlKey = (req: Request) => `url ${req.originalUrl}`;

/**
 * A search's answer as ready bytes, from the catalogue cache when it holds one, else searched and kept
 * there. Search results are the same for everyone (nothing in them depends on who asks).
 */
export async function searchAnswer(req: Request, query: LotSearch, service: LotsService, cache: CatalogueCache | undefined): Promise<KeptAnswer> {
  const search = async () => keepJson(req, await service.search(query), [['cache-control', CATALOGUE_READ_CACHE_CONTROL]]);
  if (!cache) return search();
  const kept = cache.searches.get(searchKey(query));
  if (kept) return kept;
  const loaded = await search();
  // Kept at the same moment under both keys, so neither outlives the other.
  cache.searches.set(searchKey(query), loaded);
  cache.searches.set(urlKey(req), loaded);
  return loaded;
}

/**
 * Answers a visitor's repeated search (GET /lots, no session cookie) from the kept bytes before the
 * body parser, session store, passport and CSRF check run: none of them changes what a search returns.
 * Everything else (a signed-in request, a search not kept yet, bad input) goes on to the full chain,
 * which searches, keeps the answer and sends the same bytes. `securityHeaders` (the API's helmet) is applied
 * to every answer sent here.
 */
export function keptSearchAnswers(cache: CatalogueCache | undefined, securityHeaders: RequestHandler): RequestHandler {
  return (req, res, next) => {
    if (!cache || (req.method !== 'GET' && req.method !== 'HEAD') || (req.path !== '/lots' && req.path !== '/lots/') || carriesSessionCookie(req)) return next();
    let kept = cache.searches.get(urlKey(req));
    if (!kept) {
      const query = LotSearchSchema.safeParse(req.query);
      kept = query.success ? cache.searches.get(searchKey(query.data)) : undefined;
    }
    if (!kept) return next();
    const answer = kept;
    void securityHeaders(req, res, (err?: unknown) => (err ? next(err) : sendKept(answer, req, res)));
  };
}
