import { z } from 'zod';
import { FORAGE_FLOOR_PCT_BW } from '../nutrition/forage-floor';
import { HorseClassSchema } from '../nutrition/horse-class';
import { type HorseRequirements, horseRequirements, RequirementsRequestSchema } from '../nutrition/horse-requirements';
import { LB_PER_KG, lbToKg } from '../units/mass';
import { FeedingMethodSchema, type FeedingMethod, WASTE_ALLOWANCES, type WasteAllowance } from './feeding-methods';
import { hayPurchase } from './hay-purchase';

/** A group of similar horses. `bodyWeight` is per horse, in `weightUnit`. */
export const HorseGroupSchema = z
  .object({
    count: z.number().int('count must be a whole number of horses').min(1, 'count must be at least 1').max(1000, 'count must be at most 1000'),
    bodyWeight: z.number({ error: 'bodyWeight must be a number' }).positive('bodyWeight must be more than 0'),
    weightUnit: z.enum(['lb', 'kg'], { error: "weightUnit must be 'lb' or 'kg'" }),
    class: HorseClassSchema,
    /** Required for `growing`, months (4–24). */
    ageMonths: z.number().optional(),
    /** Month of gestation (1–11, required for `gestation`) or lactation (1–6, optional for `lactation`). */
    month: z.number().optional(),
  })
  .strict();

/** Lab analysis and bale weight of the hay lot being considered. Nutrients are on a dry-matter basis. */
export const HayLotSchema = z
  .object({
    /** Dry matter, % of as-fed weight (100 − moisture %). */
    dryMatterPct: z.number().gt(50, 'dryMatterPct must be above 50 % (hay, not haylage)').max(100, 'dryMatterPct cannot exceed 100 %'),
    /** Crude protein, % of dry matter. */
    crudeProteinPctDm: z.number().min(0, 'crudeProteinPctDm cannot be negative').max(40, 'crudeProteinPctDm above 40 % DM is not hay'),
    /** Horse digestible energy, Mcal per kg of dry matter. */
    deMcalPerKgDm: z.number().gt(0, 'deMcalPerKgDm must be positive').max(4, 'deMcalPerKgDm above 4 Mcal/kg DM is not hay'),
    /** Average bale weight, lb as-fed (ideally from a scale ticket). */
    baleWeightLb: z.number().min(20, 'baleWeightLb must be at least 20 lb').max(3000, 'baleWeightLb must be at most 3000 lb'),
  })
  .strict();

/**
 * Herd planning request.
 * - `days`: planning period in days (e.g. 365 for a year of hay).
 * - `hayShareOfDiet`: share of the herd's dry matter, and so of its energy and protein, that
 *   should come from this hay (1 = hay only; pasture or feed supply the rest).
 * - `lot`: optional; with it the plan converts dry matter to as-fed tons and bales and checks coverage.
 * - `forageFloorPctBw`: least forage DM a day, % of body weight (default 1.5, NRC 2007; 1.0–2.0 accepted,
 *   see FORAGE_FLOOR_PCT_BW). The hay's share of it is the least hay DM any purchase plan may buy.
 */
export const HerdNeedsRequestSchema = z
  .object({
    groups: z.array(HorseGroupSchema).min(1, 'add at least one group of horses').max(50, 'at most 50 groups'),
    days: z.number().int('days must be a whole number').min(1, 'days must be at least 1').max(3660, 'days must be at most 3660 (10 years)'),
    feedingMethod: FeedingMethodSchema,
    hayShareOfDiet: z.number().min(0, 'hayShareOfDiet must be between 0 and 1').max(1, 'hayShareOfDiet must be between 0 and 1'),
    lot: HayLotSchema.optional(),
    forageFloorPctBw: z
      .number({ error: 'forageFloorPctBw must be a number, % of body weight' })
      .min(FORAGE_FLOOR_PCT_BW.min, `forageFloorPctBw must be at least ${FORAGE_FLOOR_PCT_BW.min} % of body weight (below that only under veterinary supervision)`)
      .max(FORAGE_FLOOR_PCT_BW.max, `forageFloorPctBw must be at most ${FORAGE_FLOOR_PCT_BW.max} % of body weight (the typical intake)`)
      .default(FORAGE_FLOOR_PCT_BW.default),
  })
  .strict()
  .superRefine((request, ctx) => {
    // Each group must also be a valid requirements request (weight range, age for growing horses).
    request.groups.forEach((group, index) => {
      const result = RequirementsRequestSchema.safeParse(toRequirementsRequest(group));
      if (result.success) return;
      for (const issue of result.error.issues) {
        const field = issue.path[0] === 'bodyWeightKg' ? 'bodyWeight' : issue.path[0];
        ctx.addIssue({
          code: 'custom',
          path: ['groups', index, ...(field === undefined ? [] : [field])],
          message: group.weightUnit === 'lb' && field === 'bodyWeight' ? `${issue.message} (entered ${group.bodyWeight} lb)` : issue.message,
        });
      }
    });
  });

export type HorseGroup = z.infer<typeof HorseGroupSchema>;
export type HayLot = z.infer<typeof HayLotSchema>;
export type HerdNeedsRequest = z.input<typeof HerdNeedsRequestSchema>;

/** Needs of one group, per day, for all its horses together. Dry matter (DM) in kg DM. */
export interface GroupNeeds {
  readonly count: number;
  readonly class: HorseGroup['class'];
  readonly bodyWeightKg: number;
  /** Requirements of one horse in the group. */
  readonly perHorse: HorseRequirements;
  /** DE, Mcal/day, whole group. */
  readonly deMcalPerDay: number;
  /** Crude protein, g/day, whole group. */
  readonly crudeProteinGPerDay: number;
  /** Typical DM intake, kg DM/day, whole group. */
  readonly dmiKgPerDay: number;
  /** Maximum DM intake, kg DM/day, whole group. */
  readonly dmiMaxKgPerDay: number;
  /** Hay DM to feed, kg DM/day: typical intake × hay share. */
  readonly hayDmKgPerDay: number;
}

/** Herd totals per day, and over the whole period. */
export interface HerdTotals {
  readonly deMcalPerDay: number;
  readonly crudeProteinGPerDay: number;
  readonly dmiKgPerDay: number;
  readonly dmiMinKgPerDay: number;
  readonly dmiMaxKgPerDay: number;
  readonly hayDmKgPerDay: number;
  /** Forage floor, % of body weight as DM a day (as requested, default 1.5). */
  readonly forageFloorPctBw: number;
  /** Least hay DM a day: forage floor × body weight × hay share, kg DM/day, whole herd. */
  readonly hayDmFloorKgPerDay: number;
  readonly period: {
    readonly days: number;
    /** DE the whole diet must supply, Mcal. */
    readonly deMcal: number;
    /** Crude protein the whole diet must supply, kg. */
    readonly crudeProteinKg: number;
    /** DE this hay should supply (hay share applied), Mcal. */
    readonly deFromHayMcal: number;
    /** Crude protein this hay should supply (hay share applied), kg. */
    readonly crudeProteinFromHayKg: number;
    /** Hay DM eaten at typical intake, kg DM. */
    readonly hayDmKg: number;
    /** Most hay DM the horses can eat (maximum intake × hay share), kg DM. */
    readonly hayDmMaxKg: number;
    /** Least hay DM the horses should eat (forage floor × hay share), kg DM. */
    readonly hayDmFloorKg: number;
  };
}

/** What one lot means for this herd: as-fed quantities, purchase with waste, and nutrient coverage. */
export interface LotCoverage {
  /** Hay to feed, kg as-fed per day (before waste). */
  readonly asFedHayKgPerDay: number;
  /** Hay to feed, lb as-fed per day (before waste). */
  readonly asFedHayLbPerDay: number;
  /** Hay eaten over the period, short tons as-fed. */
  readonly eatenTons: number;
  /** Hay to buy including waste, short tons as-fed. */
  readonly purchaseTons: number;
  /** Whole bales to buy (rounded up). */
  readonly bales: number;
  /** DE this hay supplies at the planned intake, Mcal/day. */
  readonly deFromHayMcalPerDay: number;
  /** DE the hay should supply (hay share × herd need), Mcal/day. */
  readonly deNeededFromHayMcalPerDay: number;
  /** Missing DE, Mcal/day (0 when covered). */
  readonly deShortfallMcalPerDay: number;
  readonly coversEnergy: boolean;
  /** Crude protein this hay supplies at the planned intake, g/day. */
  readonly crudeProteinFromHayGPerDay: number;
  /** Crude protein the hay should supply (hay share × herd need), g/day. */
  readonly crudeProteinNeededFromHayGPerDay: number;
  /** Missing crude protein, g/day (0 when covered). */
  readonly crudeProteinShortfallGPerDay: number;
  readonly coversProtein: boolean;
  /** Hay DM per day that would meet the energy share on its own, kg DM/day. */
  readonly hayDmForEnergyKgPerDay: number;
  /** Whether that amount is within the herd's maximum intake (× hay share): could feeding more fix an energy gap? */
  readonly energyReachableWithinIntake: boolean;
}

export interface HerdNeedsPlan {
  readonly groups: readonly GroupNeeds[];
  readonly totals: HerdTotals;
  readonly feedingMethod: FeedingMethod;
  readonly waste: WasteAllowance;
  readonly hayShareOfDiet: number;
  readonly lot?: LotCoverage;
}

function toRequirementsRequest(group: HorseGroup) {
  const bodyWeightKg = group.weightUnit === 'kg' ? group.bodyWeight : lbToKg(group.bodyWeight);
  return {
    bodyWeightKg,
    class: group.class,
    ...(group.ageMonths === undefined ? {} : { ageMonths: group.ageMonths }),
    ...(group.month === undefined ? {} : { month: group.month }),
  };
}

/**
 * Plans a herd's hay: daily energy, protein and dry-matter needs per group and in total (NRC 2007,
 * see `horseRequirements`), the hay dry matter to feed (typical intake × hay share), and — given a
 * lot — the as-fed hay per day, tons and whole bales to buy with the feeding method's waste, and
 * whether that lot alone covers the hay share of energy and protein.
 *
 * Validates with {@link HerdNeedsRequestSchema}; throws `ZodError` on bad input.
 */
export function planHerdNeeds(input: HerdNeedsRequest): HerdNeedsPlan {
  const request = HerdNeedsRequestSchema.parse(input);
  const share = request.hayShareOfDiet;

  const groups: GroupNeeds[] = request.groups.map((group) => {
    const requirementsRequest = toRequirementsRequest(group);
    const perHorse = horseRequirements(requirementsRequest);
    return {
      count: group.count,
      class: group.class,
      bodyWeightKg: requirementsRequest.bodyWeightKg,
      perHorse,
      deMcalPerDay: perHorse.deMcalPerDay * group.count,
      crudeProteinGPerDay: perHorse.crudeProteinGPerDay * group.count,
      dmiKgPerDay: perHorse.dmiKgPerDay * group.count,
      dmiMaxKgPerDay: perHorse.dmiMaxKgPerDay * group.count,
      hayDmKgPerDay: perHorse.dmiKgPerDay * group.count * share,
    };
  });

  const sum = (pick: (g: GroupNeeds) => number): number => groups.reduce((total, g) => total + pick(g), 0);
  const deMcalPerDay = sum((g) => g.deMcalPerDay);
  const crudeProteinGPerDay = sum((g) => g.crudeProteinGPerDay);
  const dmiMaxKgPerDay = sum((g) => g.dmiMaxKgPerDay);
  const hayDmKgPerDay = sum((g) => g.hayDmKgPerDay);
  const hayDmFloorKgPerDay = sum((g) => g.bodyWeightKg * g.count) * (request.forageFloorPctBw / 100) * share;
  const days = request.days;

  const totals: HerdTotals = {
    deMcalPerDay,
    crudeProteinGPerDay,
    dmiKgPerDay: sum((g) => g.dmiKgPerDay),
    dmiMinKgPerDay: sum((g) => g.perHorse.dmiMinKgPerDay * g.count),
    dmiMaxKgPerDay,
    hayDmKgPerDay,
    forageFloorPctBw: request.forageFloorPctBw,
    hayDmFloorKgPerDay,
    period: {
      days,
      deMcal: deMcalPerDay * days,
      crudeProteinKg: (crudeProteinGPerDay * days) / 1000,
      deFromHayMcal: deMcalPerDay * share * days,
      crudeProteinFromHayKg: (crudeProteinGPerDay * share * days) / 1000,
      hayDmKg: hayDmKgPerDay * days,
      hayDmMaxKg: dmiMaxKgPerDay * share * days,
      hayDmFloorKg: hayDmFloorKgPerDay * days,
    },
  };

  const waste = WASTE_ALLOWANCES[request.feedingMethod];
  const base = { groups, totals, feedingMethod: request.feedingMethod, waste, hayShareOfDiet: share };
  return request.lot === undefined ? base : { ...base, lot: lotCoverage(request.lot, totals, share, waste.wasteFraction) };
}

function lotCoverage(lot: HayLot, totals: HerdTotals, share: number, wasteFraction: number): LotCoverage {
  const dmFraction = lot.dryMatterPct / 100;
  const asFedHayKgPerDay = totals.hayDmKgPerDay / dmFraction;
  const asFedHayLbPerDay = asFedHayKgPerDay * LB_PER_KG;
  const purchase = hayPurchase({
    eatenLbAsFed: asFedHayLbPerDay * totals.period.days,
    wasteFraction,
    baleWeightLb: lot.baleWeightLb,
  });

  const deFromHayMcalPerDay = totals.hayDmKgPerDay * lot.deMcalPerKgDm;
  const deNeededFromHayMcalPerDay = totals.deMcalPerDay * share;
  const crudeProteinFromHayGPerDay = totals.hayDmKgPerDay * lot.crudeProteinPctDm * 10; // % of kg → g
  const crudeProteinNeededFromHayGPerDay = totals.crudeProteinGPerDay * share;
  const hayDmForEnergyKgPerDay = deNeededFromHayMcalPerDay / lot.deMcalPerKgDm;

  return {
    asFedHayKgPerDay,
    asFedHayLbPerDay,
    eatenTons: purchase.eatenTons,
    purchaseTons: purchase.purchaseTons,
    bales: purchase.bales,
    deFromHayMcalPerDay,
    deNeededFromHayMcalPerDay,
    deShortfallMcalPerDay: Math.max(0, deNeededFromHayMcalPerDay - deFromHayMcalPerDay),
    coversEnergy: deFromHayMcalPerDay >= deNeededFromHayMcalPerDay,
    crudeProteinFromHayGPerDay,
    crudeProteinNeededFromHayGPerDay,
    crudeProteinShortfallGPerDay: Math.max(0, crudeProteinNeededFromHayGPerDay - crudeProteinFromHayGPerDay),
    coversProtein: crudeProteinFromHayGPerDay >= crudeProteinNeededFromHayGPerDay,
    hayDmForEnergyKgPerDay,
    energyReachableWithinIntake: hayDmForEnergyKgPerDay <= totals.dmiMaxKgPerDay * share,
  };
}
