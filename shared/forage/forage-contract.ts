import { z } from 'zod';
import { VISUAL_MOULD_SCORES } from './mould-scores';
import { AFGC_GRADES, USDA_ALFALFA_GRADES, USDA_GRASS_GRADES } from './grade-names';
import { BASIS_DEPENDENT_FIELDS } from './analysis-fields';
import { CORE_POSITIONS, FORAGE_CLASSES, type CorePosition, type ForageClass } from '../contracts/enums';

/**
 * Wire contract of the forage analysis engine: zod schemas for what the server accepts on
 * POST /api/forage/evaluate and what it returns, plus the inferred TypeScript types.
 *
 * Conventions used throughout the engine:
 * - "percent" fields are % of the sample on the stated basis (DM = dry matter, as-fed = as sampled);
 * - `ndfd48Pct` is % of NDF, so it is the same on every basis;
 * - every returned number is unrounded; rounding is the UI's job.
 */

/** Botanical class of the hay: chooses RFQ/TDN equations and the USDA grade table. */
export const ForageClassSchema = z.enum(FORAGE_CLASSES);
export type { ForageClass };

/** Basis the lab values were entered on: 'dm' = 100% dry matter, 'asFed' = as sampled (with moisture). */
export const NutrientBasisSchema = z.enum(['dm', 'asFed']);
export type NutrientBasis = z.infer<typeof NutrientBasisSchema>;

const KEBAB_CASE = /^[a-z0-9]+(-[a-z0-9]+)*$/;

function percent(field: string, meaning: string) {
  return z
    .number({ error: `${field} (${meaning}) must be a number, in percent` })
    .min(0, { error: `${field} (${meaning}) cannot be negative` })
    .max(100, { error: `${field} (${meaning}) cannot exceed 100%` });
}


/**
 * A lab analysis of one hay lot, as entered by a grower or read off a lab report.
 *
 * Nutrient percentages are on `basis`. On an as-fed basis a nutrient cannot exceed
 * `dryMatterPct` (it is part of the dry matter), so such input is rejected.
 * `moisturePct` is optional and only used to cross-check `dryMatterPct` (they should sum to 100).
 */
export const ForageEvaluationRequestSchema = z
  .object({
    forageClass: ForageClassSchema,
    basis: NutrientBasisSchema,
    /** Dry matter, % of the sample as fed (100 − moisture). */
    dryMatterPct: z
      .number({ error: 'dryMatterPct must be a number, in percent' })
      .gt(0, { error: 'dryMatterPct must be greater than 0%' })
      .max(100, { error: 'dryMatterPct cannot exceed 100%' }),
    crudeProteinPct: percent('crudeProteinPct', 'crude protein'),
    adfPct: percent('adfPct', 'acid detergent fibre'),
    // RFV divides by NDF; no hay is below 1% NDF, so the floor keeps every result finite.
    ndfPct: percent('ndfPct', 'neutral detergent fibre').min(1, {
      error: 'ndfPct (neutral detergent fibre) must be at least 1% — hay is never close to fibre-free',
    }),
    /** 48-hour in-vitro NDF digestibility, % of NDF (not of the sample). */
    ndfd48Pct: percent('ndfd48Pct', '48-h NDF digestibility, % of NDF').optional(),
    /** Crude fat (ether extract, EE). */
    fatPct: percent('fatPct', 'crude fat / ether extract').optional(),
    ashPct: percent('ashPct', 'ash').optional(),
    /** Ethanol-soluble carbohydrate (mainly simple sugars; a subset of WSC). */
    escPct: percent('escPct', 'ethanol-soluble carbohydrate').optional(),
    /** Water-soluble carbohydrate (sugars plus fructans). */
    wscPct: percent('wscPct', 'water-soluble carbohydrate').optional(),
    starchPct: percent('starchPct', 'starch').optional(),
    calciumPct: percent('calciumPct', 'calcium').optional(),
    phosphorusPct: percent('phosphorusPct', 'phosphorus').optional(),
    /** Nitrate, % nitrate ion (NO3) of dry matter, whatever the basis of the other fields (labs report it on DM). */
    nitrateNo3PctDm: z
      .number({ error: 'nitrateNo3PctDm must be a number, % nitrate of dry matter' })
      .min(0, { error: 'nitrateNo3PctDm cannot be negative' })
      .max(10, { error: 'nitrateNo3PctDm above 10% is not a hay result; check the unit (ppm nitrate-N × 0.000443 = % nitrate)' })
      .optional(),
    /** Mould count from the lab, colony-forming units per gram (as the lab reports it). */
    mouldCfuPerG: z
      .number({ error: 'mouldCfuPerG must be a number, colony-forming units per gram' })
      .min(0, { error: 'mouldCfuPerG cannot be negative' })
      .max(1e10, { error: 'mouldCfuPerG above 10,000,000,000 CFU/g is not a lab result; check the unit' })
      .optional(),
    /** Mould the grower saw when bales were opened (see shared/forage/mould.ts). */
    visualMouldScore: z.enum(VISUAL_MOULD_SCORES, { error: `visualMouldScore must be one of: ${VISUAL_MOULD_SCORES.join(', ')}` }).optional(),
    /** Aflatoxin, ppb (µg/kg), as the lab reports it. */
    aflatoxinPpb: z.number({ error: 'aflatoxinPpb must be a number, ppb' }).min(0, { error: 'aflatoxinPpb cannot be negative' }).max(10_000, { error: 'aflatoxinPpb above 10,000 ppb is not a hay result; check the unit (1 ppm = 1,000 ppb)' }).optional(),
    /** Deoxynivalenol (DON, vomitoxin), ppm (mg/kg), as the lab reports it. */
    donPpm: z.number({ error: 'donPpm must be a number, ppm' }).min(0, { error: 'donPpm cannot be negative' }).max(1000, { error: 'donPpm above 1,000 ppm is not a hay result; check the unit (1 ppm = 1,000 ppb)' }).optional(),
    /** Fumonisin (B1 + B2 + B3), ppm (mg/kg), as the lab reports it. */
    fumonisinPpm: z.number({ error: 'fumonisinPpm must be a number, ppm' }).min(0, { error: 'fumonisinPpm cannot be negative' }).max(1000, { error: 'fumonisinPpm above 1,000 ppm is not a hay result; check the unit (1 ppm = 1,000 ppb)' }).optional(),
    /** Moisture as reported by the lab, % as fed; optional cross-check of dryMatterPct. */
    moisturePct: z
      .number({ error: 'moisturePct must be a number, in percent' })
      .min(0, { error: 'moisturePct cannot be negative' })
      .lt(100, { error: 'moisturePct must be below 100% (100% moisture leaves no dry matter)' })
      .optional(),
    /** RFV printed on the lab report (unitless index), checked against the computed RFV. */
    reportedRfv: z
      .number({ error: 'reportedRfv must be a number' })
      .gt(0, { error: 'reportedRfv must be greater than 0' })
      .max(1000, { error: 'reportedRfv cannot exceed 1000' })
      .optional(),
  })
  .strict()
  .superRefine((req, ctx) => {
    if (req.basis !== 'asFed') return;
    for (const field of BASIS_DEPENDENT_FIELDS) {
      const value = req[field];
      if (value !== undefined && value > req.dryMatterPct) {
        ctx.addIssue({
          code: 'custom',
          path: [field],
          message: `${field} on an as-fed basis (${value}%) cannot exceed dryMatterPct (${req.dryMatterPct}%): a nutrient is part of the dry matter`,
        });
      }
    }
  });
export type ForageEvaluationRequest = z.infer<typeof ForageEvaluationRequestSchema>;

/** Severity of a finding: 'error' = impossible or non-compliant, 'warning' = suspicious, 'info' = note. */
export const FindingSeveritySchema = z.enum(['error', 'warning', 'info']);
export type FindingSeverity = z.infer<typeof FindingSeveritySchema>;

/** One observation about an analysis or sampling record, in plain English. */
export const FindingSchema = z.object({
  severity: FindingSeveritySchema,
  /** Stable kebab-case identifier, e.g. 'ndf-below-adf'; the UI may key help text on it. */
  code: z.string().regex(KEBAB_CASE),
  message: z.string().min(1),
});
export type Finding = z.infer<typeof FindingSchema>;

/** Nutrient percentages on one basis; null where the lab did not report the nutrient. */
export const NutrientsSchema = z.object({
  crudeProteinPct: z.number(),
  adfPct: z.number(),
  ndfPct: z.number(),
  fatPct: z.number().nullable(),
  ashPct: z.number().nullable(),
  escPct: z.number().nullable(),
  wscPct: z.number().nullable(),
  starchPct: z.number().nullable(),
  calciumPct: z.number().nullable(),
  phosphorusPct: z.number().nullable(),
  /** Non-structural carbohydrate (see `nscMethod` for the definition used). */
  nscPct: z.number().nullable(),
});
export type Nutrients = z.infer<typeof NutrientsSchema>;

/**
 * TDN equation ids.
 * - 'adf-western': TDN = 82.38 − 0.7515·ADF (Western/California; the USDA AMS TDN column).
 * - 'summative-nrc2001-legume' / 'summative-nrc2001-grass': NRC (2001) summative TDN in the form
 *   Undersander & Moore (2002) use for RFQ (needs fat, ash and 48-h NDFD).
 */
export const TdnMethodSchema = z.enum(['adf-western', 'summative-nrc2001-legume', 'summative-nrc2001-grass']);
export type TdnMethod = z.infer<typeof TdnMethodSchema>;

/**
 * Horse DE method ids: 'nrc-2007-pagan' = NRC (2007) equation after Pagan (1998);
 * 'tdn-approximation' = DE ≈ 0.044 Mcal/kg per TDN point (Kentucky Equine Research).
 */
export const HorseDeMethodSchema = z.enum(['nrc-2007-pagan', 'tdn-approximation']);
export type HorseDeMethod = z.infer<typeof HorseDeMethodSchema>;

/** Horse digestible energy of the hay. */
export const HorseDeSchema = z.object({
  mcalPerKgDm: z.number(),
  mcalPerLbDm: z.number(),
  mcalPerKgAsFed: z.number(),
  mcalPerLbAsFed: z.number(),
  method: HorseDeMethodSchema,
});
export type HorseDe = z.infer<typeof HorseDeSchema>;

/** NSC definitions: WSC + starch (preferred: includes fructans) or ESC + starch. */
export const NscMethodSchema = z.enum(['wsc-plus-starch', 'esc-plus-starch']);
export type NscMethod = z.infer<typeof NscMethodSchema>;

/**
 * NSC (DM basis) against the advice for horses prone to laminitis / insulin dysregulation
 * (< 10–12% DM): below 10 → within; 10 to below 12 → above the strict limit; 12 or more → above the upper limit.
 */
export const NscFlagSchema = z.enum(['within-advised-limit', 'above-strict-limit', 'above-upper-limit']);
export type NscFlag = z.infer<typeof NscFlagSchema>;

export { AFGC_GRADES, USDA_ALFALFA_GRADES, USDA_GRASS_GRADES };

export const UsdaGradeNameSchema = z.enum(['Supreme', 'Premium', 'Good', 'Fair', 'Utility', 'Low']);
export type UsdaGradeName = z.infer<typeof UsdaGradeNameSchema>;

/** A criterion of the USDA tables; all DM basis. */
export const UsdaCriterionSchema = z.enum(['adf', 'ndf', 'rfv', 'tdn', 'crudeProtein']);
export type UsdaCriterion = z.infer<typeof UsdaCriterionSchema>;

/** Version id of the grade table used, stored with every grade (states and years differ). */
export const UsdaTableSchema = z.enum(['usda-ams-2003-alfalfa', 'usda-ams-2003-grass']);
export type UsdaTable = z.infer<typeof UsdaTableSchema>;

/**
 * USDA AMS Market News grade: `name` is the lowest grade any criterion gives, `basis` the
 * criterion that set it (first in table order ADF, NDF, RFV, TDN, CP when several tie),
 * `criteria` the grade each criterion alone gives.
 */
export const UsdaGradeSchema = z.object({
  name: UsdaGradeNameSchema,
  basis: UsdaCriterionSchema,
  table: UsdaTableSchema,
  criteria: z.array(z.object({ criterion: UsdaCriterionSchema, name: UsdaGradeNameSchema })),
});
export type UsdaGrade = z.infer<typeof UsdaGradeSchema>;

/** AFGC Hay Marketing Task Force legume grade, banded on RFV only (`basis: 'rfv'`). */
export const AfgcGradeSchema = z.object({
  name: z.enum(AFGC_GRADES),
  basis: z.literal('rfv'),
});
export type AfgcGrade = z.infer<typeof AfgcGradeSchema>;

/** Grades of one lot; `afgc` is null for grass hay (the AFGC bands are for legumes). */
export const GradesSchema = z.object({
  usda: UsdaGradeSchema,
  afgc: AfgcGradeSchema.nullable(),
});
export type Grades = z.infer<typeof GradesSchema>;

/** Result of `evaluateForage`; all numbers unrounded. */
export const ForageEvaluationSchema = z.object({
  dm: NutrientsSchema,
  asFed: NutrientsSchema,
  /** Digestible dry matter, % of DM (RFV route). */
  ddmPct: z.number(),
  /** Dry matter intake, % of body weight per day (RFV route, 120/NDF). */
  dmiPctBw: z.number(),
  /** Relative feed value, unitless (full-bloom alfalfa = 100). */
  rfv: z.number(),
  /** Relative forage quality, unitless; null when NDFD, fat or ash is missing or NFC < 0. */
  rfq: z.number().nullable(),
  /** Total digestible nutrients, % of DM, by `tdnMethod`. */
  tdnPct: z.number(),
  tdnMethod: TdnMethodSchema,
  horseDe: HorseDeSchema,
  /** Non-structural carbohydrate, % of DM; null unless starch and WSC or ESC are reported. */
  nscPct: z.number().nullable(),
  nscMethod: NscMethodSchema.nullable(),
  nscFlag: NscFlagSchema.nullable(),
  grades: GradesSchema,
  findings: z.array(FindingSchema),
});
export type ForageEvaluation = z.infer<typeof ForageEvaluationSchema>;

/** Where the probe entered the bale. */
export const CorePositionSchema = z.enum(CORE_POSITIONS);
export type { CorePosition };

export const BaleShapeSchema = z.enum(['small-square', 'large-square', 'round']);
export type BaleShape = z.infer<typeof BaleShapeSchema>;

const isoDateOrDateTime = (field: string) =>
  z.union([z.iso.date(), z.iso.datetime({ offset: true })], {
    error: `${field} must be an ISO date (YYYY-MM-DD) or date-time with offset`,
  });

/**
 * How the lab sample of a lot was taken. Dates are ISO dates (YYYY-MM-DD) or date-times;
 * a date alone is read as the whole day (UTC). Tons are US short tons (2,000 lb) as fed.
 */
export const SamplingRecordSchema = z
  .object({
    sampledOn: isoDateOrDateTime('sampledOn'),
    coresTaken: z
      .number({ error: 'coresTaken must be a whole number' })
      .int({ error: 'coresTaken must be a whole number' })
      .min(1, { error: 'coresTaken must be at least 1' }),
    balesSampled: z
      .number({ error: 'balesSampled must be a whole number' })
      .int({ error: 'balesSampled must be a whole number' })
      .min(1, { error: 'balesSampled must be at least 1' }),
    /** Internal diameter of the probe tube, inches; may be omitted for a grab sample. */
    probeDiameterIn: z
      .number({ error: 'probeDiameterIn must be a number, in inches' })
      .gt(0, { error: 'probeDiameterIn must be greater than 0' })
      .max(12, { error: 'probeDiameterIn cannot exceed 12 in' })
      .optional(),
    /** Usable length of the probe, inches; may be omitted for a grab sample. */
    probeLengthIn: z
      .number({ error: 'probeLengthIn must be a number, in inches' })
      .gt(0, { error: 'probeLengthIn must be greater than 0' })
      .max(120, { error: 'probeLengthIn cannot exceed 120 in' })
      .optional(),
    corePosition: CorePositionSchema,
    baleShape: BaleShapeSchema,
    harvestStartedOn: isoDateOrDateTime('harvestStartedOn'),
    harvestEndedOn: isoDateOrDateTime('harvestEndedOn'),
    /** Size of the lot, short tons as fed. */
    lotTons: z
      .number({ error: 'lotTons must be a number' })
      .gt(0, { error: 'lotTons must be greater than 0' })
      .max(100_000, { error: 'lotTons cannot exceed 100,000' }),
    /** Who took the sample (person or company). */
    sampledBy: z.string({ error: 'sampledBy is required' }).trim().min(1, { error: 'sampledBy is required' }),
  })
  .strict();
export type SamplingRecord = z.infer<typeof SamplingRecordSchema>;

/** Result of `evaluateSampling`: compliant when no finding is an error. */
export const SamplingEvaluationSchema = z.object({
  compliant: z.boolean(),
  findings: z.array(FindingSchema),
});
export type SamplingEvaluation = z.infer<typeof SamplingEvaluationSchema>;
