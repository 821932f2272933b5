import { integer, pgTable, text, timestamp } from 'drizzle-orm/pg-core';

/** Payment provider webhook events already applied, so an event delivered twice changes nothing. */
export const paymentEvents = pgTable('payment_events', {
  id: text().primaryKey(),
  type: text().notNull(),
  orderId: integer(),
  receivedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
});
