import { createHash, randomUUID } from 'node:crypto';
import { and, desc, eq, sql } from 'drizzle-orm';
import Stripe from 'stripe';
import { judgeRetest } from '@shared/claims/judge-retest';
import type { ClaimView, OpenClaim, ResolveClaim } from '@shared/contracts/claims';
import { retestReportDateIssue } from '@shared/contracts/lot-dates';
import { parseAnalysisValues } from '@shared/contracts/selling';
import { checkClaimTransition, claimStatusLabel, type ClaimEvent, type ClaimStatus } from '@shared/lifecycle/claim-lifecycle';
import { checkOrderTransition, type OrderEvent, type OrderStatus } from '@shared/lifecycle/order-lifecycle';
import { formatCents } from '@shared/units/money';
import type { OutgoingMail } from '../../adapters/mail/mailer';
import type { ApiDeps } from '../../api-deps';
import { farms, labAnalyses, lots, orderEvents, orderRefunds, orders, payoutLines, qualityClaims, samplingRecords, storedFiles, users } from '../../db/schema';
import { conflict, forbidden, HttpError, notFound } from '../../middleware/http-error';
import { recordAudit } from '../audit/audit-log';
import { dmRequestOf } from '../selling/analysis-values';
import { SettingsService } from '../settings/settings.service';
import { sniffPdf } from '../uploads/file-sniff';
import { writeThenRecord } from '../uploads/write-then-record';
import { linesOf } from '../orders/order-lines';
import { claimDecidedMail, claimOpenedMail } from './claim-mail';
import { isAfter } from 'date-fns';
import { plusDays } from '@shared/time/days';

type ClaimRow = typeof qualityClaims.$inferSelect;

/** Quality claims: a buyer reports a problem within the window with a retest; an admin judges and refunds. */
export class ClaimsService {
  private readonly settings: SettingsService;
  constructor(private readonly deps: ApiDeps) {
    this.settings = new SettingsService(deps.db, deps.clock);
  }

  async open(buyer: Express.User, input: OpenClaim): Promise<ClaimView> {
    const { db, clock } = this.deps;
    const now = clock.now();
    const { claimDays } = await this.settings.current();
    const claimId = await db.transaction(async (tx) => {
      const [order] = await tx.select().from(orders).where(eq(orders.id, input.orderId)).for('update');
      if (!order || order.buyerId !== buyer.id) throw notFound('That order');
      this.checkOrder(order.status, 'report_problem', 'buyer');
      // The window also ends at the order's own acceptance date, fixed at delivery: from then on the order is
      // due to the grower (and may be paid out), whatever the claim setting says now.
      const pastWindow = !order.deliveredAt || isAfter(now, plusDays(order.deliveredAt, claimDays));
      const pastAcceptance = order.acceptBy !== null && now.getTime() >= order.acceptBy.getTime();
      // A payout that includes the order locks it first (payouts-due), so a claim waiting on that lock sees its line here.
      const [paidOut] = await tx.select({ id: payoutLines.id }).from(payoutLines).where(eq(payoutLines.orderId, order.id));
      if (pastWindow || pastAcceptance || paidOut) {
        throw conflict('claim_window_closed', `Problems can be reported within ${claimDays} days of delivery and before the acceptance date; that time has passed.`);
      }
      const lines = await linesOf(tx, [order.id]);
      const named = input.lineId === undefined ? (lines.length === 1 ? lines[0] : undefined) : lines.find((l) => l.line.id === input.lineId);
      if (input.lineId !== undefined && !named) throw new HttpError(400, 'unknown_line', 'That lot is not part of this order.', [{ path: 'lineId', message: 'Choose a lot of this order.' }]);
      // A retest is of one lot's hay: with several lots on the order, the buyer says which.
      if (input.retest && !named) throw new HttpError(400, 'name_the_lot', 'This order holds several lots: choose the lot the retest is of.', [{ path: 'lineId', message: 'Choose the lot the retest is of.' }]);
      if (input.retest) {
        const [sampling] = await tx.select({ sampledOn: samplingRecords.sampledOn }).from(samplingRecords).where(eq(samplingRecords.lotId, named!.lot.id));
        const issue = retestReportDateIssue(input.retest.reportDate, { sampledOn: sampling?.sampledOn, harvestStartedOn: named!.lot.harvestStartedOn }, now);
        if (issue) throw new HttpError(400, 'invalid_input', issue, [{ path: 'retest.reportDate', message: issue }]);
      }
      // Retest values are checked by the engine's own contract, as the lot form's are.
      const retestValues = input.retest ? (parseAnalysisValues(input.retest.values, named!.lot.forageClass), input.retest.values) : null;
      const [claim] = await tx
        .insert(qualityClaims)
        .values({
          orderId: order.id,
          orderLineId: named?.line.id ?? null,
          openedBy: buyer.id,
          reason: input.reason,
          retestLabName: input.retest?.labName ?? null,
          retestLabCertified: input.retest?.labCertified ?? null,
          retestReportDate: input.retest?.reportDate ?? null,
          retestValues,
          createdAt: now,
        })
        .returning();
      await tx.update(orders).set({ status: 'claimed', updatedAt: now }).where(eq(orders.id, order.id));
      await tx.insert(orderEvents).values({ orderId: order.id, event: 'report_problem', status: 'claimed', actor: 'buyer', actorId: buyer.id, note: input.reason, createdAt: now });
      await recordAudit(tx, { actorId: buyer.id, action: 'claim.opened', entityType: 'claim', entityId: claim!.id, after: { status: 'open', orderId: order.id }, data: { reason: input.reason }, at: now });
      return claim!.id;
    });
    const view = await this.view(claimId);
    await this.mailBoth(view, (to, role) => claimOpenedMail(to, role, view, this.deps.env.PUBLIC_URL));
    return view;
  }

  /** The buyer attaches the certified lab's retest PDF to their open claim. */
  async attachRetest(buyer: Express.User, claimId: number, file: Express.Multer.File): Promise<ClaimView> {
    await this.openClaimOf(buyer, claimId);
    await sniffPdf(file.buffer, file.originalname);
    const key = `claims/${claimId}/${randomUUID()}.pdf`;
    await writeThenRecord(this.deps.storage, [{ key, data: file.buffer }], () =>
      this.deps.db.transaction(async (tx) => {
        const [row] = await tx
          .insert(storedFiles)
          .values({ ownerId: buyer.id, storageKey: key, originalName: file.originalname.slice(0, 200) || 'retest.pdf', mimeType: 'application/pdf', sizeBytes: file.size, sha256: createHash('sha256').update(file.buffer).digest('hex') })
          .returning({ id: storedFiles.id });
        await tx.update(qualityClaims).set({ evidenceFileId: row!.id }).where(eq(qualityClaims.id, claimId));
      }),
    );
    return this.view(claimId);
  }

  async list(status?: ClaimStatus): Promise<ClaimView[]> {
    const rows = await this.deps.db.select({ id: qualityClaims.id }).from(qualityClaims).where(status ? eq(qualityClaims.status, status) : undefined).orderBy(desc(qualityClaims.id)).limit(200);
    return Promise.all(rows.map((r) => this.view(r.id)));
  }

  /** A claim for the admin, its buyer or the grower who sold the hay; 404 for anyone else. */
  async viewFor(user: Express.User, claimId: number): Promise<ClaimView> {
    if (user.role !== 'admin') {
      const [row] = await this.deps.db
        .select({ buyerId: orders.buyerId, ownerId: farms.ownerId })
        .from(qualityClaims)
        .innerJoin(orders, eq(orders.id, qualityClaims.orderId))
        .innerJoin(farms, eq(farms.id, orders.farmId))
        .where(eq(qualityClaims.id, claimId));
      if (!row || (row.buyerId !== user.id && row.ownerId !== user.id)) throw notFound('That claim');
    }
    return this.view(claimId);
  }

  /** The claims on one order, newest first, for the same three people who may see the order; 404 for anyone else. */
  async forOrder(user: Express.User, orderId: number): Promise<ClaimView[]> {
    const { db } = this.deps;
    const [order] = await db.select({ buyerId: orders.buyerId, ownerId: farms.ownerId }).from(orders).innerJoin(farms, eq(farms.id, orders.farmId)).where(eq(orders.id, orderId));
    if (!order || (user.role !== 'admin' && order.buyerId !== user.id && order.ownerId !== user.id)) throw notFound('That order');
    const rows = await db.select({ id: qualityClaims.id }).from(qualityClaims).where(eq(qualityClaims.orderId, orderId)).orderBy(desc(qualityClaims.id));
    return Promise.all(rows.map((r) => this.view(r.id)));
  }

  /**
   * Decides a claim. A refund goes through the payment provider with a key made from the claim, inside
   * the transaction that records it, so a second click or a retry refunds once. A claimed order is not
   * due to the grower, so the refund always comes off the order's own payout (a claim is refused once
   * the order is due or paid out).
   */
  async resolve(admin: Express.User, claimId: number, input: ResolveClaim): Promise<ClaimView> {
    const { db, stripe, clock } = this.deps;
    const now = clock.now();
    await db.transaction(async (tx) => {
      const [claim] = await tx.select().from(qualityClaims).where(eq(qualityClaims.id, claimId)).for('update');
      if (!claim) throw notFound('That claim');
      const event: ClaimEvent = input.outcome === 'reject' ? 'decline' : 'uphold';
      this.checkClaim(claim.status, event);
      const [order] = await tx.select().from(orders).where(eq(orders.id, claim.orderId)).for('update');
      const refundable = order!.totalCents - order!.refundedCents;
      const amount = input.outcome === 'reject' ? 0 : input.outcome === 'full' ? refundable : input.refundCents;
      if (amount > refundable) throw new HttpError(400, 'refund_too_large', `At most ${formatCents(refundable)} can still be refunded on this order.`);
      const orderEvent: OrderEvent = input.outcome === 'full' ? 'refund' : 'settle_claim';
      const orderNext = this.checkOrder(order!.status, orderEvent, 'admin');

      if (amount > 0) {
        const idempotencyKey = `claim-refund-${claim.id}`;
        let refund: Stripe.Refund;
        try {
          refund = await stripe.refunds.create({ payment_intent: order!.paymentIntentId!, amount, reason: 'requested_by_customer', metadata: { claimId: String(claim.id), orderId: String(order!.id) } }, { idempotencyKey });
        } catch (err) {
          if (err instanceof Stripe.errors.StripeError) throw new HttpError(502, 'payment_provider_error', `The refund was not made: ${err.message}. Nothing changed; try again.`);
          throw err;
        }
        const [refundRow] = await tx.insert(orderRefunds).values({ orderId: order!.id, amountCents: amount, reason: 'claim', idempotencyKey, providerRefundId: refund.id, createdBy: admin.id, createdAt: now }).returning();
        await tx.update(orders).set({ refundedCents: order!.refundedCents + amount }).where(eq(orders.id, order!.id));
        await recordAudit(tx, {
          actorId: admin.id,
          action: 'refund.issued',
          entityType: 'order',
          entityId: order!.id,
          before: { refundedCents: order!.refundedCents },
          after: { refundedCents: order!.refundedCents + amount },
          data: { amountCents: amount, claimId: claim.id, refundId: refund.id, orderRefundId: refundRow!.id, idempotencyKey },
          at: now,
        });
      }
      const status: ClaimStatus = input.outcome === 'reject' ? 'declined' : 'upheld';
      await tx.update(qualityClaims).set({ status, resolution: input.note, refundCents: amount, resolvedBy: admin.id, resolvedAt: now }).where(eq(qualityClaims.id, claim.id));
      await tx.update(orders).set({ status: orderNext, updatedAt: now }).where(eq(orders.id, order!.id));
      await tx.insert(orderEvents).values({ orderId: order!.id, event: orderEvent, status: orderNext, actor: 'admin', actorId: admin.id, note: input.note, createdAt: now });
      await recordAudit(tx, { actorId: admin.id, action: 'claim.resolved', entityType: 'claim', entityId: claim.id, before: { status: claim.status, orderStatus: order!.status }, after: { status, orderStatus: orderNext, refundCents: amount }, data: { outcome: input.outcome, note: input.note }, at: now });
    });
    const view = await this.view(claimId);
    await this.mailBoth(view, (to, role) => claimDecidedMail(to, role, view, this.deps.env.PUBLIC_URL));
    return view;
  }

  private checkClaim(from: ClaimStatus, event: ClaimEvent): void {
    const result = checkClaimTransition(from, event, 'admin');
    if (!result.ok) throw conflict('claim_state', result.message);
  }

  private checkOrder(from: OrderStatus, event: OrderEvent, actor: 'buyer' | 'admin'): OrderStatus {
    const result = checkOrderTransition(from, event, actor);
    if (!result.ok) throw result.reason === 'not_allowed' ? forbidden(result.message) : conflict('order_state', result.message);
    return result.to;
  }

  /** The buyer's own open claim (checked before an upload's body is read, and again before it is stored). */
  async openClaimOf(buyer: Express.User, claimId: number): Promise<ClaimRow> {
    const claim = await this.row(claimId);
    if (claim.openedBy !== buyer.id) throw notFound('That claim');
    if (claim.status !== 'open') throw conflict('claim_decided', 'This claim has been decided; nothing can be added.');
    return claim;
  }

  private async row(claimId: number): Promise<ClaimRow> {
    const [claim] = await this.deps.db.select().from(qualityClaims).where(eq(qualityClaims.id, claimId));
    if (!claim) throw notFound('That claim');
    return claim;
  }

  async view(claimId: number): Promise<ClaimView> {
    const { db } = this.deps;
    const [r] = await db
      .select({ claim: qualityClaims, order: orders, farmName: farms.name, buyerName: users.displayName })
      .from(qualityClaims)
      .innerJoin(orders, eq(orders.id, qualityClaims.orderId))
      .innerJoin(farms, eq(farms.id, orders.farmId))
      .innerJoin(users, eq(users.id, orders.buyerId))
      .where(eq(qualityClaims.id, claimId));
    if (!r) throw notFound('That claim');
    const { claim, order } = r;
    const lines = await linesOf(db, [order.id]);
    const named = lines.find((l) => l.line.id === claim.orderLineId);
    const lot = (named ?? lines[0]!).lot;
    let judgement: ClaimView['judgement'] = null;
    if (claim.retestValues) {
      const [analysis] = await db.select().from(labAnalyses).where(and(eq(labAnalyses.lotId, lot.id), eq(labAnalyses.isCurrent, true)));
      const retest = parseAnalysisValues(claim.retestValues, lot.forageClass);
      if (analysis) judgement = judgeRetest(dmRequestOf(analysis, lot.forageClass), retest, (await this.settings.current()).tolerances);
    }
    return {
      id: claim.id,
      orderId: order.id,
      lineId: named?.line.id ?? null,
      lotId: lot.id,
      lotTitle: named ? lot.title : lines.map((l) => l.lot.title).join(' + '),
      farmName: r.farmName,
      buyerName: r.buyerName,
      status: claim.status,
      statusLabel: claimStatusLabel(claim.status),
      reason: claim.reason,
      openedAt: claim.createdAt.toISOString(),
      resolvedAt: claim.resolvedAt?.toISOString() ?? null,
      resolution: claim.resolution,
      refundCents: claim.refundCents,
      orderTotalCents: order.totalCents,
      refundableCents: order.totalCents - order.refundedCents,
      retest: claim.retestLabName
        ? { labName: claim.retestLabName, labCertified: claim.retestLabCertified ?? false, reportDate: claim.retestReportDate ?? '', values: claim.retestValues ?? {}, reportUrl: claim.evidenceFileId ? `/api/claims/${claim.id}/retest` : null }
        : null,
      judgement,
    };
  }

  private async mailBoth(view: ClaimView, make: (to: string, role: 'buyer' | 'grower') => OutgoingMail): Promise<void> {
    const [row] = await this.deps.db
      .select({ buyer: sql<string>`(select email from users where id = ${orders.buyerId})`, grower: sql<string>`(select email from users where id = ${farms.ownerId})` })
      .from(orders)
      .innerJoin(farms, eq(farms.id, orders.farmId))
      .where(eq(orders.id, view.orderId));
    for (const [role, to] of [['buyer', row?.buyer], ['grower', row?.grower]] as const) {
      if (to) await this.deps.jobs.enqueueMail(make(to, role));
    }
  }
}
