import { z } from 'zod';
import { type HorseClass, HorseClassSchema } from './horse-class';
import { GROWING_AGE_MONTHS, growingRequirements, impliedMatureWeightKg } from './growing-horse';
import { MATURE_COEFFICIENTS, MATURE_DMI } from './nrc-2007-mature';
import {
  describeProvenance,
  GESTATION_MONTHS,
  gestationRow,
  LACTATION_MONTHS,
  lactationRow,
  type MareMonthRow,
  TABLE_BODY_WEIGHT_KG,
} from './nrc-2007-reproduction';

/** Mature body weights the NRC 2007 tables cover, kg (domain brief §6; memory). */
export const MATURE_BODY_WEIGHT_KG = { min: 200, max: 900 } as const;

/** Current weights accepted for a growing horse, kg; the implied mature weight must also be in range. */
export const GROWING_BODY_WEIGHT_KG = { min: 50, max: 900 } as const;

/** Mares in early lactation eat 2–3 % BW (practice; Poulin Grain, Ark Country Store guides; Virginia Tech 406-473 Table 5). */
const LACTATION_DMI = { min: 0.02, typical: 0.025, max: 0.03 } as const;

/** Dry-matter intake band for growing horses, fraction of BW (practice: weanlings may exceed 2.5–3 %, Merck). */
const GROWING_DMI = { min: 0.02, typical: 0.025, max: 0.03 } as const;

/**
 * Request for one horse's daily requirements.
 * - `bodyWeightKg`: current body weight, kg. Mature classes: 200–900 kg.
 * - `class`: see {@link HorseClassSchema}.
 * - `ageMonths`: required for, and only allowed with, `growing` (4–24 months).
 * - `month`: month of gestation (1–11, required for `gestation`) or of lactation (1–6, optional for
 *   `lactation`, default 1); not allowed with other classes.
 */
export const RequirementsRequestSchema = z
  .object({
    bodyWeightKg: z.number({ error: 'bodyWeightKg must be a number of kilograms' }).positive('bodyWeightKg must be more than 0 kg'),
    class: HorseClassSchema,
    ageMonths: z
      .number({ error: 'ageMonths must be a number of months' })
      .min(GROWING_AGE_MONTHS.min, `ageMonths must be at least ${GROWING_AGE_MONTHS.min} (weaned horses only)`)
      .max(GROWING_AGE_MONTHS.max, `ageMonths must be at most ${GROWING_AGE_MONTHS.max}; older horses are mature`)
      .optional(),
    month: z
      .number({ error: 'month must be a whole number of months' })
      .int('month must be a whole number of months')
      .min(1, 'month must be at least 1')
      .optional(),
  })
  .strict()
  .superRefine((request, ctx) => {
    const { bodyWeightKg, ageMonths, month } = request;
    if (request.class === 'gestation' && month === undefined) {
      ctx.addIssue({ code: 'custom', path: ['month'], message: "month (of gestation, 1–11) is required for class 'gestation'" });
    } else if (request.class === 'gestation' && month !== undefined && month > GESTATION_MONTHS.max) {
      ctx.addIssue({ code: 'custom', path: ['month'], message: `month of gestation must be at most ${GESTATION_MONTHS.max}` });
    } else if (request.class === 'lactation' && month !== undefined && month > LACTATION_MONTHS.max) {
      ctx.addIssue({ code: 'custom', path: ['month'], message: `month of lactation must be at most ${LACTATION_MONTHS.max} (NRC 2007 covers the first 6 months)` });
    } else if (request.class !== 'gestation' && request.class !== 'lactation' && month !== undefined) {
      ctx.addIssue({ code: 'custom', path: ['month'], message: "month applies only to classes 'gestation' and 'lactation'" });
    }
    if (request.class !== 'growing') {
      if (ageMonths !== undefined) {
        ctx.addIssue({ code: 'custom', path: ['ageMonths'], message: "ageMonths applies only to class 'growing'" });
      }
      if (bodyWeightKg < MATURE_BODY_WEIGHT_KG.min || bodyWeightKg > MATURE_BODY_WEIGHT_KG.max) {
        ctx.addIssue({
          code: 'custom',
          path: ['bodyWeightKg'],
          message: `bodyWeightKg must be between ${MATURE_BODY_WEIGHT_KG.min} and ${MATURE_BODY_WEIGHT_KG.max} kg for a mature horse (NRC 2007 range); got ${bodyWeightKg}`,
        });
      }
      return;
    }
    if (ageMonths === undefined) {
      ctx.addIssue({ code: 'custom', path: ['ageMonths'], message: "ageMonths is required for class 'growing'" });
      return;
    }
    if (bodyWeightKg < GROWING_BODY_WEIGHT_KG.min || bodyWeightKg > GROWING_BODY_WEIGHT_KG.max) {
      ctx.addIssue({
        code: 'custom',
        path: ['bodyWeightKg'],
        message: `bodyWeightKg must be between ${GROWING_BODY_WEIGHT_KG.min} and ${GROWING_BODY_WEIGHT_KG.max} kg for a growing horse; got ${bodyWeightKg}`,
      });
      return;
    }
    const mature = impliedMatureWeightKg(bodyWeightKg, ageMonths);
    if (mature < MATURE_BODY_WEIGHT_KG.min || mature > MATURE_BODY_WEIGHT_KG.max) {
      ctx.addIssue({
        code: 'custom',
        path: ['bodyWeightKg'],
        message: `a ${ageMonths}-month-old weighing ${bodyWeightKg} kg implies a mature weight of about ${Math.round(mature)} kg, outside ${MATURE_BODY_WEIGHT_KG.min}–${MATURE_BODY_WEIGHT_KG.max} kg; check the weight and age`,
      });
    }
  });

export type RequirementsRequest = z.infer<typeof RequirementsRequestSchema>;

/** Daily requirements of one horse. Dry matter (DM) figures are kg of dry matter, not as-fed hay. */
export interface HorseRequirements {
  /** Digestible energy, Mcal/day. */
  readonly deMcalPerDay: number;
  /** Crude protein, g/day. */
  readonly crudeProteinGPerDay: number;
  /** Typical dry-matter intake, kg DM/day (2 % BW for mature horses). */
  readonly dmiKgPerDay: number;
  /** Planning minimum dry-matter intake, kg DM/day (1.5 % BW for mature horses). */
  readonly dmiMinKgPerDay: number;
  /** Planning maximum dry-matter intake, kg DM/day (2.5 % BW; 3 % for lactating and growing horses). */
  readonly dmiMaxKgPerDay: number;
  /** Calcium, g/day. */
  readonly calciumGPerDay: number;
  /** Phosphorus, g/day. */
  readonly phosphorusGPerDay: number;
  /** Where the figures come from, including which parts are from memory. */
  readonly source: string;
  /** For `growing` only: mature weight and daily gain assumed by the growth curve. */
  readonly growth?: { readonly matureBodyWeightKg: number; readonly averageDailyGainKg: number };
}

/**
 * Daily nutrient requirements of one horse after NRC (2007), Nutrient Requirements of Horses.
 * Validates its input with {@link RequirementsRequestSchema} and throws a `ZodError` with a clear
 * message when the weight, class or age is out of range.
 *
 * These are population estimates; body condition over time is the real test, and a ration for a
 * horse with a health condition should be set by a veterinarian or an equine nutritionist.
 */
export function horseRequirements(input: RequirementsRequest): HorseRequirements {
  const request = RequirementsRequestSchema.parse(input);
  return requirementsFor(request.bodyWeightKg, request.class, request.ageMonths, request.month);
}

function requirementsFor(bodyWeightKg: number, horseClass: HorseClass, ageMonths: number | undefined, month: number | undefined): HorseRequirements {
  if (horseClass === 'growing') {
    // Schema guarantees ageMonths for growing horses.
    const age = ageMonths ?? GROWING_AGE_MONTHS.min;
    const growing = growingRequirements(bodyWeightKg, age);
    return {
      deMcalPerDay: growing.deMcalPerDay,
      crudeProteinGPerDay: growing.crudeProteinGPerDay,
      dmiKgPerDay: bodyWeightKg * GROWING_DMI.typical,
      dmiMinKgPerDay: bodyWeightKg * GROWING_DMI.min,
      dmiMaxKgPerDay: bodyWeightKg * GROWING_DMI.max,
      calciumGPerDay: growing.calciumGPerDay,
      phosphorusGPerDay: growing.phosphorusGPerDay,
      source:
        'NRC (2007) Nutrient Requirements of Horses: growing-horse equations (from memory) with daily gain from a growth curve fitted to the 500 kg table rows',
      growth: { matureBodyWeightKg: growing.matureBodyWeightKg, averageDailyGainKg: growing.averageDailyGainKg },
    };
  }
  if (horseClass === 'gestation' || horseClass === 'late-gestation') {
    // Schema guarantees a month for `gestation`; `late-gestation` is month 11.
    const m = horseClass === 'late-gestation' ? GESTATION_MONTHS.max : (month ?? GESTATION_MONTHS.max);
    const row = gestationRow(m);
    if (row === null) {
      const maintenance = requirementsFor(bodyWeightKg, 'maintenance', undefined, undefined);
      return { ...maintenance, source: `${NRC_2007}: gestation month ${m}, fed as average maintenance until month 5 (Thunes, Summit Equine Nutrition)` };
    }
    return fromMareRow(bodyWeightKg, row, MATURE_DMI, `gestation month ${m}`);
  }
  if (horseClass === 'lactation') {
    const m = month ?? LACTATION_MONTHS.min;
    return fromMareRow(bodyWeightKg, lactationRow(m), LACTATION_DMI, `lactation month ${m}`);
  }
  const c = MATURE_COEFFICIENTS[horseClass];
  return {
    deMcalPerDay: bodyWeightKg * c.deMcalPerKgBw,
    crudeProteinGPerDay: bodyWeightKg * c.crudeProteinGPerKgBw,
    dmiKgPerDay: bodyWeightKg * c.dmiFractionOfBw.typical,
    dmiMinKgPerDay: bodyWeightKg * c.dmiFractionOfBw.min,
    dmiMaxKgPerDay: bodyWeightKg * c.dmiFractionOfBw.max,
    calciumGPerDay: bodyWeightKg * c.calciumGPerKgBw,
    phosphorusGPerDay: bodyWeightKg * c.phosphorusGPerKgBw,
    source: c.source,
  };
}

const NRC_2007 = 'NRC (2007) Nutrient Requirements of Horses';

/** A broodmare row of the 500 kg table scaled to this body weight, with each figure's provenance. */
function fromMareRow(
  bodyWeightKg: number,
  row: MareMonthRow,
  dmi: { readonly min: number; readonly typical: number; readonly max: number },
  what: string,
): HorseRequirements {
  const scale = bodyWeightKg / TABLE_BODY_WEIGHT_KG;
  return {
    deMcalPerDay: row.deMcal.value * scale,
    crudeProteinGPerDay: row.crudeProteinG.value * scale,
    dmiKgPerDay: bodyWeightKg * dmi.typical,
    dmiMinKgPerDay: bodyWeightKg * dmi.min,
    dmiMaxKgPerDay: bodyWeightKg * dmi.max,
    calciumGPerDay: row.calciumG.value * scale,
    phosphorusGPerDay: row.phosphorusG.value * scale,
    source: `${NRC_2007}: ${what}, the 500 kg row scaled by body weight — ${describeProvenance(row)}`,
  };
}
