/**
 * Contract of the least-cost hay purchase plan: what a caller sends (needs, candidate lots, freight
 * model) and what comes back (lines to buy, what they supply, the explanation). Pure zod + types so the
 * browser can import it without the solver.
 */

import { z } from 'zod';
import { DEFAULT_TONS_PER_LOAD } from '../pricing/freight';
import type { Cents } from '../units/money';


/** What the hay must supply over the whole period, as eaten (after waste). */
export const PlanNeedsSchema = z
  .object({
    /** Digestible energy, Mcal. */
    deMcal: z.number().min(0, 'needs.deMcal cannot be negative'),
    /** Crude protein, kg. */
    crudeProteinKg: z.number().min(0, 'needs.crudeProteinKg cannot be negative'),
    /** Most dry matter the horses can eat, kg DM. */
    maxDryMatterKg: z.number().min(0, 'needs.maxDryMatterKg cannot be negative'),
    /** Least hay dry matter the horses must eat (the forage floor), kg DM; 0 = no floor. */
    minDryMatterKg: z.number().min(0, 'needs.minDryMatterKg cannot be negative').default(0),
  })
  .strict()
  .refine((needs) => needs.minDryMatterKg <= needs.maxDryMatterKg, {
    path: ['minDryMatterKg'],
    message: 'needs.minDryMatterKg (forage floor) cannot exceed needs.maxDryMatterKg',
  });

/** How the needs were set from a herd, so the plan can say how it compares with the herd planner. */
export const ForageBasisSchema = z
  .object({
    /** Forage floor used, % of body weight as DM a day. */
    floorPctBw: z.number().positive(),
    /** Hay DM the herd planner feeds over the period at typical intake (2 % BW for mature horses), kg DM. */
    typicalDryMatterKg: z.number().min(0),
    /** Days in the period. */
    days: z.number().int().positive(),
    /** Body weight of the whole herd, kg. */
    herdBodyWeightKg: z.number().positive(),
  })
  .strict();

/** A lot on offer. Prices are as-fed; nutrients are on a dry-matter basis. */
export const CandidateLotSchema = z
  .object({
    lotId: z.string().min(1, 'lotId is required'),
    /** The lot's title, used to name it in the explanation (else it is named by `lotId`). */
    title: z.string().trim().min(1).max(200).optional(),
    /** Hay price at the farm, whole cents per short ton as-fed. */
    pricePerTonCents: z.number().int('pricePerTonCents must be whole cents').min(0, 'pricePerTonCents cannot be negative'),
    /** Trucking rate, cents per loaded mile. */
    freightCentsPerLoadedMile: z.number().min(0, 'freightCentsPerLoadedMile cannot be negative'),
    /** Loaded miles from the farm to the buyer. */
    distanceMi: z.number().min(0, 'distanceMi cannot be negative'),
    /** Short tons for sale. */
    tonsAvailable: z.number().positive('tonsAvailable must be more than 0'),
    /** Smallest sale the grower accepts, short tons (0 = none). */
    minOrderTons: z.number().min(0, 'minOrderTons cannot be negative').default(0),
    /** Dry matter, % of as-fed weight. */
    dryMatterPct: z.number().gt(0, 'dryMatterPct must be more than 0').max(100, 'dryMatterPct cannot exceed 100'),
    /** Crude protein, % of dry matter. */
    crudeProteinPctDm: z.number().min(0, 'crudeProteinPctDm cannot be negative').max(60, 'crudeProteinPctDm cannot exceed 60'),
    /** Horse digestible energy, Mcal per kg dry matter. */
    deMcalPerKgDm: z.number().min(0, 'deMcalPerKgDm cannot be negative').max(5, 'deMcalPerKgDm cannot exceed 5'),
    /**
     * Average bale weight, lb. When given, the plan buys whole bales (never more than the stock holds) and
     * prices them as an order for those bales is priced (`goodsCents` in shared/pricing); without it, tons.
     */
    avgBaleWeightLb: z.number().positive('avgBaleWeightLb must be more than 0').optional(),
    /** How the grower sells the lot: 'ton' (default) weighs the bales at `pricePerTonCents`; 'bale' counts them at `priceCentsPerBale`. */
    pricingUnit: z.enum(['ton', 'bale']).default('ton'),
    /** Price of one bale, whole cents (lots sold by the bale). */
    priceCentsPerBale: z.number().int('priceCentsPerBale must be whole cents').positive('priceCentsPerBale must be more than 0').nullable().default(null),
  })
  .strict()
  .refine((lot) => lot.minOrderTons <= lot.tonsAvailable, {
    path: ['minOrderTons'],
    message: 'minOrderTons cannot exceed tonsAvailable',
  })
  .refine((lot) => lot.pricingUnit === 'ton' || (lot.priceCentsPerBale !== null && lot.avgBaleWeightLb !== undefined), {
    path: ['priceCentsPerBale'],
    message: 'a lot sold by the bale needs priceCentsPerBale and avgBaleWeightLb',
  });

export const FREIGHT_MODELS = ['per-load', 'per-ton'] as const;

export const LeastCostPlanRequestSchema = z
  .object({
    needs: PlanNeedsSchema,
    lots: z.array(CandidateLotSchema).max(60, 'compare at most 60 lots at once'),
    /** Short tons per truck load (default 24, practice). */
    tonsPerLoad: z.number().positive('tonsPerLoad must be more than 0').default(DEFAULT_TONS_PER_LOAD),
    /** Share of hay bought that is wasted in feeding, 0 ≤ waste < 1 (default 0). */
    wasteFraction: z.number().min(0, 'wasteFraction must be at least 0').lt(1, 'wasteFraction must be below 1').default(0),
    /** 'per-load' (default): whole truck loads. 'per-ton': freight spread per ton, a linear approximation. */
    freightModel: z.enum(FREIGHT_MODELS).default('per-load'),
    /** Optional: the herd figures behind the forage floor, for the explanation. */
    forage: ForageBasisSchema.optional(),
  })
  .strict()
  .superRefine((request, ctx) => {
    const seen = new Set<string>();
    request.lots.forEach((lot, index) => {
      if (seen.has(lot.lotId)) ctx.addIssue({ code: 'custom', path: ['lots', index, 'lotId'], message: `duplicate lotId '${lot.lotId}'` });
      seen.add(lot.lotId);
    });
  });

export type PlanNeeds = z.input<typeof PlanNeedsSchema>;
export type ForageBasis = z.infer<typeof ForageBasisSchema>;
export type CandidateLot = z.input<typeof CandidateLotSchema>;
export type LeastCostPlanRequest = z.input<typeof LeastCostPlanRequestSchema>;
export type FreightModel = (typeof FREIGHT_MODELS)[number];

/** One lot in the plan. */
export interface PlanLine {
  readonly lotId: string;
  /** Whole bales to buy, when the lot's bale weight was given (else absent). */
  readonly bales?: number;
  /** Short tons as-fed to buy: the weight of `bales`, or rounded up to 0.001 t (2 lb) when bales are not known. */
  readonly tons: number;
  /** Truck loads to haul it (counted even when freight is free, e.g. the buyer collects). */
  readonly loads: number;
  /** Hay before freight, whole cents: what an order for `bales` costs (shared/pricing `goodsCents`). */
  readonly hayCents: Cents;
  /** Freight, whole cents (per whole load, or pro rata under the per-ton model). */
  readonly freightCents: Cents;
  /** Hay plus freight, whole cents. */
  readonly costCents: Cents;
}

export interface LeastCostPlan {
  /** False when no combination of the lots meets the needs. */
  readonly feasible: boolean;
  /** Sum of the lines' `costCents`; 0 when infeasible. */
  readonly totalCostCents: Cents;
  readonly lines: readonly PlanLine[];
  /** What the plan's hay supplies as eaten (after waste). */
  readonly supplied: { readonly deMcal: number; readonly crudeProteinKg: number; readonly dryMatterKg: number };
  /** Freight model actually used (may be 'per-ton' after a solver time-out). */
  readonly freightModel: FreightModel;
  /** Plain-English sentences for the buyer. */
  readonly explanation: readonly string[];
}


/** The request after parsing, defaults filled in. */
export type ParsedLeastCostRequest = z.infer<typeof LeastCostPlanRequestSchema>;
/** A candidate lot after parsing. */
export type ParsedCandidateLot = z.infer<typeof CandidateLotSchema>;
