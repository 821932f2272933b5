import { Router } from 'express';
import { SavedSearchCreateSchema } from '@shared/contracts/saved-searches';
import type { Db } from '../../db/client';
import { idParams } from '../../middleware/id-params';
import { requireRole } from '../../middleware/require-role';
import { SavedSearchesService } from './saved-searches.service';


/** A signed-in buyer's saved catalogue searches. */
export function savedSearchesRouter(db: Db): Router {
  const service = new SavedSearchesService(db);
  const router = Router();
  router.use(requireRole('buyer'));

  router.get('/', async (req, res) => {
    res.json({ items: await service.list(req.user!.id) });
  });

  router.post('/', async (req, res) => {
    const input = SavedSearchCreateSchema.parse(req.body);
    res.status(201).json(await service.create(req.user!.id, input));
  });

  router.delete('/:id', async (req, res) => {
    const { id } = idParams(req.params, { id: 'That saved search' });
    await service.remove(req.user!.id, id);
    res.status(204).end();
  });

  return router;
}
