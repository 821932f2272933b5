import { sql } from 'drizzle-orm';
import {
  boolean,
  check,
  date,
  doublePrecision,
  index,
  integer,
  jsonb,
  pgTable,
  text,
  timestamp,
  uniqueIndex,
} from 'drizzle-orm/pg-core';
import { VISUAL_MOULD_SCORES } from '@shared/forage/mould-scores';
import { analysisMethod, verificationState } from './enums';
import { storedFiles } from './files';
import { lots } from './lots';
import { users } from './users';

const pct = (name: string, column: unknown) => check(name, sql`${column} is null or ${column} between 0 and 100`);

/**
 * A lab analysis of a lot's composite sample. Nutrients are stored on a dry-matter basis whatever basis
 * the grower typed (`enteredBasis` records that); computed figures come from the shared forage engine at
 * save time so the catalogue can filter on them with indexes. A lot keeps old analyses; one is current.
 */
export const labAnalyses = pgTable(
  'lab_analyses',
  {
    id: integer().primaryKey().generatedAlwaysAsIdentity(),
    lotId: integer().notNull().references(() => lots.id, { onDelete: 'cascade' }),
    isCurrent: boolean().notNull().default(true),
    labName: text().notNull(),
    labCertified: boolean().notNull(),
    reportNumber: text().notNull().default(''),
    reportDate: date({ mode: 'string' }).notNull(),
    method: analysisMethod().notNull().default('nirs'),
    reportFileId: integer().references(() => storedFiles.id, { onDelete: 'set null' }),
    enteredBasis: text({ enum: ['dm', 'asFed'] }).notNull().default('dm'),
    dryMatterPct: doublePrecision().notNull(),
    crudeProteinPct: doublePrecision().notNull(),
    adfPct: doublePrecision().notNull(),
    ndfPct: doublePrecision().notNull(),
    ndfd48Pct: doublePrecision(),
    fatPct: doublePrecision(),
    ashPct: doublePrecision(),
    escPct: doublePrecision(),
    wscPct: doublePrecision(),
    starchPct: doublePrecision(),
    calciumPct: doublePrecision(),
    phosphorusPct: doublePrecision(),
    reportedRfv: doublePrecision(),
    /** Nitrate, % nitrate ion of dry matter; null when not tested. */
    nitrateNo3PctDm: doublePrecision(),
    /** Mould count, colony-forming units per gram, as the lab reports it; null when not tested. */
    mouldCfuPerG: doublePrecision(),
    /** Mould the grower saw when bales were opened; null when not said. */
    visualMouldScore: text({ enum: VISUAL_MOULD_SCORES }),
    /** Mycotoxins as the lab reports them: aflatoxin ppb, DON (vomitoxin) ppm, fumonisin ppm; null when not tested. */
    aflatoxinPpb: doublePrecision(),
    donPpm: doublePrecision(),
    fumonisinPpm: doublePrecision(),
    // Computed by the forage engine (shared/forage) when saved.
    rfv: doublePrecision().notNull(),
    rfq: doublePrecision(),
    tdnPct: doublePrecision().notNull(),
    tdnMethod: text().notNull(),
    deMcalPerKgDm: doublePrecision().notNull(),
    deMethod: text().notNull(),
    nscPct: doublePrecision(),
    usdaGrade: text().notNull(),
    afgcGrade: text(),
    findings: jsonb().notNull().default([]),
    verification: verificationState().notNull().default('pending'),
    verifiedBy: integer().references(() => users.id, { onDelete: 'set null' }),
    verifiedAt: timestamp({ withTimezone: true }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex('lab_analyses_one_current_per_lot').on(t.lotId).where(sql`${t.isCurrent}`),
    index('lab_analyses_rfv_idx').on(t.rfv).where(sql`${t.isCurrent}`),
    index('lab_analyses_cp_idx').on(t.crudeProteinPct).where(sql`${t.isCurrent}`),
    index('lab_analyses_nsc_idx').on(t.nscPct).where(sql`${t.isCurrent}`),
    check('lab_dm_range', sql`${t.dryMatterPct} > 0 and ${t.dryMatterPct} <= 100`),
    pct('lab_cp_range', t.crudeProteinPct),
    pct('lab_adf_range', t.adfPct),
    check('lab_ndf_range', sql`${t.ndfPct} > 0 and ${t.ndfPct} <= 100`),
    check('lab_ndf_above_adf', sql`${t.ndfPct} > ${t.adfPct}`),
    pct('lab_ndfd_range', t.ndfd48Pct),
    pct('lab_fat_range', t.fatPct),
    pct('lab_ash_range', t.ashPct),
    pct('lab_esc_range', t.escPct),
    pct('lab_wsc_range', t.wscPct),
    pct('lab_starch_range', t.starchPct),
    pct('lab_ca_range', t.calciumPct),
    pct('lab_p_range', t.phosphorusPct),
    check('lab_mould_count_range', sql`${t.mouldCfuPerG} is null or ${t.mouldCfuPerG} between 0 and 1e10`),
    check('lab_visual_mould_score', sql`${t.visualMouldScore} is null or ${t.visualMouldScore} in (${sql.raw(VISUAL_MOULD_SCORES.map((v) => `'${v}'`).join(', '))})`),
    check('lab_aflatoxin_range', sql`${t.aflatoxinPpb} is null or ${t.aflatoxinPpb} between 0 and 10000`),
    check('lab_don_range', sql`${t.donPpm} is null or ${t.donPpm} between 0 and 1000`),
    check('lab_fumonisin_range', sql`${t.fumonisinPpm} is null or ${t.fumonisinPpm} between 0 and 1000`),
    check('lab_nitrate_range', sql`${t.nitrateNo3PctDm} is null or ${t.nitrateNo3PctDm} between 0 and 10`),
    check('lab_rfv_range', sql`${t.rfv} > 0 and ${t.rfv} < 1000`),
  ],
);
