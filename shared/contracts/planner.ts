import { z } from 'zod';
// Types only from least-cost-plan, so the browser bundle never pulls in the solver.
import type { LeastCostPlan } from '../planner/least-cost-contract';
import { HerdNeedsRequestSchema, type HerdNeedsPlan } from '../planner/herd-needs';

/**
 * POST /api/planner/purchase-plan — the herd (as for the herd planner, without a lot) and where the
 * hay goes. Candidate lots are the listed lots with a freight rate, within the grower's delivery radius
 * and `maxDistanceMi` of the ZIP, nearest first.
 */
export const PurchasePlanRequestSchema = z
  .object({
    herd: HerdNeedsRequestSchema,
    zip: z.string().regex(/^\d{5}$/, 'ZIP code must be 5 digits.'),
    maxDistanceMi: z.number().positive('maxDistanceMi must be more than 0').max(1500, 'maxDistanceMi must be at most 1500').default(300),
    freightModel: z.enum(['per-load', 'per-ton']).default('per-load'),
  })
  .strict();
export type PurchasePlanRequest = z.input<typeof PurchasePlanRequestSchema>;

/** A lot the plan could buy from. */
export interface PlanCandidate {
  lotId: number;
  title: string;
  farmName: string;
  distanceMi: number;
  priceCentsPerTon: number;
  pricingUnit: 'ton' | 'bale';
  priceCentsPerBale: number | null;
  freightCentsPerLoadedMile: number;
  tonsAvailable: number;
  balesAvailable: number;
  avgBaleWeightLb: number;
  minOrderTons: number;
  dryMatterPct: number;
  crudeProteinPct: number;
  deMcalPerKgDm: number;
}

/** One lot to buy, ready for the cart. */
export interface PlanPurchaseLine {
  lotId: number;
  title: string;
  farmName: string;
  tons: number;
  /** Whole bales to buy, never more than are available; `tons` is their weight and `hayCents` their order price. */
  bales: number;
  loads: number;
  hayCents: number;
  freightCents: number;
  costCents: number;
}

export interface PurchasePlanResponse {
  origin: { zip: string; city: string; state: string };
  herd: HerdNeedsPlan;
  candidates: PlanCandidate[];
  plan: LeastCostPlan;
  lines: PlanPurchaseLine[];
}
