import { and, eq, inArray } from 'drizzle-orm';
import { Router } from 'express';
import { z } from 'zod';
import { analysisCsvTemplate } from '@shared/contracts/analysis-csv';
import { PhotoOrderSchema } from '@shared/contracts/selling';
import type { ApiDeps } from '../../api-deps';
import { photos } from '../../db/schema';
import { HttpError, notFound } from '../../middleware/http-error';
import { requireRole } from '../../middleware/require-role';
import { ownedLot } from './lot-access';
import { LotLifecycleService } from './lot-lifecycle.service';
import { LotStepsService } from './lot-steps.service';
import { editableLot } from './lot-view';

const LotParams = z.object({ id: z.coerce.number().int().positive('Lot id must be a positive whole number.') });
const PhotoParams = LotParams.extend({ photoId: z.coerce.number().int().positive('Photo id must be a positive whole number.') });

/** The grower's side of lots: the guided form's steps, the dashboard and the lot's life cycle. */
export function sellingRouter(deps: ApiDeps): Router {
  const { db, storage, logger, clock } = deps;
  const steps = new LotStepsService(db, clock);
  const lifecycle = new LotLifecycleService(db, clock);
  const router = Router();
  router.use(requireRole('grower'));

  router.get('/analysis-template.csv', (_req, res) => {
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('Content-Disposition', 'attachment; filename="lab-values-template.csv"');
    res.send(analysisCsvTemplate());
  });

  router.get('/lots', async (req, res) => {
    res.json({ items: await lifecycle.myLots(req.user!) });
  });

  router.post('/lots', async (req, res) => {
    const id = await steps.create(req.user!, req.body);
    res.status(201).json(await editableLot(db, id, clock));
  });

  router.get('/lots/:id', async (req, res) => {
    const { id } = LotParams.parse(req.params);
    await ownedLot(db, id, req.user);
    res.json(await editableLot(db, id, clock));
  });

  const step = (path: string, save: (user: Express.User, id: number, body: unknown) => Promise<void>) =>
    router.put(`/lots/:id/${path}`, async (req, res) => {
      const { id } = LotParams.parse(req.params);
      await save(req.user!, id, req.body);
      res.json(await editableLot(db, id, clock));
    });
  step('lot', (u, id, b) => steps.saveLot(u, id, b));
  step('quantity', (u, id, b) => steps.saveQuantity(u, id, b));
  step('sampling', (u, id, b) => steps.saveSampling(u, id, b));
  step('analysis', (u, id, b) => steps.saveAnalysis(u, id, b));
  step('photos', (u, id) => steps.savePhotosStep(u, id));
  step('price', (u, id, b) => steps.savePrice(u, id, b));

  router.put('/lots/:id/photo-order', async (req, res) => {
    const { id } = LotParams.parse(req.params);
    const input = PhotoOrderSchema.parse(req.body);
    await ownedLot(db, id, req.user);
    await db.transaction(async (tx) => {
      const rows = await tx.select({ id: photos.id }).from(photos).where(eq(photos.lotId, id));
      const known = new Set(rows.map((r) => r.id));
      if (input.order.length !== known.size || input.order.some((p) => !known.has(p))) {
        throw new HttpError(400, 'photo_order_mismatch', 'The order must list each photo of this lot exactly once.');
      }
      // The cover flag is cleared first: one cover per lot is enforced by a unique index.
      await tx.update(photos).set({ isCover: false }).where(eq(photos.lotId, id));
      for (const [position, photoId] of input.order.entries()) {
        await tx.update(photos).set({ position, isCover: photoId === input.coverId }).where(eq(photos.id, photoId));
      }
    });
    res.json(await editableLot(db, id, clock));
  });

  router.delete('/lots/:id/photos/:photoId', async (req, res) => {
    const { id, photoId } = PhotoParams.parse(req.params);
    await ownedLot(db, id, req.user);
    const [removed] = await db.delete(photos).where(and(eq(photos.id, photoId), eq(photos.lotId, id))).returning();
    if (!removed) throw notFound('That photo');
    if (removed.isCover) {
      const [next] = await db.select({ id: photos.id }).from(photos).where(eq(photos.lotId, id)).orderBy(photos.position).limit(1);
      if (next) await db.update(photos).set({ isCover: true }).where(inArray(photos.id, [next.id]));
    }
    // The row is gone, so the public variants can go; the original upload stays in stored_files.
    await Promise.allSettled(removed.variants.map((v) => storage.remove(v.key))).then((results) => {
      const failed = results.filter((r) => r.status === 'rejected').length;
      if (failed) logger.warn({ photoId, failed }, 'some photo variants could not be removed');
    });
    res.json(await editableLot(db, id, clock));
  });

  router.post('/lots/:id/submit', async (req, res) => {
    const { id } = LotParams.parse(req.params);
    await lifecycle.submit(req.user!, id);
    res.json(await editableLot(db, id, clock));
  });

  router.post('/lots/:id/withdraw', async (req, res) => {
    const { id } = LotParams.parse(req.params);
    await lifecycle.withdraw(req.user!, id);
    res.json(await editableLot(db, id, clock));
  });

  router.post('/lots/:id/relist', async (req, res) => {
    const { id } = LotParams.parse(req.params);
    await lifecycle.relist(req.user!, id);
    res.json(await editableLot(db, id, clock));
  });

  router.post('/lots/:id/copy', async (req, res) => {
    const { id } = LotParams.parse(req.params);
    const copy = await lifecycle.copyForNextCutting(req.user!, id);
    res.status(201).json(await editableLot(db, copy, clock));
  });

  return router;
}
