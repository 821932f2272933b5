import { and, asc, eq, inArray, lte, notExists, or, sql } from 'drizzle-orm';
import type { DueOrderLine, GrowerPayoutDue } from '@shared/contracts/payouts';
import type { DbOrTx } from '../audit/audit-log';
import { farms, orders, payoutLines, users } from '../../db/schema';
import { orderGoodsCents, orderLotTitles } from '../orders/order-lines';

/** Why a grower's payout is held, in words; null when it can be sent. */
export function heldReasonOf(farm: { payoutAccountId: string | null; payoutsEnabled: boolean }): string | null {
  if (!farm.payoutAccountId) return 'The grower has not started payout set-up with the payment provider.';
  if (!farm.payoutsEnabled) return 'The grower started payout set-up but has not finished it.';
  return null;
}

/**
 * What each grower is owed now: orders delivered and accepted (or past the acceptance date) that no
 * payout has paid yet, net of refunds (the platform fee was paid by the buyer on top, and stays). No
 * refund can follow a payout: a claim is refused once its order is due, and `lock` (inside the batch's
 * transaction) holds the orders so a claim arriving meanwhile waits and then sees the payout.
 */
export async function payoutsDue(db: DbOrTx, now: Date, farmIds?: number[], options: { lock?: boolean } = {}): Promise<GrowerPayoutDue[]> {
  const eligible = or(eq(orders.status, 'completed'), and(eq(orders.status, 'delivered'), lte(orders.acceptBy, now)));
  const query = db
    .select({ order: orders, lotTitle: orderLotTitles, goodsCents: orderGoodsCents })
    .from(orders)
    // The join also makes Drizzle name every column with its table, which the not-exists below relies on.
    .innerJoin(farms, eq(farms.id, orders.farmId))
    .where(and(eligible, farmIds ? inArray(orders.farmId, farmIds) : undefined, notExists(db.select({ one: sql`1` }).from(payoutLines).where(eq(payoutLines.orderId, orders.id)))))
    .orderBy(asc(orders.farmId), asc(orders.id))
    .$dynamic();
  const rows = await (options.lock ? query.for('update', { of: orders }) : query);

  const ids = [...new Set(rows.map((r) => r.order.farmId))];
  if (ids.length === 0) return [];
  const farmRows = await db.select({ farm: farms, email: users.email }).from(farms).innerJoin(users, eq(users.id, farms.ownerId)).where(inArray(farms.id, ids));

  return farmRows
    .map(({ farm, email }) => {
      const lines: DueOrderLine[] = rows
        .filter((r) => r.order.farmId === farm.id)
        .map(({ order, lotTitle, goodsCents }) => ({
          orderId: order.id,
          lotTitle,
          deliveredAt: order.deliveredAt?.toISOString() ?? null,
          goodsCents,
          freightCents: order.freightCents,
          platformFeeCents: order.platformFeeCents,
          refundedCents: order.refundedCents,
          amountCents: Math.max(0, goodsCents + order.freightCents - order.refundedCents),
        }));
      const totalCents = lines.reduce((s, l) => s + l.amountCents, 0);
      const heldReason = heldReasonOf(farm);
      return { farmId: farm.id, farmName: farm.name, growerEmail: email, ready: heldReason === null, heldReason, orders: lines, totalCents };
    })
    .sort((a, b) => a.farmName.localeCompare(b.farmName));
}
