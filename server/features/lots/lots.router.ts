import { eq, sql } from 'drizzle-orm';
import { Router } from 'express';
import { z } from 'zod';
import { LotSearchSchema } from '@shared/contracts/lots';
import type { ApiDeps } from '../../api-deps';
import { lots } from '../../db/schema';
import { notFound } from '../../middleware/http-error';
import { findLotDetail, LotsService } from './lots.service';

const IdParams = z.object({ id: z.coerce.number().int().positive('Lot id must be a positive whole number.') });

export function lotsRouter({ db, clock }: Pick<ApiDeps, 'db' | 'clock'>): Router {
  const service = new LotsService(db);
  const router = Router();

  router.get('/', async (req, res) => {
    const query = LotSearchSchema.parse(req.query);
    res.json(await service.search(query));
  });

  router.get('/:id', async (req, res) => {
    const { id } = IdParams.parse(req.params);
    const lot = await findLotDetail(db, id, req.user, clock);
    if (!lot) throw notFound('That lot');
    if (lot.status === 'listed' && req.user?.role !== 'admin' && req.user?.role !== 'grower') {
      // Buyer and visitor page views feed the grower's dashboard; cheap single-row update.
      await db.update(lots).set({ viewCount: sql`${lots.viewCount} + 1` }).where(eq(lots.id, id));
    }
    res.json(lot);
  });

  return router;
}
