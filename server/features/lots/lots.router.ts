import { Router } from 'express';
import { LotSearchSchema } from '@shared/contracts/lots';
import type { ApiDeps } from '../../api-deps';
import { idParams } from '../../middleware/id-params';
import { viewLotPage } from './lot-page';
import { LotsService } from './lots.service';

export function lotsRouter({ db, clock }: Pick<ApiDeps, 'db' | 'clock'>): Router {
  const service = new LotsService(db);
  const router = Router();

  router.get('/', async (req, res) => {
    const query = LotSearchSchema.parse(req.query);
    res.json(await service.search(query));
  });

  router.get('/:id', async (req, res) => {
    const { id } = idParams(req.params, { id: 'That lot' });
    res.json(await viewLotPage(db, id, req.user, clock));
  });

  return router;
}
