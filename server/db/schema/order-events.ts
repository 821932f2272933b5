import { bigint, index, integer, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import { orderStatus } from './enums';
import { orders } from './orders';
import { users } from './users';

/** Each step of an order's life, for its timeline: what happened, who did it, the status after. */
export const orderEvents = pgTable(
  'order_events',
  {
    id: bigint({ mode: 'number' }).primaryKey().generatedAlwaysAsIdentity(),
    orderId: integer().notNull().references(() => orders.id, { onDelete: 'cascade' }),
    event: text().notNull(),
    status: orderStatus().notNull(),
    /** 'buyer' | 'grower' | 'admin' | 'system' */
    actor: text().notNull(),
    actorId: integer().references(() => users.id, { onDelete: 'set null' }),
    note: text().notNull().default(''),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('order_events_order_idx').on(t.orderId, t.id)],
);
