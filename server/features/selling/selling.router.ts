import { Router } from 'express';
import { z } from 'zod';
import { analysisCsvTemplate } from '@shared/contracts/analysis-csv';
import { AnalysisStepSchema, LotStepSchema, PhotoOrderSchema, PriceStepSchema, QuantityStepSchema, SamplingStepSchema } from '@shared/contracts/selling';
import type { ApiDeps } from '../../api-deps';
import { idParams } from '../../middleware/id-params';
import { requireRole } from '../../middleware/require-role';
import { LotPhotosService } from '../photos/lot-photos.service';
import { ownedLot } from './lot-access';
import { LotLifecycleService } from './lot-lifecycle.service';
import { LotStepsService } from './lot-steps.service';
import { editableLot } from './lot-view';

const LOT = { id: 'That lot' };

/** The grower's side of lots: the guided form's steps, the dashboard and the lot's life cycle. */
export function sellingRouter(deps: ApiDeps): Router {
  const { db, storage, logger, clock } = deps;
  const steps = new LotStepsService(db, clock);
  const lifecycle = new LotLifecycleService(db, clock);
  const photosOfLot = new LotPhotosService(deps);
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
    const id = await steps.create(req.user!, LotStepSchema.parse(req.body));
    res.status(201).json(await editableLot(db, id, clock));
  });

  router.get('/lots/:id', async (req, res) => {
    const { id } = idParams(req.params, LOT);
    await ownedLot(db, id, req.user);
    res.json(await editableLot(db, id, clock));
  });

  // Each form step: the body is parsed with the step's contract here, the service gets typed input.
  const step = <T>(path: string, schema: z.ZodType<T>, save: (user: Express.User, id: number, input: T) => Promise<void>) =>
    router.put(`/lots/:id/${path}`, async (req, res) => {
      const { id } = idParams(req.params, LOT);
      await save(req.user!, id, schema.parse(req.body));
      res.json(await editableLot(db, id, clock));
    });
  step('lot', LotStepSchema, (u, id, input) => steps.saveLot(u, id, input));
  step('quantity', QuantityStepSchema, (u, id, input) => steps.saveQuantity(u, id, input));
  step('sampling', SamplingStepSchema, (u, id, input) => steps.saveSampling(u, id, input));
  step('analysis', AnalysisStepSchema, (u, id, input) => steps.saveAnalysis(u, id, input));
  step('photos', z.unknown(), (u, id) => steps.savePhotosStep(u, id));
  step('price', PriceStepSchema, (u, id, input) => steps.savePrice(u, id, input));

  router.put('/lots/:id/photo-order', async (req, res) => {
    const { id } = idParams(req.params, LOT);
    await photosOfLot.reorder(req.user!, id, PhotoOrderSchema.parse(req.body));
    res.json(await editableLot(db, id, clock));
  });

  router.delete('/lots/:id/photos/:photoId', async (req, res) => {
    const { id, photoId } = idParams(req.params, { ...LOT, photoId: 'That photo' });
    await photosOfLot.remove(req.user!, id, photoId);
    res.json(await editableLot(db, id, clock));
  });

  router.post('/lots/:id/submit', async (req, res) => {
    const { id } = idParams(req.params, LOT);
    await lifecycle.submit(req.user!, id);
    res.json(await editableLot(db, id, clock));
  });

  router.post('/lots/:id/withdraw', async (req, res) => {
    const { id } = idParams(req.params, LOT);
    await lifecycle.withdraw(req.user!, id);
    res.json(await editableLot(db, id, clock));
  });

  router.post('/lots/:id/relist', async (req, res) => {
    const { id } = idParams(req.params, LOT);
    await lifecycle.relist(req.user!, id);
    res.json(await editableLot(db, id, clock));
  });

  router.post('/lots/:id/copy', async (req, res) => {
    const { id } = idParams(req.params, LOT);
    const copy = await lifecycle.copyForNextCutting(req.user!, id);
    res.status(201).json(await editableLot(db, copy, clock));
  });

  return router;
}
