import { Router } from 'express';
import { AuditQuerySchema, ChangeRoleSchema, ReinstateSchema, SuspendSchema, UsersQuerySchema } from '@shared/contracts/admin';
import type { ApiDeps } from '../../api-deps';
import { idParams } from '../../middleware/id-params';
import { requireRole } from '../../middleware/require-role';
import { auditTrail } from '../audit/audit-query';
import { adminOverview } from './overview';
import { SettingsService } from '../settings/settings.service';
import { UsersService } from '../users/users.service';


/** Admin-only tools: users, settings, the audit trail. Every route here sits behind requireRole('admin'). */
export function adminRouter(deps: ApiDeps): Router {
  const { db, clock } = deps;
  const usersService = new UsersService(db, clock);
  const settings = new SettingsService(db, clock);
  const router = Router();
  router.use(requireRole('admin'));

  router.get('/overview', async (_req, res) => {
    res.json(await adminOverview(db, clock.now()));
  });

  router.get('/users', async (req, res) => {
    res.json({ items: await usersService.list(UsersQuerySchema.parse(req.query)) });
  });

  router.post('/users/:id/role', async (req, res) => {
    const { id } = idParams(req.params, { id: 'That user' });
    const { role, reason } = ChangeRoleSchema.parse(req.body);
    res.json(await usersService.changeRole(req.user!, id, role, reason));
  });

  router.post('/users/:id/suspend', async (req, res) => {
    const { id } = idParams(req.params, { id: 'That user' });
    const { reason } = SuspendSchema.parse(req.body);
    res.json(await usersService.suspend(req.user!, id, reason));
  });

  router.post('/users/:id/reinstate', async (req, res) => {
    const { id } = idParams(req.params, { id: 'That user' });
    const { reason } = ReinstateSchema.parse(req.body);
    res.json(await usersService.reinstate(req.user!, id, reason));
  });

  router.get('/settings', async (_req, res) => {
    res.json(await settings.current());
  });

  router.put('/settings', async (req, res) => {
    res.json(await settings.update(req.user!.id, req.body));
  });

  router.get('/audit', async (req, res) => {
    res.json({ items: await auditTrail(db, AuditQuerySchema.parse(req.query)) });
  });

  return router;
}
