import { eq, sql } from 'drizzle-orm';
import type { LotDetail } from '@shared/contracts/lots';
import type { Clock } from '../../clock';
import type { Db } from '../../db/client';
import { lots } from '../../db/schema';
import { notFound } from '../../middleware/http-error';
import { findLotDetail, type Viewer } from './lots.service';

/** A lot's page for `viewer` (404 when they may not see it); buyer and visitor views of an on-sale lot are counted. */
export async function viewLotPage(db: Db, id: number, viewer: Viewer, clock: Clock): Promise<LotDetail> {
  const lot = await findLotDetail(db, id, viewer, clock);
  if (!lot) throw notFound('That lot');
  if (lot.status === 'listed' && viewer?.role !== 'admin' && viewer?.role !== 'grower') {
    // Page views feed the grower's dashboard; cheap single-row update.
    await db.update(lots).set({ viewCount: sql`${lots.viewCount} + 1` }).where(eq(lots.id, id));
  }
  return lot;
}
