import { sql } from 'drizzle-orm';
import { check, doublePrecision, index, integer, pgTable, text, timestamp, uniqueIndex } from 'drizzle-orm/pg-core';
import { deliveryMethod, deliveryStatus } from './enums';
import { storedFiles } from './files';
import { orders } from './orders';

/** The delivery or pickup window of an order; status follows shared/lifecycle/delivery-lifecycle.ts. */
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
    /** Net hay weight on the scale ticket, lb. */
    scaleTicketLb: doublePrecision(),
    scaleTicketFileId: integer().references(() => storedFiles.id, { onDelete: 'set null' }),
    notes: text().notNull().default(''),
    completedAt: timestamp({ withTimezone: true }),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex('deliveries_order_load_idx').on(t.orderId, t.loadNumber),
    index('deliveries_window_idx').on(t.windowStart),
    check('deliveries_window_order', sql`${t.windowEnd} > ${t.windowStart}`),
    check('deliveries_ticket_positive', sql`${t.scaleTicketLb} is null or ${t.scaleTicketLb} > 0`),
  ],
);
