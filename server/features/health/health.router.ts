import { sql } from 'drizzle-orm';
import { Router } from 'express';
import type { Db } from '../../db/client';

/** Liveness and database reachability; 503 when the database does not answer. */
export function healthRouter(db: Db): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    const started = Date.now();
    try {
      await db.execute(sql`select 1`);
      res.json({ status: 'ok', database: { reachable: true, latencyMs: Date.now() - started } });
    } catch {
      res.status(503).json({ status: 'degraded', database: { reachable: false } });
    }
  });
  return router;
}
