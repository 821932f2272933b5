import { Router } from 'express';
import { evaluateForage, ForageEvaluationRequestSchema } from '@shared/forage';

/**
 * POST /api/forage/evaluate: the forage engine over HTTP (the lot form's live preview uses it; other
 * tools may too). Stateless and public; numbers are returned unrounded.
 */
export function forageRouter(): Router {
  const router = Router();
  router.post('/evaluate', (req, res) => {
    const input = ForageEvaluationRequestSchema.parse(req.body);
    res.json(evaluateForage(input));
  });
  return router;
}
