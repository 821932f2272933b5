import { Router } from 'express';
import { ApproveLotSchema, ReturnLotSchema } from '@shared/contracts/selling';
import type { ApiDeps } from '../../api-deps';
import { idParams } from '../../middleware/id-params';
import { requireRole } from '../../middleware/require-role';
import { ReviewService } from './review.service';


/** Admin verification of submitted lots. */
export function reviewRouter(deps: ApiDeps): Router {
  const service = new ReviewService(deps);
  const router = Router();
  router.use(requireRole('admin'));

  router.get('/queue', async (_req, res) => {
    res.json({ items: await service.queue() });
  });

  router.get('/lots/:id', async (req, res) => {
    const { id } = idParams(req.params, { id: 'That lot' });
    res.json(await service.lot(id));
  });

  router.post('/lots/:id/approve', async (req, res) => {
    const { id } = idParams(req.params, { id: 'That lot' });
    const { revision } = ApproveLotSchema.parse(req.body);
    await service.approve(req.user!, id, revision);
    res.json(await service.lot(id));
  });

  router.post('/lots/:id/return', async (req, res) => {
    const { id } = idParams(req.params, { id: 'That lot' });
    const { reason } = ReturnLotSchema.parse(req.body);
    await service.returnToGrower(req.user!, id, reason);
    res.json(await service.lot(id));
  });

  return router;
}
