import type { LotDetail } from '@shared/contracts/lots';
import type { Clock } from '../../clock';
import type { Db } from '../../db/client';
import { notFound } from '../../middleware/http-error';
import { countLotView } from './lot-views';
import { findLotDetail, type Viewer } from './lots.service';

/**
 * A lot's page for `viewer` (404 when they may not see it). Buyer and visitor views of an on-sale lot are
 * counted once per visitor (`visitorKey`, null for robots) per day.
 */
export async function viewLotPage(db: Db, id: number, viewer: Viewer, clock: Clock, visitor: string | null): Promise<LotDetail> {
  const lot = await findLotDetail(db, id, viewer, clock);
  if (!lot) throw notFound('That lot');
  if (visitor && lot.status === 'listed' && viewer?.role !== 'admin' && viewer?.role !== 'grower') {
    // Page views feed the grower's dashboard.
    await countLotView(db, id, visitor, clock.now());
  }
  return lot;
}
