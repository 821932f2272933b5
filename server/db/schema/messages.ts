import { sql } from 'drizzle-orm';
import { check, index, integer, pgTable, text, timestamp, uniqueIndex } from 'drizzle-orm/pg-core';
import { lots } from './lots';
import { orders } from './orders';
import { users } from './users';

/**
 * A conversation between a buyer and a grower. Before a sale it is about one lot (how was it cut, can a semi
 * reach the barn): `lotId`, one thread per buyer and lot. After a sale it is about one order (when can the
 * truck come): `orderId`, one thread per order, whatever lots the order holds. Exactly one of the two is set.
 */
export const messageThreads = pgTable(
  'message_threads',
  {
    id: integer().primaryKey().generatedAlwaysAsIdentity(),
    lotId: integer().references(() => lots.id, { onDelete: 'restrict' }),
    orderId: integer().references(() => orders.id, { onDelete: 'restrict' }),
    buyerId: integer().notNull().references(() => users.id, { onDelete: 'restrict' }),
    growerId: integer().notNull().references(() => users.id, { onDelete: 'restrict' }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    lastMessageAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex('message_threads_lot_buyer_uq').on(t.lotId, t.buyerId).where(sql`${t.orderId} is null`),
    uniqueIndex('message_threads_order_uq').on(t.orderId).where(sql`${t.orderId} is not null`),
    index('message_threads_buyer_idx').on(t.buyerId, t.lastMessageAt),
    index('message_threads_grower_idx').on(t.growerId, t.lastMessageAt),
    check('message_threads_two_people', sql`${t.buyerId} <> ${t.growerId}`),
    check('message_threads_lot_or_order', sql`(${t.lotId} is null) <> (${t.orderId} is null)`),
  ],
);

/** One message in a thread; `readAt` is when the other person first opened it. */
export const messages = pgTable(
  'messages',
  {
    id: integer().primaryKey().generatedAlwaysAsIdentity(),
    threadId: integer().notNull().references(() => messageThreads.id, { onDelete: 'cascade' }),
    senderId: integer().notNull().references(() => users.id, { onDelete: 'restrict' }),
    body: text().notNull(),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    readAt: timestamp({ withTimezone: true }),
    /** When the e-mail notice to the other person went out (null until it has). */
    noticeSentAt: timestamp({ withTimezone: true }),
  },
  (t) => [index('messages_thread_idx').on(t.threadId, t.createdAt), check('messages_body_length', sql`char_length(${t.body}) between 1 and 2000`)],
);
