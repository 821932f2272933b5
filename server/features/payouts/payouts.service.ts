import { and, asc, desc, eq, inArray, isNull, sql } from 'drizzle-orm';
import Stripe from 'stripe';
import type { BatchView, CreateBatch, PayoutView } from '@shared/contracts/payouts';
import { checkPayoutTransition, payoutStatusLabel, type PayoutEvent, type PayoutStatus } from '@shared/lifecycle/payout-lifecycle';
import type { ApiDeps } from '../../api-deps';
import { farms, payoutBatches, payoutLines, payouts, users } from '../../db/schema';
import { conflict, HttpError, notFound } from '../../middleware/http-error';
import { recordAudit } from '../audit/audit-log';
import { heldReasonOf, payoutsDue } from './payouts-due';

type PayoutRow = typeof payouts.$inferSelect;

/**
 * Settling growers' payouts exactly once. A batch fixes who is paid what (each order can sit in one
 * payout only: a unique key in the database). Sending a payout locks its row, calls the provider with
 * the payout's own idempotency key and records the transfer in the same transaction, so a retried
 * request, a second submit or a crash between the transfer and the commit all end with one transfer:
 * the provider answers a repeated key with the first transfer.
 */
export class PayoutsService {
  constructor(private readonly deps: Pick<ApiDeps, 'db' | 'stripe' | 'clock' | 'logger'>) {}

  due() {
    return payoutsDue(this.deps.db, this.deps.clock.now());
  }

  async createBatch(admin: Express.User, input: CreateBatch): Promise<BatchView> {
    const { db, clock } = this.deps;
    const now = clock.now();
    const batchId = await db.transaction(async (tx) => {
      // One batch is built at a time, so two admins cannot put the same order in two payouts.
      await tx.execute(sql`select pg_advisory_xact_lock(hashtext('payout_batches'))`);
      const [existing] = await tx.select({ id: payoutBatches.id }).from(payoutBatches).where(eq(payoutBatches.requestKey, input.requestKey));
      if (existing) return existing.id;
      const due = (await payoutsDue(tx, now, input.farmIds, { lock: true })).filter((g) => g.totalCents > 0);
      if (due.length === 0) throw conflict('nothing_due', 'None of the chosen growers has anything due.');
      const [batch] = await tx.insert(payoutBatches).values({ requestKey: input.requestKey, createdBy: admin.id, createdAt: now }).returning();
      for (const grower of due) {
        const [payout] = await tx
          .insert(payouts)
          .values({
            batchId: batch!.id,
            farmId: grower.farmId,
            amountCents: grower.totalCents,
            status: grower.ready ? 'due' : 'held',
            heldReason: grower.heldReason,
            idempotencyKey: `payout-${batch!.id}-${grower.farmId}`,
            createdAt: now,
          })
          .returning();
        if (grower.orders.length > 0) {
          await tx.insert(payoutLines).values(grower.orders.map((o) => ({ payoutId: payout!.id, orderId: o.orderId, goodsCents: o.goodsCents, freightCents: o.freightCents, refundedCents: o.refundedCents, amountCents: o.amountCents })));
        }
        if (!grower.ready) {
          await recordAudit(tx, { actorId: admin.id, action: 'payout.held', entityType: 'payout', entityId: payout!.id, after: { status: 'held', amountCents: grower.totalCents }, data: { farmId: grower.farmId, reason: grower.heldReason }, at: now });
        }
      }
      await recordAudit(tx, { actorId: admin.id, action: 'payout_batch.created', entityType: 'payout_batch', entityId: batch!.id, after: { growers: due.length, totalCents: due.reduce((s, g) => s + g.totalCents, 0) }, data: { requestKey: input.requestKey }, at: now });
      return batch!.id;
    });
    return this.batch(batchId);
  }

  /** Sends every payout of the batch that is ready; held ones go too once their grower has finished set-up. */
  async settle(admin: Express.User | null, batchId: number): Promise<BatchView> {
    const { db } = this.deps;
    const rows = await db.select().from(payouts).where(eq(payouts.batchId, batchId)).orderBy(asc(payouts.id));
    if (rows.length === 0) throw notFound('That payout batch');
    for (const held of rows.filter((p) => p.status === 'held')) await this.releaseIfReady(admin, held);
    const due = await db.select({ id: payouts.id }).from(payouts).where(and(eq(payouts.batchId, batchId), eq(payouts.status, 'due'))).orderBy(asc(payouts.id));
    for (const { id } of due) await this.send(admin, id);
    const left = await db.select({ n: sql<number>`count(*)`.mapWith(Number) }).from(payouts).where(and(eq(payouts.batchId, batchId), inArray(payouts.status, ['due', 'held', 'failed'])));
    if (left[0]!.n === 0) await db.update(payoutBatches).set({ settledAt: this.deps.clock.now() }).where(and(eq(payoutBatches.id, batchId), isNull(payoutBatches.settledAt)));
    return this.batch(batchId);
  }

  /** A refused payout may be tried again, under a new idempotency key (the provider remembers the refusal under the old one). */
  async retry(admin: Express.User, payoutId: number): Promise<BatchView> {
    const now = this.deps.clock.now();
    const batchId = await this.deps.db.transaction(async (tx) => {
      const [p] = await tx.select().from(payouts).where(eq(payouts.id, payoutId)).for('update');
      if (!p) throw notFound('That payout');
      this.check(p.status, 'retry');
      const attempt = (p.idempotencyKey.match(/-r(\d+)$/)?.[1] ?? '1') as string;
      const key = `${p.idempotencyKey.replace(/-r\d+$/, '')}-r${Number(attempt) + 1}`;
      await tx.update(payouts).set({ status: 'due', failureReason: null, idempotencyKey: key }).where(eq(payouts.id, payoutId));
      await recordAudit(tx, { actorId: admin.id, action: 'payout.retried', entityType: 'payout', entityId: payoutId, before: { status: p.status, idempotencyKey: p.idempotencyKey }, after: { status: 'due', idempotencyKey: key }, at: now });
      return p.batchId;
    });
    return this.settle(admin, batchId);
  }

  private async releaseIfReady(admin: Express.User | null, held: PayoutRow): Promise<void> {
    const [farm] = await this.deps.db.select().from(farms).where(eq(farms.id, held.farmId));
    if (!farm || heldReasonOf(farm)) return;
    const now = this.deps.clock.now();
    await this.deps.db.transaction(async (tx) => {
      const [p] = await tx.update(payouts).set({ status: 'due', heldReason: null }).where(and(eq(payouts.id, held.id), eq(payouts.status, 'held'))).returning();
      if (p) await recordAudit(tx, { actorId: admin?.id ?? null, action: 'payout.released', entityType: 'payout', entityId: held.id, before: { status: 'held' }, after: { status: 'due' }, at: now });
    });
  }

  private async send(admin: Express.User | null, payoutId: number): Promise<void> {
    const { db, stripe, clock } = this.deps;
    await db.transaction(async (tx) => {
      // SKIP LOCKED: a payout another request is sending right now is left to that request.
      const [p] = await tx.select().from(payouts).where(and(eq(payouts.id, payoutId), eq(payouts.status, 'due'))).for('update', { skipLocked: true });
      if (!p) return;
      const [farm] = await tx.select().from(farms).where(eq(farms.id, p.farmId));
      const now = clock.now();
      let transfer: Stripe.Transfer;
      try {
        transfer = await stripe.transfers.create(
          { amount: p.amountCents, currency: 'usd', destination: farm!.payoutAccountId!, transfer_group: `payout-batch-${p.batchId}`, metadata: { payoutId: String(p.id), batchId: String(p.batchId), farmId: String(p.farmId) } },
          { idempotencyKey: p.idempotencyKey },
        );
      } catch (err) {
        // A refusal is final for this key; an outage or lost answer is not known either way, so the
        // transaction is undone and the payout stays due for a retry under the same key.
        if (err instanceof Stripe.errors.StripeInvalidRequestError || err instanceof Stripe.errors.StripeCardError || err instanceof Stripe.errors.StripePermissionError) {
          this.check(p.status, 'fail');
          await tx.update(payouts).set({ status: 'failed', failureReason: err.message }).where(eq(payouts.id, p.id));
          await recordAudit(tx, { actorId: admin?.id ?? null, action: 'payout.failed', entityType: 'payout', entityId: p.id, before: { status: 'due' }, after: { status: 'failed' }, data: { reason: err.message, amountCents: p.amountCents, idempotencyKey: p.idempotencyKey }, at: now });
          return;
        }
        if (err instanceof Stripe.errors.StripeError) throw new HttpError(502, 'payment_provider_unavailable', 'The payment provider did not answer; nothing was lost. Settle the batch again to continue where it stopped.');
        throw err;
      }
      if (transfer.amount !== p.amountCents) throw new Error(`transfer ${transfer.id} is for ${transfer.amount}, payout ${p.id} for ${p.amountCents}`);
      this.check(p.status, 'send');
      await tx.update(payouts).set({ status: 'sent', transferId: transfer.id, sentAt: now }).where(eq(payouts.id, p.id));
      await recordAudit(tx, {
        actorId: admin?.id ?? null,
        action: 'payout.sent',
        entityType: 'payout',
        entityId: p.id,
        before: { status: 'due' },
        after: { status: 'sent', transferId: transfer.id },
        data: { amountCents: p.amountCents, farmId: p.farmId, idempotencyKey: p.idempotencyKey },
        at: now,
      });
    });
  }

  private check(from: PayoutStatus, event: PayoutEvent): void {
    const result = checkPayoutTransition(from, event, 'admin');
    if (!result.ok) throw conflict('payout_state', result.message);
  }

  async batches(limit = 20): Promise<BatchView[]> {
    const rows = await this.deps.db.select({ id: payoutBatches.id }).from(payoutBatches).orderBy(desc(payoutBatches.id)).limit(limit);
    return Promise.all(rows.map((r) => this.batch(r.id)));
  }

  async batch(batchId: number): Promise<BatchView> {
    const { db } = this.deps;
    const [b] = await db.select({ batch: payoutBatches, by: users.displayName }).from(payoutBatches).leftJoin(users, eq(users.id, payoutBatches.createdBy)).where(eq(payoutBatches.id, batchId));
    if (!b) throw notFound('That payout batch');
    const list = await this.payoutViews(eq(payouts.batchId, batchId));
    return { id: b.batch.id, createdAt: b.batch.createdAt.toISOString(), settledAt: b.batch.settledAt?.toISOString() ?? null, createdBy: b.by, payouts: list, totalCents: list.reduce((s, p) => s + p.amountCents, 0) };
  }

  /** A grower's payouts, newest first (their dashboard and statement). */
  history(farmId: number): Promise<PayoutView[]> {
    return this.payoutViews(eq(payouts.farmId, farmId), true);
  }

  private async payoutViews(where: ReturnType<typeof eq>, newestFirst = false): Promise<PayoutView[]> {
    const { db } = this.deps;
    const rows = await db.select({ p: payouts, farmName: farms.name }).from(payouts).innerJoin(farms, eq(farms.id, payouts.farmId)).where(where).orderBy(newestFirst ? desc(payouts.id) : asc(payouts.id));
    if (rows.length === 0) return [];
    const ids = rows.map((r) => r.p.id);
    const lines = await db.select().from(payoutLines).where(inArray(payoutLines.payoutId, ids)).orderBy(asc(payoutLines.orderId));
    return rows.map(({ p, farmName }) => ({
      id: p.id,
      batchId: p.batchId,
      farmId: p.farmId,
      farmName,
      amountCents: p.amountCents,
      status: p.status,
      statusLabel: payoutStatusLabel(p.status),
      heldReason: p.heldReason,
      failureReason: p.failureReason,
      transferId: p.transferId,
      createdAt: p.createdAt.toISOString(),
      sentAt: p.sentAt?.toISOString() ?? null,
      lines: lines.filter((l) => l.payoutId === p.id).map(({ orderId, goodsCents, freightCents, refundedCents, amountCents }) => ({ orderId, goodsCents, freightCents, refundedCents, amountCents })),
    }));
  }
}
