import { sql } from 'drizzle-orm';
import { boolean, doublePrecision, index, integer, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import { baleType, forageType } from './enums';
import { lots } from './lots';

/**
 * The catalogue's search rows: one per lot that is listed, in stock and has a current analysis, holding
 * every figure the catalogue filters or sorts on, so a search reads one table through fitting indexes.
 * Written only by database triggers on lots, lab_analyses, sampling_records and farms (migration
 * `lot_search_sync`), in the same transaction as the change; never written by application code.
 */
export const lotSearch = pgTable(
  'lot_search',
  {
    lotId: integer().primaryKey().references(() => lots.id, { onDelete: 'cascade' }),
    farmId: integer().notNull(),
    title: text().notNull(),
    farmName: text().notNull(),
    publishedAt: timestamp({ withTimezone: true }),
    forageType: forageType().notNull(),
    baleType: baleType().notNull(),
    cutting: integer().notNull(),
    harvestYear: integer().notNull(),
    priceCentsPerTon: integer().notNull(),
    /** As-fed price ÷ dry-matter fraction, unrounded, as the catalogue sorts on it. */
    priceCentsPerDmTon: doublePrecision().notNull(),
    tonsAvailable: doublePrecision().notNull(),
    rfv: doublePrecision().notNull(),
    rfq: doublePrecision(),
    crudeProteinPct: doublePrecision().notNull(),
    adfPct: doublePrecision().notNull(),
    ndfPct: doublePrecision().notNull(),
    nscPct: doublePrecision(),
    samplingCompliant: boolean().notNull(),
    /** The analysis is verified and the lab certified. */
    labVerified: boolean().notNull(),
    latitude: doublePrecision().notNull(),
    longitude: doublePrecision().notNull(),
  },
  (t) => [
    index('lot_search_newest_idx').on(t.publishedAt.desc().nullsFirst(), t.lotId.desc()),
    index('lot_search_price_idx').on(t.priceCentsPerTon, t.lotId.desc()),
    index('lot_search_price_dm_idx').on(t.priceCentsPerDmTon, t.lotId.desc()),
    index('lot_search_rfv_idx').on(t.rfv.desc(), t.lotId.desc()),
    index('lot_search_protein_idx').on(t.crudeProteinPct.desc(), t.lotId.desc()),
    index('lot_search_forage_price_idx').on(t.forageType, t.priceCentsPerTon),
    index('lot_search_place_idx').using('gist', sql`point(${t.longitude}, ${t.latitude})`),
  ],
);
