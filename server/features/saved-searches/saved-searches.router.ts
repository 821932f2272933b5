import { Router } from 'express';
import { z } from 'zod';
import { SavedSearchCreateSchema } from '@shared/contracts/saved-searches';
import type { Db } from '../../db/client';
import { requireRole } from '../../middleware/require-role';
import { SavedSearchesService } from './saved-searches.service';

const IdParams = z.object({ id: z.coerce.number().int().positive('Saved search id must be a positive whole number.') });

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
    const { id } = IdParams.parse(req.params);
    await service.remove(req.user!.id, id);
    res.status(204).end();
  });

  return router;
}
