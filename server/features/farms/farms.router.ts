import { Router } from 'express';
import { FarmProfileInputSchema } from '@shared/contracts/selling';
import type { ApiDeps } from '../../api-deps';
import { HttpError } from '../../middleware/http-error';
import { requireRole } from '../../middleware/require-role';
import { farmProfileView, FarmsService } from './farms.service';

/** The signed-in grower's own farm: GET/PUT /farms/mine, and payout set-up. */
export function farmsRouter(deps: ApiDeps): Router {
  const service = new FarmsService(deps.db, deps.stripe);
  const router = Router();
  router.use(requireRole('grower'));

  router.get('/mine', async (req, res) => {
    const farm = await service.mine(req.user!.id);
    res.json({ farm: farm ? farmProfileView(farm) : null });
  });

  router.put('/mine', async (req, res) => {
    const input = FarmProfileInputSchema.parse(req.body);
    res.json({ farm: farmProfileView(await service.save(req.user!.id, input)) });
  });

  /** Provider failures become a 502 the grower can act on; our own errors pass through. */
  const providerCall = <T>(work: Promise<T>): Promise<T> =>
    work.catch((err: unknown) => {
      if (err instanceof HttpError) throw err;
      deps.logger.error({ err }, 'payment provider call failed');
      throw new HttpError(502, 'payments_unavailable', 'The payment provider did not answer. Try again in a minute.');
    });

  router.post('/mine/payouts/link', async (req, res) => {
    res.json(await providerCall(service.payoutLink(req.user!, deps.env.PUBLIC_URL)));
  });

  router.post('/mine/payouts/refresh', async (req, res) => {
    res.json({ farm: farmProfileView(await providerCall(service.refreshPayouts(req.user!.id))) });
  });

  return router;
}
