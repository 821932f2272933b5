import type { StoredField } from '../forage/analysis-fields';
import { z } from 'zod';
import { MAX_COMPARED_LOTS } from './compare-limits';
import type { BaleType, ForageType } from './lots';

export { MAX_COMPARED_LOTS };

/**
 * GET /api/lots/compare?ids=3,8,12&zip=66502&tons=24 — up to four lots side by side.
 * `tons` is the quantity priced for delivery (default: one 24 t load, or the whole stock when smaller).
 */
export const LotCompareQuerySchema = z
  .object({
    ids: z
      .string({ message: 'Give the lot ids to compare, e.g. ids=3,8.' })
      .transform((v) => v.split(',').map((s) => s.trim()).filter((s) => s !== '').map(Number))
      .pipe(
        z
          .array(z.number({ message: 'Lot ids must be numbers.' }).int('Lot ids must be whole numbers.').positive('Lot ids must be positive.'))
          .min(1, 'Give at least one lot id.')
          .max(MAX_COMPARED_LOTS, `Compare at most ${MAX_COMPARED_LOTS} lots.`),
      )
      .transform((ids) => [...new Set(ids)]),
    zip: z.string().regex(/^\d{5}$/, 'ZIP code must be 5 digits.').optional(),
    tons: z.coerce.number({ message: 'Tons must be a number.' }).positive('Tons must be more than 0.').max(1000, 'Tons must be at most 1000.').optional(),
  })
  .strict();
export type LotCompareQuery = z.infer<typeof LotCompareQuerySchema>;

/** The lab fields the compare sheet sets side by side, in the analysis-field table's order. */
export const COMPARED_LAB_FIELDS = ['dryMatterPct', 'crudeProteinPct', 'adfPct', 'ndfPct', 'fatPct', 'ashPct', 'calciumPct', 'phosphorusPct'] as const satisfies readonly StoredField[];

/** Nutrients on a dry-matter basis (%), with the engine's computed figures stored at save time. */
export interface ComparedNutrients {
  dryMatterPct: number;
  crudeProteinPct: number;
  adfPct: number;
  ndfPct: number;
  nscPct: number | null;
  fatPct: number | null;
  ashPct: number | null;
  calciumPct: number | null;
  phosphorusPct: number | null;
  rfv: number;
  rfq: number | null;
  tdnPct: number;
  /** Horse digestible energy, Mcal per kg of dry matter, as stored with the analysis. */
  deMcalPerKgDm: number;
  /** Which equation produced the DE figure. */
  deMethod: string;
}

/**
 * What the hay costs the buyer. Totals are whole cents; per-unit costs are fractional cents
 * (round only for display). `basis` says whether freight is included.
 */
export interface ComparedPricing {
  basis: 'delivered' | 'at-farm';
  /** Why the basis is at-farm, when it is. */
  note: string | null;
  /** Quantity priced, short tons as-fed. */
  tons: number;
  loads: number;
  hayCents: number;
  freightCents: number;
  totalCents: number;
  /** Price per short ton as-fed including freight when delivered. */
  perTonCents: number;
  perDmTonCents: number;
  /** Null when the hay has no protein to price. */
  perLbCrudeProteinCents: number | null;
  perMcalDeCents: number;
}

export interface ComparedLot {
  id: number;
  title: string;
  status: 'listed' | 'sold_out';
  farmName: string;
  city: string;
  state: string;
  forageType: ForageType;
  cutting: number;
  baleType: BaleType;
  avgBaleWeightLb: number;
  balesAvailable: number;
  tonsAvailable: number;
  minOrderTons: number;
  priceCentsPerTon: number;
  freightCentsPerLoadedMile: number | null;
  distanceMi: number | null;
  /** The grower delivers within this many miles of the farm. */
  deliveryRadiusMi: number;
  labCertified: boolean;
  analysisVerified: boolean;
  nutrients: ComparedNutrients;
  pricing: ComparedPricing;
}

export interface LotComparison {
  items: ComparedLot[];
  /** Ids asked for that are not (or no longer) on sale. */
  missingIds: number[];
  origin: { zip: string; city: string; state: string } | null;
}
