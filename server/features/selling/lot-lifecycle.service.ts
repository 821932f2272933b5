import { and, desc, eq, sql } from 'drizzle-orm';
import type { SellerLotRow } from '@shared/contracts/selling';
import { stepIndex } from '@shared/contracts/selling';
import { relistedStatus, requireLotTransition } from '@shared/lifecycle/lot-lifecycle';
import type { Clock } from '../../clock';
import type { Db } from '../../db/client';
import { farms, labAnalyses, lots, orderLines, orders } from '../../db/schema';
import { HttpError } from '../../middleware/http-error';
import { recordAudit } from '../audit/audit-log';
import { LotsService } from '../lots/lots.service';
import { ownedLot } from './lot-access';
import { editableLot } from './lot-view';
import { balesToTons } from '@shared/units';

/** Submitting, withdrawing, relisting and copying lots, and the grower's list of them. */
export class LotLifecycleService {
  constructor(
    private readonly db: Db,
    private readonly clock: Clock,
  ) {}

  async submit(user: Express.User, lotId: number): Promise<void> {
    const { lot } = await ownedLot(this.db, lotId, user);
    const next = requireLotTransition(lot.status, 'submit', 'grower');
    const view = await editableLot(this.db, lotId, this.clock);
    if (view.missing.length > 0) {
      throw new HttpError(400, 'lot_incomplete', `Before submitting, add ${view.missing.join(', ')}.`, view.missing.map((m) => ({ path: 'lot', message: m })));
    }
    const now = this.clock.now();
    await this.db.transaction(async (tx) => {
      await tx.update(lots).set({ status: next, reviewNote: null, updatedAt: now }).where(eq(lots.id, lotId));
      const reopened = await tx.update(labAnalyses).set({ verification: 'pending' }).where(and(eq(labAnalyses.lotId, lotId), eq(labAnalyses.isCurrent, true), eq(labAnalyses.verification, 'rejected'))).returning({ id: labAnalyses.id });
      const analysis = reopened.length > 0 ? { before: { analysisVerification: 'rejected' }, after: { analysisVerification: 'pending' } } : { before: {}, after: {} };
      await recordAudit(tx, {
        actorId: user.id,
        action: 'lot.submitted',
        entityType: 'lot',
        entityId: lotId,
        before: { status: lot.status, reviewNote: lot.reviewNote, ...analysis.before },
        after: { status: next, reviewNote: null, ...analysis.after },
        data: { from: lot.status },
        at: now,
      });
    });
  }

  /** Takes a lot off sale (or out of the queue); nothing is deleted. */
  async withdraw(user: Express.User, lotId: number): Promise<void> {
    const { lot } = await ownedLot(this.db, lotId, user);
    const next = requireLotTransition(lot.status, 'withdraw', 'grower');
    const now = this.clock.now();
    await this.db.transaction(async (tx) => {
      await tx.update(lots).set({ status: next, updatedAt: now }).where(eq(lots.id, lotId));
      await recordAudit(tx, { actorId: user.id, action: 'lot.withdrawn', entityType: 'lot', entityId: lotId, before: { status: lot.status }, after: { status: next }, data: { from: lot.status }, at: now });
    });
  }

  /** Back on sale at once when the current analysis is still verified; otherwise back to review. */
  async relist(user: Express.User, lotId: number): Promise<'listed' | 'in_review'> {
    const { lot } = await ownedLot(this.db, lotId, user);
    const [analysis] = await this.db.select({ verification: labAnalyses.verification }).from(labAnalyses).where(and(eq(labAnalyses.lotId, lotId), eq(labAnalyses.isCurrent, true)));
    const next = relistedStatus(lot.status, { analysisVerified: analysis?.verification === 'verified', everPublished: lot.publishedAt !== null, balesAvailable: lot.balesAvailable });
    const now = this.clock.now();
    await this.db.transaction(async (tx) => {
      await tx.update(lots).set({ status: next, updatedAt: now }).where(eq(lots.id, lotId));
      await recordAudit(tx, { actorId: user.id, action: 'lot.relisted', entityType: 'lot', entityId: lotId, before: { status: lot.status }, after: { status: next }, data: { to: next }, at: now });
    });
    return next === 'in_review' ? 'in_review' : 'listed';
  }

  /**
   * A new draft for the next cutting of the same field: the lot, quantity and price carry over; the
   * sampling, analysis and photos do not (they belong to the hay that was tested).
   */
  async copyForNextCutting(user: Express.User, lotId: number): Promise<number> {
    const { lot } = await ownedLot(this.db, lotId, user);
    const cutting = Math.min(8, lot.cutting + 1);
    const {
      id: _id, status: _s, draftStep: _d, reviewNote: _rn, reviewedBy: _rb, reviewedAt: _ra, publishedAt: _p, viewCount: _v, createdAt: _c, updatedAt: _u, copiedFromId: _cf, revision: _rev,
      ...rest
    } = lot;
    const [row] = await this.db
      .insert(lots)
      .values({
        ...rest,
        cutting,
        title: lot.title.replace(/\b\d+(st|nd|rd|th) cutting\b/, `${cutting}${cutting === 2 ? 'nd' : cutting === 3 ? 'rd' : 'th'} cutting`),
        balesAvailable: lot.baleCount,
        status: 'draft',
        // The lot and quantity carry over; sampling and analysis must be entered for the new hay.
        draftStep: Math.min(lot.draftStep, stepIndex('quantity')),
        copiedFromId: lot.id,
      })
      .returning({ id: lots.id });
    return row!.id;
  }

  async myLots(user: Express.User): Promise<SellerLotRow[]> {
    const rows = await this.db
      .select({
        id: lots.id,
        title: lots.title,
        status: lots.status,
        draftStep: lots.draftStep,
        reviewNote: lots.reviewNote,
        baleType: lots.baleType,
        baleCount: lots.baleCount,
        balesAvailable: lots.balesAvailable,
        avgBaleWeightLb: lots.avgBaleWeightLb,
        priceCentsPerTon: lots.priceCentsPerTon,
        viewCount: lots.viewCount,
        orderCount: sql<number>`(select count(*) from ${orderLines} join ${orders} on ${orders.id} = ${orderLines.orderId} where ${orderLines.lotId} = ${lots.id} and ${orders.status} <> 'cancelled')`.mapWith(Number),
        updatedAt: lots.updatedAt,
      })
      .from(lots)
      .innerJoin(farms, eq(farms.id, lots.farmId))
      .where(eq(farms.ownerId, user.id))
      .orderBy(desc(lots.updatedAt), desc(lots.id));
    const covers = await new LotsService(this.db).coversFor(rows.map((r) => r.id));
    return rows.map(({ avgBaleWeightLb, updatedAt, ...r }) => ({
      ...r,
      tonsAvailable: balesToTons(r.balesAvailable, avgBaleWeightLb),
      cover: covers.get(r.id) ?? null,
      updatedAt: updatedAt.toISOString(),
    }));
  }
}
