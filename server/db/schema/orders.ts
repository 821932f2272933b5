import { sql } from 'drizzle-orm';
import { check, doublePrecision, index, integer, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import { deliveryMethod, orderStatus } from './enums';
import { farms } from './farms';
import { lots } from './lots';
import { users } from './users';

/** A buyer's purchase from one lot. Amounts in integer cents; the price is copied at order time. */
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
    priceCentsPerTon: integer().notNull(),
    goodsCents: integer().notNull(),
    freightCents: integer().notNull().default(0),
    platformFeeCents: integer().notNull().default(0),
    totalCents: integer().notNull(),
    currency: text().notNull().default('usd'),
    method: deliveryMethod().notNull(),
    deliveryZip: text(),
    deliveryAddress: text(),
    distanceMi: doublePrecision(),
    paymentIntentId: text().unique(),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('orders_buyer_idx').on(t.buyerId, t.createdAt),
    index('orders_farm_idx').on(t.farmId, t.createdAt),
    index('orders_lot_idx').on(t.lotId),
    check('orders_bales_positive', sql`${t.bales} > 0`),
    check('orders_tons_positive', sql`${t.tons} > 0`),
    check('orders_amounts_nonnegative', sql`${t.goodsCents} >= 0 and ${t.freightCents} >= 0 and ${t.platformFeeCents} >= 0`),
    check('orders_total_sum', sql`${t.totalCents} = ${t.goodsCents} + ${t.freightCents} + ${t.platformFeeCents}`),
  ],
);
