import { sql } from 'drizzle-orm';
import {
  boolean,
  check,
  date,
  doublePrecision,
  index,
  integer,
  pgEnum,
  pgTable,
  text,
  timestamp,
} from 'drizzle-orm/pg-core';
import { baleType, forageClass, forageType, lotStatus, storageKind } from './enums';
import { farms } from './farms';
import { users } from './users';

export const pricingUnit = pgEnum('pricing_unit', ['ton', 'bale']);

/**
 * A lot: hay from one field, one cutting, baled at one time (common practice: within ~48 h, under ~200 t).
 * Prices are per short ton as-fed, in integer cents; a per-bale price is kept as entered and converted.
 */
export const lots = pgTable(
  'lots',
  {
    id: integer().primaryKey().generatedAlwaysAsIdentity(),
    farmId: integer().notNull().references(() => farms.id, { onDelete: 'restrict' }),
    title: text().notNull(),
    fieldName: text().notNull(),
    cutting: integer().notNull(),
    forageType: forageType().notNull(),
    forageClass: forageClass().notNull(),
    mixDescription: text().notNull().default(''),
    harvestStartedOn: date({ mode: 'string' }).notNull(),
    harvestEndedOn: date({ mode: 'string' }).notNull(),
    storage: storageKind().notNull(),
    moistureAtBalingPct: doublePrecision(),
    /** Growing conditions the grower reports (optional): the crop was drought-stressed. Both prompt a nitrate test. */
    droughtStressed: boolean().notNull().default(false),
    /** Growing conditions the grower reports (optional): heavy nitrogen fertiliser or manure on the field. */
    heavyNitrogen: boolean().notNull().default(false),
    baleType: baleType().notNull(),
    baleCount: integer().notNull(),
    balesAvailable: integer().notNull(),
    avgBaleWeightLb: doublePrecision().notNull(),
    pricingUnit: pricingUnit().notNull().default('ton'),
    priceCentsPerTon: integer().notNull(),
    priceCentsPerBale: integer(),
    minOrderTons: doublePrecision().notNull().default(0),
    freightCentsPerLoadedMile: integer(),
    deliveryTerms: text().notNull().default(''),
    pickupAllowed: boolean().notNull().default(true),
    description: text().notNull().default(''),
    status: lotStatus().notNull().default('draft'),
    /** Last step of the lot form the grower saved, so a draft can be resumed. */
    draftStep: integer().notNull().default(0),
    reviewNote: text(),
    reviewedBy: integer().references(() => users.id, { onDelete: 'set null' }),
    reviewedAt: timestamp({ withTimezone: true }),
    publishedAt: timestamp({ withTimezone: true }),
    viewCount: integer().notNull().default(0),
    /** Bumped by every grower change an admin reviews (lot facts, quantity, sampling, analysis, report); an approval names the revision it saw. */
    revision: integer().notNull().default(1),
    /** The lot this one was copied from (next cutting of the same field). */
    copiedFromId: integer(),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('lots_farm_idx').on(t.farmId),
    index('lots_status_forage_idx').on(t.status, t.forageType),
    index('lots_status_bale_idx').on(t.status, t.baleType),
    index('lots_status_price_idx').on(t.status, t.priceCentsPerTon),
    index('lots_status_published_idx').on(t.status, t.publishedAt),
    check('lots_cutting_range', sql`${t.cutting} between 1 and 8`),
    check('lots_harvest_order', sql`${t.harvestEndedOn} >= ${t.harvestStartedOn}`),
    check('lots_moisture_range', sql`${t.moistureAtBalingPct} is null or ${t.moistureAtBalingPct} between 0 and 60`),
    check('lots_bale_count_positive', sql`${t.baleCount} > 0 and ${t.baleCount} <= 100000`),
    check('lots_available_range', sql`${t.balesAvailable} between 0 and ${t.baleCount}`),
    check('lots_bale_weight_range', sql`${t.avgBaleWeightLb} between 20 and 2500`),
    check('lots_price_positive', sql`${t.priceCentsPerTon} > 0`),
    check('lots_bale_price_positive', sql`${t.priceCentsPerBale} is null or ${t.priceCentsPerBale} > 0`),
    check('lots_min_order_range', sql`${t.minOrderTons} >= 0`),
    check('lots_freight_range', sql`${t.freightCentsPerLoadedMile} is null or ${t.freightCentsPerLoadedMile} >= 0`),
    check('lots_title_nonempty', sql`length(trim(${t.title})) > 0`),
  ],
);
