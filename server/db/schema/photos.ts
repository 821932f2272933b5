import { sql } from 'drizzle-orm';
import { boolean, check, index, integer, jsonb, pgTable, text, timestamp, uniqueIndex } from 'drizzle-orm/pg-core';
import { storedFiles } from './files';
import { lots } from './lots';

/** One responsive variant of a photo, e.g. { width: 800, format: 'webp', key: 'photos/12/800.webp' }. */
export interface PhotoVariant {
  width: number;
  height: number;
  format: 'webp' | 'avif' | 'jpeg';
  key: string;
}

export const photos = pgTable(
  'photos',
  {
    id: integer().primaryKey().generatedAlwaysAsIdentity(),
    lotId: integer().notNull().references(() => lots.id, { onDelete: 'cascade' }),
    originalFileId: integer().references(() => storedFiles.id, { onDelete: 'set null' }),
    position: integer().notNull().default(0),
    isCover: boolean().notNull().default(false),
    width: integer().notNull(),
    height: integer().notNull(),
    altText: text().notNull().default(''),
    variants: jsonb().$type<PhotoVariant[]>().notNull(),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('photos_lot_position_idx').on(t.lotId, t.position),
    uniqueIndex('photos_one_cover_per_lot').on(t.lotId).where(sql`${t.isCover}`),
    check('photos_dimensions_positive', sql`${t.width} > 0 and ${t.height} > 0`),
  ],
);
