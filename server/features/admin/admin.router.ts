import { desc, sql } from 'drizzle-orm';
import { Router } from 'express';
import { z } from 'zod';
import type { Db } from '../../db/client';
import { users } from '../../db/schema';
import { requireRole } from '../../middleware/require-role';

const UsersQuery = z.object({ q: z.string().trim().max(100).optional(), limit: z.coerce.number().int().min(1).max(200).default(50) }).strict();

/** Admin-only tools. Every route here sits behind requireRole('admin'). */
export function adminRouter(db: Db): Router {
  const router = Router();
  router.use(requireRole('admin'));

  router.get('/users', async (req, res) => {
    const { q, limit } = UsersQuery.parse(req.query);
    const rows = await db
      .select({ id: users.id, email: users.email, displayName: users.displayName, role: users.role, createdAt: users.createdAt, disabledAt: users.disabledAt })
      .from(users)
      .where(q ? sql`${users.email} ilike ${'%' + q + '%'} or ${users.displayName} ilike ${'%' + q + '%'}` : undefined)
      .orderBy(desc(users.createdAt))
      .limit(limit);
    res.json({ items: rows });
  });

  return router;
}
