import { date, index, integer, pgTable, primaryKey, text } from 'drizzle-orm/pg-core';

/** One row per visitor (a hash of the session or address and browser), lot and day: a lot's view is counted once a day per visitor. */
export const lotViewMarks = pgTable(
  'lot_view_marks',
  {
    lotId: integer().notNull(),
    visitor: text().notNull(),
    day: date({ mode: 'string' }).notNull(),
  },
  (t) => [primaryKey({ columns: [t.lotId, t.visitor, t.day] }), index('lot_view_marks_day_idx').on(t.day)],
);
