import { sql } from 'drizzle-orm';
import { check, doublePrecision, index, integer, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import { deliveryMethod, orderStatus } from './enums';
import { farms } from './farms';
import { users } from './users';

/**
 * A buyer's purchase from one grower: one payment and one truck trip (freight on the combined loads) for
 * the lots on its lines (order_lines, where the lots, bales, prices and hay cost live). Amounts in integer
 * cents; the hay total is the sum of the lines, so total = lines' hay + freight + fee. The status follows
 * shared/lifecycle/order-lifecycle.ts.
 */
export const orders = pgTable(
  'orders',
  {
    id: integer().primaryKey().generatedAlwaysAsIdentity(),
    buyerId: integer().notNull().references(() => users.id, { onDelete: 'restrict' }),
    farmId: integer().notNull().references(() => farms.id, { onDelete: 'restrict' }),
    status: orderStatus().notNull().default('awaiting_payment'),
    freightCents: integer().notNull().default(0),
    platformFeeCents: integer().notNull().default(0),
    /** The platform fee rate this order was sold at, basis points (the admin setting then); refunds use it. */
    platformFeeBps: integer().notNull(),
    totalCents: integer().notNull(),
    /** Everything refunded to the buyer so far (scale ticket, claims). */
    refundedCents: integer().notNull().default(0),
    currency: text().notNull().default('usd'),
    method: deliveryMethod().notNull(),
    loads: integer().notNull().default(1),
    deliveryZip: text(),
    deliveryAddress: text(),
    /** Straight-line miles from the farm: an estimate, shown as one. */
    distanceMi: doublePrecision(),
    /** Stock is held for this order until then, unless paid. */
    reservedUntil: timestamp({ withTimezone: true }),
    checkoutSessionId: text().unique(),
    paymentUrl: text(),
    paymentIntentId: text().unique(),
    cancelReason: text(),
    paidAt: timestamp({ withTimezone: true }),
    deliveredAt: timestamp({ withTimezone: true }),
    /** After this the buyer can no longer report a problem and the order completes. */
    acceptBy: timestamp({ withTimezone: true }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('orders_buyer_idx').on(t.buyerId, t.createdAt),
    index('orders_farm_idx').on(t.farmId, t.createdAt),
    index('orders_status_reserved_idx').on(t.status, t.reservedUntil),
    check('orders_loads_positive', sql`${t.loads} > 0`),
    check('orders_amounts_nonnegative', sql`${t.freightCents} >= 0 and ${t.platformFeeCents} >= 0 and ${t.totalCents} >= ${t.freightCents} + ${t.platformFeeCents}`),
    check('orders_fee_bps_range', sql`${t.platformFeeBps} between 0 and 10000`),
    check('orders_refund_range', sql`${t.refundedCents} between 0 and ${t.totalCents}`),
  ],
);
