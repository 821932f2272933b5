import { eq } from 'drizzle-orm';
import { Router } from 'express';
import { z } from 'zod';
import { OpenClaimSchema, ResolveClaimSchema } from '@shared/contracts/claims';
import { CLAIM_STATUSES } from '@shared/lifecycle/claim-lifecycle';
import type { ApiDeps } from '../../api-deps';
import { qualityClaims, storedFiles } from '../../db/schema';
import { notFound } from '../../middleware/http-error';
import { requireRole, requireSignedIn } from '../../middleware/require-role';
import { acceptReport, filesOf } from '../uploads/upload-limits';
import { ClaimsService } from './claims.service';

const Id = z.object({ id: z.coerce.number().int().positive('Claim id must be a positive whole number.') });
const OrderQuery = z.object({ orderId: z.coerce.number({ error: 'Give the order id.' }).int().positive('Order id must be a positive whole number.').max(2 ** 31 - 1, 'No such order.') }).strict();
const ListQuery = z.object({ status: z.enum(CLAIM_STATUSES, { message: 'Unknown claim status.' }).optional() }).strict();

/** Buyers report problems; buyer, grower and admins read a claim. Mounted under /claims. */
export function claimsRouter(deps: ApiDeps): Router {
  const service = new ClaimsService(deps);
  const router = Router();

  router.post('/', requireRole('buyer'), async (req, res) => {
    res.status(201).json(await service.open(req.user!, OpenClaimSchema.parse(req.body)));
  });
  // Ownership is checked before the body is read, so a stranger's upload is never buffered or stored.
  router.post('/:id/retest', requireRole('buyer'), async (req, res, next) => {
    await service.openClaimOf(req.user!, Id.parse(req.params).id);
    acceptReport(req, res, next);
  }, async (req, res) => {
    const [file] = filesOf(req, 'retest report PDF');
    res.status(201).json(await service.attachRetest(req.user!, Id.parse(req.params).id, file!));
  });
  router.get('/', requireSignedIn, async (req, res) => {
    res.json({ items: await service.forOrder(req.user!, OrderQuery.parse(req.query).orderId) });
  });
  router.get('/:id', requireSignedIn, async (req, res) => {
    res.json(await service.viewFor(req.user!, Id.parse(req.params).id));
  });
  router.get('/:id/retest', requireSignedIn, async (req, res) => {
    const { id } = Id.parse(req.params);
    await service.viewFor(req.user!, id);
    const [row] = await deps.db.select({ key: storedFiles.storageKey }).from(qualityClaims).innerJoin(storedFiles, eq(storedFiles.id, qualityClaims.evidenceFileId)).where(eq(qualityClaims.id, id));
    const file = row ? await deps.storage.read(row.key) : null;
    if (!file) throw notFound('That retest report');
    res.setHeader('Content-Type', 'application/pdf');
    res.setHeader('Content-Disposition', `inline; filename="retest-claim-${id}.pdf"`);
    res.setHeader('Cache-Control', 'private, no-cache');
    file.stream.pipe(res);
  });
  return router;
}

/** Admins judge and decide claims. Mounted under /admin/claims. */
export function adminClaimsRouter(deps: ApiDeps): Router {
  const service = new ClaimsService(deps);
  const router = Router();
  router.use(requireRole('admin'));
  router.get('/', async (req, res) => {
    res.json({ items: await service.list(ListQuery.parse(req.query).status) });
  });
  router.get('/:id', async (req, res) => {
    res.json(await service.view(Id.parse(req.params).id));
  });
  router.post('/:id/resolve', async (req, res) => {
    res.json(await service.resolve(req.user!, Id.parse(req.params).id, ResolveClaimSchema.parse(req.body)));
  });
  return router;
}
