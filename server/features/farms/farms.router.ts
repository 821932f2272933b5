import { Router } from 'express';
import { FarmProfileInputSchema } from '../../../shared/contracts/selling';
import type { ApiDeps } from '../../api';
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

  router.post('/mine/payouts/link', async (req, res) => {
    const link = await service.payoutLink(req.user!, deps.env.PUBLIC_URL).catch((err: unknown) => {
      if (err instanceof HttpError) throw err;
      deps.logger.error({ err }, 'payout onboarding link failed');
      throw new HttpError(502, 'payments_unavailable', 'The payment provider did not answer. Try again in a minute.');
    });
    res.json(link);
  });

  router.post('/mine/payouts/refresh', async (req, res) => {
    res.json({ farm: farmProfileView(await service.refreshPayouts(req.user!.id)) });
  });

  return router;
}
