import { Router } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import { PurchasePlanRequestSchema } from '@shared/contracts/planner';
import { horseRequirements, RequirementsRequestSchema } from '@shared/nutrition';
import { HerdNeedsRequestSchema, planHerdNeeds } from '@shared/planner';
import type { Db } from '../../db/client';
import { HttpError } from '../../middleware/http-error';
import { planPurchase } from './planner.service';

/** Horse needs and hay purchase plans. Open to visitors: planning needs no account. */
export function plannerRouter(db: Db, options: { planLimitPerMinute: number } = { planLimitPerMinute: 30 }): Router {
  const router = Router();

  // The solver is the one costly call here; keep one address from monopolising it.
  const planLimiter = rateLimit({
    windowMs: 60 * 1000,
    limit: options.planLimitPerMinute,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) => ipKeyGenerator(req.ip ?? ''),
    handler: (_req, _res, next) => next(new HttpError(429, 'too_many_plans', 'Too many plans in a minute. Wait a moment and try again.')),
  });

  router.post('/requirements', (req, res) => {
    const input = RequirementsRequestSchema.parse(req.body);
    res.json(horseRequirements(input));
  });

  router.post('/herd-needs', (req, res) => {
    const input = HerdNeedsRequestSchema.parse(req.body);
    res.json(planHerdNeeds(input));
  });

  router.post('/purchase-plan', planLimiter, async (req, res) => {
    const input = PurchasePlanRequestSchema.parse(req.body);
    res.json(await planPurchase(db, input));
  });

  return router;
}
