import { Router } from 'express';
import { LotSearchSchema } from '@shared/contracts/lots';
import type { ApiDeps } from '../../api-deps';
import { idParams } from '../../middleware/id-params';
import { sendKept } from '../catalogue-cache/kept-answer';
import { viewLotPage } from './lot-page';
import { visitorKey } from './lot-views';
import { LotsService } from './lots.service';
import { CATALOGUE_READ_CACHE_CONTROL, searchAnswer } from './search-answers';

export function lotsRouter({ db, clock, catalogueCache, env }: Pick<ApiDeps, 'db' | 'clock' | 'catalogueCache' | 'env'>): Router {
  const service = new LotsService(db);
  const router = Router();

  router.get('/', async (req, res) => {
    const query = LotSearchSchema.parse(req.query);
    sendKept(await searchAnswer(req, query, service, catalogueCache), req, res);
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
