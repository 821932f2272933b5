import { Router } from 'express';
import { LotSearchSchema } from '@shared/contracts/lots';
import type { ApiDeps } from '../../api-deps';
import { idParams } from '../../middleware/id-params';
import { viewLotPage } from './lot-page';
import { visitorKey } from './lot-views';
import { LotsService } from './lots.service';

const CATALOGUE_READ_CACHE_CONTROL = 'public, max-age=10, stale-while-revalidate=60';

export function lotsRouter({ db, clock, catalogueCache, env }: Pick<ApiDeps, 'db' | 'clock' | 'catalogueCache' | 'env'>): Router {
  const service = new LotsService(db);
  const router = Router();

  router.get('/', async (req, res) => {
    const query = LotSearchSchema.parse(req.query);
    // The same for every visitor: browsers and proxies may keep it briefly and revalidate by ETag.
    res.set('Cache-Control', CATALOGUE_READ_CACHE_CONTROL);
    const search = () => service.search(query);
    res.json(catalogueCache ? await catalogueCache.searches.getOrLoad(JSON.stringify(query), search) : await search());
  });

  router.get('/:id', async (req, res) => {
    const { id } = idParams(req.params, { id: 'That lot' });
    const lot = await viewLotPage(db, id, req.user, clock, visitorKey(req, env.SESSION_SECRET));
    // A visitor's copy may be kept briefly; a signed-in grower or admin may see more, so theirs is not.
    res.set('Cache-Control', req.user ? 'private, no-cache' : CATALOGUE_READ_CACHE_CONTROL).vary('Cookie');
    res.json(lot);
  });

  return router;
}
