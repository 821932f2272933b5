import { sql } from 'drizzle-orm';
import { bigint, check, index, integer, jsonb, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import type { ReportReading } from '@shared/contracts/report-reading';
import { users } from './users';

/** An uploaded document kept as sent (lab report PDFs, photo originals). */
export const storedFiles = pgTable(
  'stored_files',
  {
    id: integer().primaryKey().generatedAlwaysAsIdentity(),
    ownerId: integer().references(() => users.id, { onDelete: 'set null' }),
    storageKey: text().notNull().unique(),
    originalName: text().notNull(),
    /** Decided from the content (magic bytes), never from the name. */
    mimeType: text().notNull(),
    sizeBytes: bigint({ mode: 'number' }).notNull(),
    sha256: text().notNull(),
    /** For lab report PDFs: the analysis values read from the PDF's text layer at upload. */
    reading: jsonb().$type<ReportReading>(),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('stored_files_owner_idx').on(t.ownerId),
    check('stored_files_size_positive', sql`${t.sizeBytes} > 0`),
  ],
);
