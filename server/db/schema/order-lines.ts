import { sql } from 'drizzle-orm';
import { check, doublePrecision, index, integer, pgTable, timestamp, uniqueIndex } from 'drizzle-orm/pg-core';
import { lots, pricingUnit } from './lots';
import { orders } from './orders';

/**
 * One lot in an order: an order is one grower's hay for one buyer (one payment, one truck trip), and holds
 * a line per lot bought. The lot's price and terms are copied at order time; amounts in integer cents.
 */
export const orderLines = pgTable(
  'order_lines',
  {
    id: integer().primaryKey().generatedAlwaysAsIdentity(),
    orderId: integer().notNull().references(() => orders.id, { onDelete: 'cascade' }),
    lotId: integer().notNull().references(() => lots.id, { onDelete: 'restrict' }),
    bales: integer().notNull(),
    tons: doublePrecision().notNull(),
    /** 'ton': settles on the scale ticket; 'bale': sold by count. */
    pricingUnit: pricingUnit().notNull().default('ton'),
    priceCentsPerTon: integer().notNull(),
    goodsCents: integer().notNull(),
    /** Net tons on the scale ticket for this line (ton-priced lines), recorded at hand-over. */
    weighedTons: doublePrecision(),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('order_lines_order_idx').on(t.orderId),
    index('order_lines_lot_idx').on(t.lotId),
    // A lot appears once per order: more bales of it are more bales on its line.
    uniqueIndex('order_lines_order_lot_uq').on(t.orderId, t.lotId),
    check('order_lines_bales_positive', sql`${t.bales} > 0`),
    check('order_lines_tons_positive', sql`${t.tons} > 0`),
    check('order_lines_price_nonnegative', sql`${t.priceCentsPerTon} >= 0`),
    check('order_lines_goods_nonnegative', sql`${t.goodsCents} >= 0`),
    check('order_lines_weighed_positive', sql`${t.weighedTons} is null or ${t.weighedTons} > 0`),
  ],
);
