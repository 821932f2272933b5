import { and, asc, desc, eq, sql } from 'drizzle-orm';
import type { ReviewLotView, ReviewQueueRow } from '@shared/contracts/selling';
import { approvedStatus, requireLotTransition } from '@shared/lifecycle/lot-lifecycle';
import type { ApiDeps } from '../../api-deps';
import type { OutgoingMail } from '../../adapters/mail/mailer';
import { auditEvents, farms, labAnalyses, lots, users } from '../../db/schema';
import { conflict } from '../../middleware/http-error';
import { refreshSamplingVerdict } from '../lots/sampling-report';
import { findLotWithFarm } from '../selling/lot-access';
import { editableLot } from '../selling/lot-view';
import { onLotApproved } from './lot-approved';
import { approvedMail, returnedMail } from './review-mail';
import { auditChanges, auditChangesLine } from '@shared/contracts/audit-changes';
import { auditActionLabel } from '@shared/contracts/audit-labels';
import { recordAudit } from '../audit/audit-log';
import { compareWithReading } from '@shared/lab-report/compare-reading';
import { readingSummary } from '../uploads/report-reading';

/** The admin's verification desk: the queue, one lot with its report, approve or return. */
export class ReviewService {
  constructor(private readonly deps: ApiDeps) {}

  async queue(): Promise<ReviewQueueRow[]> {
    const { db } = this.deps;
    const rows = await db
      .select({
        id: lots.id,
        title: lots.title,
        farmName: farms.name,
        growerEmail: users.email,
        submittedAt: lots.updatedAt,
        labName: labAnalyses.labName,
        labCertified: labAnalyses.labCertified,
        errorFindings: sql<number>`coalesce((select count(*) from jsonb_array_elements(${labAnalyses.findings}) f where f->>'severity' = 'error'), 0)`.mapWith(Number),
        warningFindings: sql<number>`coalesce((select count(*) from jsonb_array_elements(${labAnalyses.findings}) f where f->>'severity' = 'warning'), 0)`.mapWith(Number),
      })
      .from(lots)
      .innerJoin(farms, eq(farms.id, lots.farmId))
      .innerJoin(users, eq(users.id, farms.ownerId))
      .leftJoin(labAnalyses, and(eq(labAnalyses.lotId, lots.id), eq(labAnalyses.isCurrent, true)))
      .where(eq(lots.status, 'in_review'))
      .orderBy(asc(lots.updatedAt), asc(lots.id));
    return rows.map((r) => ({ ...r, submittedAt: r.submittedAt.toISOString() }));
  }

  async lot(lotId: number): Promise<ReviewLotView> {
    const { db } = this.deps;
    // The revision is read first: everything read after it is that revision or a later one, never an earlier one.
    const { lot: row, farm } = await findLotWithFarm(db, lotId);
    const [owner] = await db.select({ email: users.email }).from(users).where(eq(users.id, farm.ownerId));
    const history = await db
      .select({ action: auditEvents.action, at: auditEvents.createdAt, before: auditEvents.before, after: auditEvents.after, data: auditEvents.data, actorName: users.displayName, actorRole: users.role })
      .from(auditEvents)
      .leftJoin(users, eq(users.id, auditEvents.actorId))
      .where(and(eq(auditEvents.entityType, 'lot'), eq(auditEvents.entityId, String(lotId))))
      .orderBy(desc(auditEvents.createdAt), desc(auditEvents.id))
      .limit(50);
    const lot = await editableLot(db, lotId, this.deps.clock);
    const [analysis] = await db.select().from(labAnalyses).where(and(eq(labAnalyses.lotId, lotId), eq(labAnalyses.isCurrent, true)));
    const reading = lot.analysis?.reportFile?.reading ?? null;
    return {
      lot,
      revision: row.revision,
      farm: { name: farm.name, city: farm.city, state: farm.state, growerEmail: owner?.email ?? '', payoutsReady: farm.payoutsEnabled },
      comparison: analysis ? compareWithReading(analysis, reading) : [],
      readingSummary: !lot.analysis?.reportFile ? 'No report PDF is attached.' : reading ? readingSummary(reading) : 'This PDF was stored before reports were read; compare it by eye.',
      history: history.map((h) => ({
        action: h.action,
        label: auditActionLabel(h.action),
        at: h.at.toISOString(),
        by: h.actorName ? `${h.actorName} (${h.actorRole})` : null,
        note: (h.data as { reason?: string }).reason ?? null,
        changes: auditChangesLine(auditChanges('lot', h.before, h.after)),
      })),
    };
  }

  /**
   * Approves the revision the admin reviewed. The lot's row is locked while the approval is written, and every
   * grower change bumps the revision under the same lock, so values the admin never saw are never approved.
   */
  async approve(admin: Express.User, lotId: number, revision: number): Promise<void> {
    const { db, env } = this.deps;
    const { farm } = await findLotWithFarm(db, lotId);
    const view = await editableLot(db, lotId, this.deps.clock);
    if (view.missing.length > 0) throw conflict('lot_incomplete', `This lot still lacks ${view.missing.join(', ')}.`);
    const now = this.deps.clock.now();
    const lot = await db.transaction(async (tx) => {
      const [row] = await tx.select().from(lots).where(eq(lots.id, lotId)).for('update');
      const lot = row!;
      if (lot.revision !== revision) {
        throw conflict(
          'lot_changed',
          `The grower changed this lot while you were reviewing it (you reviewed revision ${revision}; it is now revision ${lot.revision}). Reload the lot and check it again before approving.`,
        );
      }
      const next = approvedStatus(lot.status, lot.balesAvailable);
      const publishedAt = lot.publishedAt ?? now;
      await tx.update(lots).set({ status: next, publishedAt, reviewedBy: admin.id, reviewedAt: now, reviewNote: null, updatedAt: now }).where(eq(lots.id, lotId));
      const [analysis] = await tx.select({ verification: labAnalyses.verification }).from(labAnalyses).where(and(eq(labAnalyses.lotId, lotId), eq(labAnalyses.isCurrent, true)));
      await tx
        .update(labAnalyses)
        .set({ verification: 'verified', verifiedBy: admin.id, verifiedAt: now })
        .where(and(eq(labAnalyses.lotId, lotId), eq(labAnalyses.isCurrent, true)));
      // The sample's age is judged on the day the lot is first listed.
      await refreshSamplingVerdict(tx, lotId, now);
      await recordAudit(tx, {
        actorId: admin.id,
        action: 'lot.approved',
        entityType: 'lot',
        entityId: lotId,
        before: { status: lot.status, analysisVerification: analysis?.verification ?? null, publishedAt: lot.publishedAt?.toISOString() ?? null },
        after: { status: next, analysisVerification: 'verified', publishedAt: publishedAt.toISOString() },
        data: { title: lot.title, revision },
        at: now,
      });
      return lot;
    });
    await this.mailGrower(farm.ownerId, (to) => approvedMail(to, lot, env.PUBLIC_URL));
    await onLotApproved(this.deps, lotId);
  }

  async returnToGrower(admin: Express.User, lotId: number, reason: string): Promise<void> {
    const { db, env } = this.deps;
    const { lot, farm } = await findLotWithFarm(db, lotId);
    const next = requireLotTransition(lot.status, 'return', 'admin');
    const now = this.deps.clock.now();
    await db.transaction(async (tx) => {
      const [analysis] = await tx.select({ verification: labAnalyses.verification }).from(labAnalyses).where(and(eq(labAnalyses.lotId, lotId), eq(labAnalyses.isCurrent, true)));
      await tx.update(lots).set({ status: next, reviewNote: reason, reviewedBy: admin.id, reviewedAt: now, updatedAt: now }).where(eq(lots.id, lotId));
      await tx
        .update(labAnalyses)
        .set({ verification: 'rejected', verifiedBy: admin.id, verifiedAt: now })
        .where(and(eq(labAnalyses.lotId, lotId), eq(labAnalyses.isCurrent, true)));
      await recordAudit(tx, {
        actorId: admin.id,
        action: 'lot.returned',
        entityType: 'lot',
        entityId: lotId,
        before: { status: lot.status, reviewNote: lot.reviewNote, analysisVerification: analysis?.verification ?? null },
        after: { status: next, reviewNote: reason, analysisVerification: 'rejected' },
        data: { reason },
        at: now,
      });
    });
    await this.mailGrower(farm.ownerId, (to) => returnedMail(to, lot, reason, env.PUBLIC_URL));
  }

  /** Puts the grower's e-mail in the outbox (sent and retried in the background). */
  private async mailGrower(ownerId: number, make: (to: string) => OutgoingMail): Promise<void> {
    const [owner] = await this.deps.db.select({ email: users.email }).from(users).where(eq(users.id, ownerId));
    if (owner) await this.deps.jobs.enqueueMail(make(owner.email));
  }
}
