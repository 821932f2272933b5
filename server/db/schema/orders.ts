import { sql } from 'drizzle-orm';
import { check, doublePrecision, index, integer, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import { deliveryMethod, orderStatus } from './enums';
import { farms } from './farms';
import { lots, pricingUnit } from './lots';
import { users } from './users';

/**
 * A buyer's purchase from one lot. Amounts in integer cents; the lot's price and terms are copied at
 * order time. The status follows shared/lifecycle/order-lifecycle.ts.
 */
export const orders = pgTable(
  'orders',
  {
    id: integer().primaryKey().generatedAlwaysAsIdentity(),
    buyerId: integer().notNull().references(() => users.id, { onDelete: 'restrict' }),
    lotId: integer().notNull().references(() => lots.id, { onDelete: 'restrict' }),
    farmId: integer().notNull().references(() => farms.id, { onDelete: 'restrict' }),
    status: orderStatus().notNull().default('awaiting_payment'),
    bales: integer().notNull(),
    tons: doublePrecision().notNull(),
    /** 'ton': settles on the scale ticket; 'bale': sold by count. */
    pricingUnit: pricingUnit().notNull().default('ton'),
    priceCentsPerTon: integer().notNull(),
    goodsCents: integer().notNull(),
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
    weighedTons: doublePrecision(),
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
    index('orders_lot_idx').on(t.lotId),
    index('orders_status_reserved_idx').on(t.status, t.reservedUntil),
    check('orders_bales_positive', sql`${t.bales} > 0`),
    check('orders_tons_positive', sql`${t.tons} > 0`),
    check('orders_loads_positive', sql`${t.loads} > 0`),
    check('orders_amounts_nonnegative', sql`${t.goodsCents} >= 0 and ${t.freightCents} >= 0 and ${t.platformFeeCents} >= 0`),
    check('orders_total_sum', sql`${t.totalCents} = ${t.goodsCents} + ${t.freightCents} + ${t.platformFeeCents}`),
    check('orders_fee_bps_range', sql`${t.platformFeeBps} between 0 and 10000`),
    check('orders_refund_range', sql`${t.refundedCents} between 0 and ${t.totalCents}`),
  ],
);
