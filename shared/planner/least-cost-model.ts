/**
 * Solver model of the least-cost plan (mixed-integer, solved with yalps):
 *
 *   minimise   Σ price_i·t_i + Σ freightPerLoad_i·L_i
 *   subject to Σ t_i·dm_i·DE_i ≥ DE need            (energy eaten, Mcal)
 *              Σ t_i·dm_i·CP_i ≥ CP need            (crude protein eaten, kg)
 *              Σ t_i·dm_i      ≥ forage floor       (least hay dry matter the horses must eat, kg DM)
 *              Σ t_i·dm_i      ≤ max DM intake      (what the horses can eat, kg DM)
 *              t_i ≤ tonsPerLoad·L_i, L_i integer   (freight charged per whole load)
 *              minOrder_i·y_i ≤ t_i ≤ stock_i·y_i, y_i binary (buy nothing, or at least the minimum)
 *
 * where t_i is short tons as-fed bought from lot i and dm_i is the kg of dry matter eaten per ton
 * bought (907.2 kg × DM % × (1 − waste)). Lots without a minimum order skip y_i; lots with free
 * freight skip L_i. Whole-load freight is a fixed charge whose LP relaxation is weak, so 20–40 lots
 * can take up to a second; `freightModel: 'per-ton'` spreads freight per ton at full loads instead.
 */

import type { Model, Solution } from 'yalps';
import { deliveredPrice } from '../pricing/delivered-price';
import { goodsCents } from '../pricing/order-total';
import { balesForTons, balesToTons, balesWithinTons } from '../units/bales';
import { freightPerLoadCents, loadsForTons } from '../pricing/freight';
import { type Cents, roundCents } from '../units/money';
import { KG_PER_SHORT_TON } from '../units/mass';
import { ceilTo } from '../units/rounding';
import type { FreightModel, LeastCostPlan, ParsedCandidateLot, ParsedLeastCostRequest, PlanLine } from './least-cost-contract';

type ParsedRequest = ParsedLeastCostRequest;
type Lot = ParsedCandidateLot;

/** Per-lot figures per short ton bought, after waste. */
export interface LotYield {
  readonly lot: Lot;
  readonly dmKgPerTon: number;
  readonly deMcalPerTon: number;
  readonly cpKgPerTon: number;
  readonly freightPerLoadCents: Cents;
  /** Delivered cost per ton if hauled in full loads, cents. */
  readonly fullLoadDeliveredPerTonCents: number;
}

/**
 * Herd-plan totals as least-cost needs: the hay share of energy and protein over the period and

/** Raw tons per lot, by lot index, from a solver solution. */
export function tonsFrom(solution: Solution, lotCount: number): number[] {
  const values = new Map(solution.variables);
  return Array.from({ length: lotCount }, (_, i) => values.get(`tons:${i}`) ?? 0);
}

export function lotYield(lot: Lot, request: ParsedRequest): LotYield {
  const dmKgPerTon = KG_PER_SHORT_TON * (lot.dryMatterPct / 100) * (1 - request.wasteFraction);
  const perLoad = freightPerLoadCents(lot.freightCentsPerLoadedMile, lot.distanceMi);
  return {
    lot,
    dmKgPerTon,
    deMcalPerTon: dmKgPerTon * lot.deMcalPerKgDm,
    cpKgPerTon: (dmKgPerTon * lot.crudeProteinPctDm) / 100,
    freightPerLoadCents: perLoad,
    fullLoadDeliveredPerTonCents: lot.pricePerTonCents + perLoad / request.tonsPerLoad,
  };
}

export function buildModel(yields: readonly LotYield[], request: ParsedRequest, freightModel: FreightModel): Model {
  const constraints = new Map<string, { min?: number; max?: number }>([
    ['de', { min: request.needs.deMcal }],
    ['cp', { min: request.needs.crudeProteinKg }],
    ['dm', { min: request.needs.minDryMatterKg, max: request.needs.maxDryMatterKg }],
  ]);
  const variables = new Map<string, Map<string, number>>();
  const integers = new Set<string>();
  const binaries = new Set<string>();
  const { tonsPerLoad } = request;

  yields.forEach((y, i) => {
    const perLoad = freightModel === 'per-load' && y.freightPerLoadCents > 0;
    const tons = new Map<string, number>([
      ['cost', y.lot.pricePerTonCents + (freightModel === 'per-ton' ? y.freightPerLoadCents / tonsPerLoad : 0)],
      ['de', y.deMcalPerTon],
      ['cp', y.cpKgPerTon],
      ['dm', y.dmKgPerTon],
      [`stock:${i}`, 1],
    ]);
    variables.set(`tons:${i}`, tons);

    if (y.lot.minOrderTons > 0) {
      // t ≤ stock·y and t ≥ min·y: either nothing, or between the minimum and the stock.
      constraints.set(`stock:${i}`, { max: 0 });
      constraints.set(`min:${i}`, { min: 0 });
      tons.set(`min:${i}`, 1);
      variables.set(`buy:${i}`, new Map([[`stock:${i}`, -y.lot.tonsAvailable], [`min:${i}`, -y.lot.minOrderTons]]));
      binaries.add(`buy:${i}`);
    } else {
      constraints.set(`stock:${i}`, { max: y.lot.tonsAvailable });
    }

    if (perLoad) {
      // t − tonsPerLoad·L ≤ 0, L a whole number of loads (bounded by the stock's loads).
      constraints.set(`truck:${i}`, { max: 0 });
      constraints.set(`loadcap:${i}`, { max: loadsForTons(y.lot.tonsAvailable, tonsPerLoad) });
      tons.set(`truck:${i}`, 1);
      variables.set(`loads:${i}`, new Map([['cost', y.freightPerLoadCents], [`truck:${i}`, -tonsPerLoad], [`loadcap:${i}`, 1]]));
      integers.add(`loads:${i}`);
    }
  });

  return { direction: 'minimize', objective: 'cost', constraints, variables, integers, binaries };
}

export interface PricedLines {
  readonly chosen: readonly { y: LotYield; line: PlanLine }[];
  readonly totalCostCents: Cents;
  /** What the bought hay supplies as eaten (whole bales, or tons rounded up). */
  readonly supplied: LeastCostPlan['supplied'];
  /** What the solver's exact tons supply, before rounding to what can be bought: shows which need binds. */
  readonly solved: LeastCostPlan['supplied'];
}

/** What the buyer buys of a lot for the solver's raw tons: whole bales when the bale weight is known, else tons to 0.001 t. */
function purchase(lot: Lot, raw: number): { tons: number; bales?: number } {
  if (lot.avgBaleWeightLb === undefined) {
    // Round up so rounding never leaves a shortfall; never above the stock.
    return { tons: Math.min(lot.tonsAvailable, ceilTo(raw - 1e-9, 3)) };
  }
  const bales = Math.min(balesWithinTons(lot.tonsAvailable, lot.avgBaleWeightLb), balesForTons(Math.max(0, raw - 1e-9), lot.avgBaleWeightLb));
  return { bales, tons: balesToTons(bales, lot.avgBaleWeightLb) };
}

/**
 * Turns raw solver tons into plan lines: whole bales (or tons rounded up to 0.001 t), the hay priced as an
 * order for them is priced (`goodsCents`), freight per whole load or pro rata.
 */
export function priceLines(yields: readonly LotYield[], rawTons: readonly number[], request: ParsedRequest, freightModel: FreightModel): PricedLines {
  const chosen: { y: LotYield; line: PlanLine }[] = [];
  const supplied = { deMcal: 0, crudeProteinKg: 0, dryMatterKg: 0 };
  const solved = { deMcal: 0, crudeProteinKg: 0, dryMatterKg: 0 };
  yields.forEach((y, i) => {
    const raw = rawTons[i] ?? 0;
    if (raw <= 1e-6) return;
    const { tons, bales } = purchase(y.lot, raw);
    if (tons <= 0) return;
    const price = deliveredPrice({
      pricePerTonCents: y.lot.pricePerTonCents,
      tons,
      freightCentsPerLoadedMile: y.lot.freightCentsPerLoadedMile,
      distanceMi: y.lot.distanceMi,
      tonsPerLoad: request.tonsPerLoad,
    });
    const hayCents =
      bales === undefined
        ? price.hayCents
        : goodsCents({ pricingUnit: y.lot.pricingUnit, priceCentsPerTon: y.lot.pricePerTonCents, priceCentsPerBale: y.lot.priceCentsPerBale, avgBaleWeightLb: y.lot.avgBaleWeightLb! }, bales);
    const freightCents = freightModel === 'per-load' ? price.freightCents : roundCents((tons * y.freightPerLoadCents) / request.tonsPerLoad);
    chosen.push({
      y,
      line: { lotId: y.lot.lotId, ...(bales === undefined ? {} : { bales }), tons, loads: price.loads, hayCents, freightCents, costCents: hayCents + freightCents },
    });
    for (const [sum, t] of [[supplied, tons], [solved, raw]] as const) {
      sum.deMcal += t * y.deMcalPerTon;
      sum.crudeProteinKg += t * y.cpKgPerTon;
      sum.dryMatterKg += t * y.dmKgPerTon;
    }
  });
  return { chosen, totalCostCents: chosen.reduce((sum, c) => sum + c.line.costCents, 0), supplied, solved };
}
