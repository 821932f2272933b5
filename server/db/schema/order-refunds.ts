import { sql } from 'drizzle-orm';
import { check, index, integer, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import { orders } from './orders';
import { users } from './users';

/**
 * Money sent back to a buyer for an order. `reason` names why ('scale_ticket', 'claim', 'cancelled_after_payment');
 * `idempotencyKey` is the key given to the payment provider, unique so one reason refunds once.
 */
export const orderRefunds = pgTable(
  'order_refunds',
  {
    id: integer().primaryKey().generatedAlwaysAsIdentity(),
    orderId: integer().notNull().references(() => orders.id, { onDelete: 'restrict' }),
    amountCents: integer().notNull(),
    reason: text().notNull(),
    idempotencyKey: text().notNull().unique(),
    providerRefundId: text().unique(),
    createdBy: integer().references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('order_refunds_order_idx').on(t.orderId), check('order_refunds_amount_positive', sql`${t.amountCents} > 0`)],
);
