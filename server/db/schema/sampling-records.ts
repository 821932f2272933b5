import { sql } from 'drizzle-orm';
import { boolean, check, date, doublePrecision, integer, jsonb, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import { corePosition } from './enums';
import { lots } from './lots';

/** How the lab sample was taken: one record per lot. Findings are the engine's, stored at save time. */
export const samplingRecords = pgTable(
  'sampling_records',
  {
    id: integer().primaryKey().generatedAlwaysAsIdentity(),
    lotId: integer().notNull().unique().references(() => lots.id, { onDelete: 'cascade' }),
    sampledOn: date({ mode: 'string' }).notNull(),
    coresTaken: integer().notNull(),
    balesSampled: integer().notNull(),
    probeDiameterIn: doublePrecision().notNull(),
    probeLengthIn: doublePrecision().notNull(),
    corePosition: corePosition().notNull(),
    sampledBy: text().notNull(),
    compliant: boolean().notNull(),
    findings: jsonb().notNull().default([]),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    check('sampling_cores_range', sql`${t.coresTaken} between 1 and 500`),
    check('sampling_bales_range', sql`${t.balesSampled} between 1 and 500`),
    check('sampling_probe_diameter_range', sql`${t.probeDiameterIn} > 0 and ${t.probeDiameterIn} <= 3`),
    check('sampling_probe_length_range', sql`${t.probeLengthIn} > 0 and ${t.probeLengthIn} <= 60`),
  ],
);
