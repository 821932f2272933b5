import { Router } from 'express';
import { LotCompareQuerySchema } from '@shared/contracts/compare';
import type { Db } from '../../db/client';
import { compareLots } from './lot-compare.service';

/** GET /api/lots/compare?ids=&zip=&tons= — mounted before the lots router so `compare` is not read as an id. */
export function lotCompareRouter(db: Db): Router {
  const router = Router();
  router.get('/', async (req, res) => {
    const query = LotCompareQuerySchema.parse(req.query);
    res.json(await compareLots(db, query));
  });
  return router;
}
