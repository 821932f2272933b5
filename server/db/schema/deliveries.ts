import { sql } from 'drizzle-orm';
import { check, doublePrecision, index, integer, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import { deliveryMethod, deliveryStatus } from './enums';
import { orders } from './orders';

/** A scheduled delivery or pickup of an order (an order may need several loads). */
export const deliveries = pgTable(
  'deliveries',
  {
    id: integer().primaryKey().generatedAlwaysAsIdentity(),
    orderId: integer().notNull().references(() => orders.id, { onDelete: 'cascade' }),
    method: deliveryMethod().notNull(),
    status: deliveryStatus().notNull().default('proposed'),
    windowStart: timestamp({ withTimezone: true }).notNull(),
    windowEnd: timestamp({ withTimezone: true }).notNull(),
    loadNumber: integer().notNull().default(1),
    scaleTicketLb: doublePrecision(),
    notes: text().notNull().default(''),
    completedAt: timestamp({ withTimezone: true }),
  },
  (t) => [
    index('deliveries_order_idx').on(t.orderId),
    index('deliveries_window_idx').on(t.windowStart),
    check('deliveries_window_order', sql`${t.windowEnd} > ${t.windowStart}`),
    check('deliveries_ticket_positive', sql`${t.scaleTicketLb} is null or ${t.scaleTicketLb} > 0`),
  ],
);
