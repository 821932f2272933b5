import { eq } from 'drizzle-orm';
import { Router, type Response } from 'express';
import { z } from 'zod';
import { CreateBatchSchema } from '@shared/contracts/payouts';
import type { ApiDeps } from '../../api-deps';
import { farms } from '../../db/schema';
import { notFound } from '../../middleware/http-error';
import { idParams } from '../../middleware/id-params';
import { requireRole } from '../../middleware/require-role';
import { payoutStatementCsv } from './payout-statement';
import { PayoutsService } from './payouts.service';

const FarmQuery = z.object({ farmId: z.coerce.number().int().positive('farmId must be a positive whole number.') }).strict();

function sendCsv(res: Response, name: string, csv: string): void {
  res.setHeader('Content-Type', 'text/csv; charset=utf-8');
  res.setHeader('Content-Disposition', `attachment; filename="${name}"`);
  res.send(csv);
}

/** Admin: what is due, batches, settling, statements. Mounted under /admin/payouts. */
export function adminPayoutsRouter(deps: ApiDeps): Router {
  const service = new PayoutsService(deps);
  const router = Router();
  router.use(requireRole('admin'));

  router.get('/due', async (_req, res) => {
    res.json({ items: await service.due() });
  });
  router.get('/batches', async (_req, res) => {
    res.json({ items: await service.batches() });
  });
  router.post('/batches', async (req, res) => {
    const input = CreateBatchSchema.parse(req.body);
    res.status(201).json(await service.createBatch(req.user!, input));
  });
  router.get('/batches/:id', async (req, res) => {
    res.json(await service.batch(idParams(req.params, { id: 'That payout batch' }).id));
  });
  router.post('/batches/:id/settle', async (req, res) => {
    res.json(await service.settle(req.user!, idParams(req.params, { id: 'That payout batch' }).id));
  });
  router.post('/:id/retry', async (req, res) => {
    res.json(await service.retry(req.user!, idParams(req.params, { id: 'That payout' }).id));
  });
  router.get('/statement.csv', async (req, res) => {
    const { farmId } = FarmQuery.parse(req.query);
    const [farm] = await deps.db.select().from(farms).where(eq(farms.id, farmId));
    if (!farm) throw notFound('That farm');
    sendCsv(res, `payouts-farm-${farmId}.csv`, payoutStatementCsv(farm.name, await service.history(farmId)));
  });
  return router;
}

/** Growers: their own payout history and statement. Mounted under /payouts. */
export function growerPayoutsRouter(deps: ApiDeps): Router {
  const service = new PayoutsService(deps);
  const router = Router();
  router.use(requireRole('grower'));
  const myFarm = async (userId: number) => {
    const [farm] = await deps.db.select().from(farms).where(eq(farms.ownerId, userId));
    if (!farm) throw notFound('Your farm profile');
    return farm;
  };
  router.get('/mine', async (req, res) => {
    const farm = await myFarm(req.user!.id);
    res.json({ items: await service.history(farm.id) });
  });
  router.get('/mine/statement.csv', async (req, res) => {
    const farm = await myFarm(req.user!.id);
    sendCsv(res, 'baleproof-payouts.csv', payoutStatementCsv(farm.name, await service.history(farm.id)));
  });
  return router;
}
