import { and, asc, eq, isNotNull, sql } from 'drizzle-orm';
import type { z } from 'zod';
import type { PlanCandidate, PlanPurchaseLine, PurchasePlanRequestSchema, PurchasePlanResponse } from '@shared/contracts/planner';
import { leastCostPlan, needsFromHerdPlan, planHerdNeeds } from '@shared/planner';
import type { Db } from '../../db/client';
import { farms, labAnalyses, lots } from '../../db/schema';
import { farmDistanceSql, farmWithinSql, locateZip, type ZipPlace } from '../geo/geo';
import { balesToTons } from '@shared/units';

/** More candidates than this slows the whole-load search without changing realistic plans. */
export const MAX_PLAN_CANDIDATES = 30;

type PurchasePlanRequest = z.infer<typeof PurchasePlanRequestSchema>;

/** Listed lots in stock, with a freight rate, that the grower delivers to the ZIP: nearest first. */
export async function loadPlanCandidates(db: Db, zip: string, maxDistanceMi: number): Promise<{ origin: ZipPlace; candidates: PlanCandidate[] }> {
  const origin = locateZip(zip);
  const distance = farmDistanceSql(origin);
  const rows = await db
    .select({
      lotId: lots.id,
      title: lots.title,
      farmName: farms.name,
      distanceMi: distance,
      priceCentsPerTon: lots.priceCentsPerTon,
      pricingUnit: lots.pricingUnit,
      priceCentsPerBale: lots.priceCentsPerBale,
      freightCentsPerLoadedMile: lots.freightCentsPerLoadedMile,
      balesAvailable: lots.balesAvailable,
      avgBaleWeightLb: lots.avgBaleWeightLb,
      minOrderTons: lots.minOrderTons,
      dryMatterPct: labAnalyses.dryMatterPct,
      crudeProteinPct: labAnalyses.crudeProteinPct,
      deMcalPerKgDm: labAnalyses.deMcalPerKgDm,
    })
    .from(lots)
    .innerJoin(farms, eq(farms.id, lots.farmId))
    .innerJoin(labAnalyses, and(eq(labAnalyses.lotId, lots.id), eq(labAnalyses.isCurrent, true)))
    .where(
      and(
        eq(lots.status, 'listed'),
        sql`${lots.balesAvailable} > 0`,
        isNotNull(lots.freightCentsPerLoadedMile),
        farmWithinSql(origin, maxDistanceMi, sql`least(${farms.deliveryRadiusMi}::float8, ${maxDistanceMi}::float8)`),
      ),
    )
    .orderBy(asc(distance), asc(lots.id))
    .limit(MAX_PLAN_CANDIDATES);
  return {
    origin,
    candidates: rows.map((r) => ({
      ...r,
      distanceMi: Number(r.distanceMi),
      freightCentsPerLoadedMile: r.freightCentsPerLoadedMile ?? 0,
      tonsAvailable: balesToTons(r.balesAvailable, r.avgBaleWeightLb),
    })),
  };
}

/** The herd's needs, then the cheapest delivered mix of candidate lots that meets them. */
export async function planPurchase(db: Db, request: PurchasePlanRequest): Promise<PurchasePlanResponse> {
  const { lot: _ignored, ...herdRequest } = request.herd;
  const herd = planHerdNeeds(herdRequest);
  const { origin, candidates } = await loadPlanCandidates(db, request.zip, request.maxDistanceMi);
  const { needs, wasteFraction, forage } = needsFromHerdPlan(herd);
  const key = (id: number) => `#${id}`; // reads as "lot #12" in the plan's sentences
  const plan = leastCostPlan({
    needs,
    wasteFraction,
    forage,
    freightModel: request.freightModel,
    lots: candidates.map((c) => ({
      lotId: key(c.lotId),
      title: c.title,
      pricePerTonCents: c.priceCentsPerTon,
      // Whole bales, priced as the order quote prices them.
      avgBaleWeightLb: c.avgBaleWeightLb,
      pricingUnit: c.pricingUnit,
      priceCentsPerBale: c.priceCentsPerBale,
      freightCentsPerLoadedMile: c.freightCentsPerLoadedMile,
      distanceMi: c.distanceMi,
      tonsAvailable: c.tonsAvailable,
      // A grower with less left than the minimum order sells the remainder.
      minOrderTons: Math.min(c.minOrderTons, c.tonsAvailable),
      dryMatterPct: c.dryMatterPct,
      crudeProteinPctDm: c.crudeProteinPct,
      deMcalPerKgDm: c.deMcalPerKgDm,
    })),
  });
  const byKey = new Map(candidates.map((c) => [key(c.lotId), c]));
  const lines: PlanPurchaseLine[] = plan.lines.map((line) => {
    const c = byKey.get(line.lotId)!;
    return {
      lotId: c.lotId,
      title: c.title,
      farmName: c.farmName,
      tons: line.tons,
      bales: line.bales!,
      loads: line.loads,
      hayCents: line.hayCents,
      freightCents: line.freightCents,
      costCents: line.costCents,
    };
  });
  return { origin: { zip: origin.zip, city: origin.city, state: origin.state }, herd, candidates, plan, lines };
}
