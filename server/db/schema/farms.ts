import { sql } from 'drizzle-orm';
import { boolean, check, doublePrecision, index, integer, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import { users } from './users';

/** A grower's farm: where hay is loaded and how far the grower delivers. */
export const farms = pgTable(
  'farms',
  {
    id: integer().primaryKey().generatedAlwaysAsIdentity(),
    // A grower account cannot be deleted while it still owns a farm with history.
    ownerId: integer().notNull().references(() => users.id, { onDelete: 'restrict' }),
    name: text().notNull(),
    addressLine: text().notNull(),
    city: text().notNull(),
    state: text().notNull(),
    zip: text().notNull(),
    latitude: doublePrecision().notNull(),
    longitude: doublePrecision().notNull(),
    deliveryRadiusMi: integer().notNull().default(100),
    loadingFacilities: text().notNull().default(''),
    pickupHours: text().notNull().default(''),
    /** Days of the week the grower delivers, 0 = Sunday … 6 = Saturday. */
    deliveryWeekdays: integer().array().notNull().default(sql`'{1,2,3,4,5}'::integer[]`),
    loadsPerDay: integer().notNull().default(2),
    /** What one truck or trailer carries: short tons, and bales when it fills by count first. */
    tonsPerLoad: doublePrecision().notNull().default(24),
    balesPerLoad: integer(),
    /** Pickup appointments start on the hour between these (local farm time, 24 h clock). */
    pickupFromHour: integer().notNull().default(8),
    pickupToHour: integer().notNull().default(17),
    /** The farm's IANA time zone (e.g. America/Chicago): delivery days and pickup hours are its wall-clock time. */
    timeZone: text().notNull(),
    description: text().notNull().default(''),
    /** Connected payout account at the payment provider; null until set up. */
    payoutAccountId: text(),
    payoutsEnabled: boolean().notNull().default(false),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('farms_owner_idx').on(t.ownerId),
    index('farms_lat_lon_idx').on(t.latitude, t.longitude),
    check('farms_zip_shape', sql`${t.zip} ~ '^[0-9]{5}$'`),
    check('farms_lat_range', sql`${t.latitude} between -90 and 90`),
    check('farms_lon_range', sql`${t.longitude} between -180 and 180`),
    check('farms_radius_range', sql`${t.deliveryRadiusMi} between 0 and 3000`),
    check('farms_loads_per_day_range', sql`${t.loadsPerDay} between 0 and 50`),
    check('farms_tons_per_load_range', sql`${t.tonsPerLoad} > 0 and ${t.tonsPerLoad} <= 40`),
    check('farms_pickup_hours_order', sql`${t.pickupFromHour} between 0 and 23 and ${t.pickupToHour} between 1 and 24 and ${t.pickupToHour} > ${t.pickupFromHour}`),
  ],
);
