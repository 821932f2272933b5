import { and, eq } from 'drizzle-orm';
import { mayViewLot } from '@shared/lifecycle/lot-lifecycle';
import type { ApiDeps } from '../../api-deps';
import { labAnalyses, storedFiles } from '../../db/schema';
import { forbidden, notFound, unauthenticated } from '../../middleware/http-error';
import { findLotWithFarm } from '../selling/lot-access';

/**
 * A lot's lab report PDF for `user`: its grower and admins always; once an admin verified it and the lot is
 * public, any signed-in user (buyers check the report before they pay); never an anonymous visitor.
 */
export async function openLabReport(deps: Pick<ApiDeps, 'db' | 'storage'>, lotId: number, user: Express.User | undefined) {
  const { db, storage } = deps;
  if (!user) throw unauthenticated();
  const { lot, farm } = await findLotWithFarm(db, lotId);
  const [row] = await db
    .select({ file: storedFiles, verification: labAnalyses.verification })
    .from(labAnalyses)
    .innerJoin(storedFiles, eq(storedFiles.id, labAnalyses.reportFileId))
    .where(and(eq(labAnalyses.lotId, lotId), eq(labAnalyses.isCurrent, true)));
  const viewer = { isOwner: farm.ownerId === user.id, isAdmin: user.role === 'admin' };
  // Do not reveal whether an unlisted lot exists.
  if (!mayViewLot(lot.status, viewer)) throw notFound('That lab report');
  if (!viewer.isOwner && !viewer.isAdmin && row?.verification !== 'verified') {
    throw forbidden('The lab report is shown once an admin has verified it.');
  }
  if (!row) throw notFound('That lab report');
  const file = await storage.read(row.file.storageKey);
  if (!file) throw notFound('That lab report');
  return file;
}
