/**
 * What a buyer pays for one order: hay + freight + platform fee, all whole cents.
 */
import { balesForTons, balesToTons } from '../units/bales';
import { LB_PER_SHORT_TON } from '../units/mass';
import { type Cents, roundCents } from '../units/money';
import { DEFAULT_TONS_PER_LOAD, freightPerLoadCents } from './freight';
import type { DeliveryMethod } from '../contracts/enums';

/** The lot's terms that decide a price. */
export interface LotTerms {
  /** 'ton': the price is per short ton as-fed and the order settles on the scale ticket; 'bale': per bale counted. */
  readonly pricingUnit: 'ton' | 'bale';
  readonly priceCentsPerTon: Cents;
  readonly priceCentsPerBale: Cents | null;
  readonly avgBaleWeightLb: number;
  readonly minOrderTons: number;
  readonly balesAvailable: number;
  /** Grower's freight rate, cents per loaded mile; null when the grower does not deliver. */
  readonly freightCentsPerLoadedMile: number | null;
}

/** What one truck or trailer of the grower carries; a load is full by weight or by count, whichever comes first. */
export interface TruckCapacity {
  readonly tonsPerLoad: number;
  readonly balesPerLoad: number | null;
}

export interface OrderRequest {
  readonly bales: number;
  readonly method: DeliveryMethod;
  /** Loaded (one-way) miles from the farm, an estimate; required for delivery. */
  readonly distanceMi: number | null;
}

export interface OrderTotal {
  readonly bales: number;
  readonly tons: number;
  readonly goodsCents: Cents;
  readonly loads: number;
  readonly freightCents: Cents;
  readonly platformFeeCents: Cents;
  readonly totalCents: Cents;
}

export type OrderProblem =
  | { readonly code: 'below_minimum'; readonly message: string; readonly minBales: number }
  | { readonly code: 'not_enough_bales'; readonly message: string; readonly balesAvailable: number }
  | { readonly code: 'no_delivery'; readonly message: string }
  | { readonly code: 'no_distance'; readonly message: string };

/** The fewest bales that meet the lot's minimum order (at least one). */
export function minimumBales(terms: Pick<LotTerms, 'minOrderTons' | 'avgBaleWeightLb'>): number {
  return Math.max(1, balesForTons(terms.minOrderTons, terms.avgBaleWeightLb));
}

/** Hay cost of `bales`: counted at the bale price when sold by the bale, else weighed at the ton price. */
export function goodsCents(terms: Pick<LotTerms, 'pricingUnit' | 'priceCentsPerTon' | 'priceCentsPerBale' | 'avgBaleWeightLb'>, bales: number): Cents {
  if (terms.pricingUnit === 'bale' && terms.priceCentsPerBale !== null) return terms.priceCentsPerBale * bales;
  return roundCents(terms.priceCentsPerTon * balesToTons(bales, terms.avgBaleWeightLb));
}

/**
 * The platform's fee on the hay (never on freight) at `feeBps` basis points (300 = 3 %). The rate is an
 * admin setting read when the order is placed and stored with it, so a later change never reprices an order.
 */
export function platformFeeCents(goods: Cents, feeBps: number): Cents {
  return roundCents((goods * feeBps) / 10_000);
}

/** A fee rate in words: 300 → "3 %", 250 → "2.5 %". */
export function feeRateLabel(feeBps: number): string {
  return `${(feeBps / 100).toLocaleString('en-US', { maximumFractionDigits: 2 })} %`;
}

/** Whole loads for an order: by weight, and by bale count when the truck has one. */
export function loadsFor(bales: number, tons: number, truck: TruckCapacity): number {
  const byWeight = Math.ceil(Number((tons / truck.tonsPerLoad).toPrecision(12)));
  const byCount = truck.balesPerLoad ? Math.ceil(bales / truck.balesPerLoad) : 0;
  return Math.max(1, byWeight, byCount);
}

/** Bales in one full load: as many as the weight allows, fewer when the truck fills by count first (at least 1). */
export function balesPerLoad(truck: TruckCapacity, avgBaleWeightLb: number): number {
  const byWeight = Math.floor(Number(((truck.tonsPerLoad * LB_PER_SHORT_TON) / avgBaleWeightLb).toPrecision(12)));
  return Math.max(1, truck.balesPerLoad ? Math.min(byWeight, truck.balesPerLoad) : byWeight);
}

export const DEFAULT_TRUCK: TruckCapacity = { tonsPerLoad: DEFAULT_TONS_PER_LOAD, balesPerLoad: null };

/** Checks an order against the lot's terms; returns the first problem, or null when it can be placed. */
export function orderProblem(terms: LotTerms, request: OrderRequest): OrderProblem | null {
  const minBales = minimumBales(terms);
  if (request.bales > terms.balesAvailable) {
    return {
      code: 'not_enough_bales',
      message: terms.balesAvailable === 0 ? 'This lot has no bales left.' : `Only ${terms.balesAvailable} bales are left in this lot.`,
      balesAvailable: terms.balesAvailable,
    };
  }
  if (request.bales < minBales && request.bales < terms.balesAvailable) {
    return { code: 'below_minimum', message: `The grower sells at least ${minBales} bales (${terms.minOrderTons} t) from this lot.`, minBales };
  }
  if (request.method === 'delivery') {
    if (terms.freightCentsPerLoadedMile === null) return { code: 'no_delivery', message: 'The grower does not deliver this lot; choose pickup at the farm.' };
    if (request.distanceMi === null) return { code: 'no_distance', message: 'Give the delivery ZIP code so the freight can be worked out.' };
  }
  return null;
}

/**
 * The order's figures. Freight = rate per loaded mile × miles × whole loads (domain brief §11); the
 * platform fee is charged on the hay only. The last bales of a lot may be bought below the minimum.
 */
export function orderTotal(terms: LotTerms, request: OrderRequest, feeBps: number, truck: TruckCapacity = DEFAULT_TRUCK): OrderTotal {
  const tons = balesToTons(request.bales, terms.avgBaleWeightLb);
  const goods = goodsCents(terms, request.bales);
  const delivering = request.method === 'delivery' && terms.freightCentsPerLoadedMile !== null && request.distanceMi !== null;
  const loads = loadsFor(request.bales, tons, truck);
  const freight = delivering ? freightPerLoadCents(terms.freightCentsPerLoadedMile!, request.distanceMi!) * loads : 0;
  const fee = platformFeeCents(goods, feeBps);
  return { bales: request.bales, tons, goodsCents: goods, loads, freightCents: freight, platformFeeCents: fee, totalCents: goods + freight + fee };
}

/** One lot in a grower's order: its terms and the bales taken from it. */
export interface OrderLineRequest {
  readonly terms: LotTerms;
  readonly bales: number;
}

export interface GrowerOrderTotal extends OrderTotal {
  /** Per line, in the order given: bales, tons and hay cost. */
  readonly lines: readonly { readonly bales: number; readonly tons: number; readonly goodsCents: Cents }[];
}

/**
 * One grower's order of several lots: one truck trip, one payment. The hay is each line's cost added up;
 * the loads are counted on the combined bales and tons (the buyer's gain from buying one grower's lots
 * together); freight is those whole loads at the grower's rate per loaded mile (the highest rate among
 * the lots, so no lot travels below its own rate); the platform fee is on the hay total.
 */
export function growerOrderTotal(lines: readonly OrderLineRequest[], request: Omit<OrderRequest, 'bales'>, feeBps: number, truck: TruckCapacity = DEFAULT_TRUCK): GrowerOrderTotal {
  if (lines.length === 0) throw new RangeError('An order holds at least one line.');
  const priced = lines.map((l) => ({ bales: l.bales, tons: balesToTons(l.bales, l.terms.avgBaleWeightLb), goodsCents: goodsCents(l.terms, l.bales) }));
  const bales = priced.reduce((s, l) => s + l.bales, 0);
  const tons = priced.reduce((s, l) => s + l.tons, 0);
  const goods = priced.reduce((s, l) => s + l.goodsCents, 0);
  const rates = lines.map((l) => l.terms.freightCentsPerLoadedMile);
  const delivering = request.method === 'delivery' && request.distanceMi !== null && rates.every((r) => r !== null);
  const loads = loadsFor(bales, tons, truck);
  const freight = delivering ? freightPerLoadCents(Math.max(...(rates as number[])), request.distanceMi!) * loads : 0;
  const fee = platformFeeCents(goods, feeBps);
  return { lines: priced, bales, tons, goodsCents: goods, loads, freightCents: freight, platformFeeCents: fee, totalCents: goods + freight + fee };
}

/** A line of a paid order as the scale ticket settles it. */
export interface WeighedLine {
  readonly pricingUnit: 'ton' | 'bale';
  readonly priceCentsPerTon: Cents;
  readonly paidGoodsCents: Cents;
  /** Net tons on the ticket for this line; null when not weighed. */
  readonly weighedTons: number | null;
}

/**
 * Settling an order on the scale ticket, line by line: a by-the-ton line weighed short gives back the hay
 * on its missing tons, and the fee (charged on the order's hay total) comes back on the hay not delivered.
 * More tons never cost the buyer more, on any line. Bale-priced lines were counted, not weighed, so they
 * never settle on weight; unweighed lines count as delivered in full.
 */
export function scaleTicketRefundCents(input: {
  readonly lines: readonly WeighedLine[];
  readonly paidFeeCents: Cents;
  /** The fee rate the order was sold at (stored on the order). */
  readonly feeBps: number;
}): Cents {
  let paidGoods = 0;
  let deliveredGoods = 0;
  for (const line of input.lines) {
    paidGoods += line.paidGoodsCents;
    if (line.pricingUnit !== 'ton' || line.weighedTons === null) {
      deliveredGoods += line.paidGoodsCents;
      continue;
    }
    if (!(line.weighedTons > 0) || !Number.isFinite(line.weighedTons)) throw new RangeError(`weighedTons must be positive; got ${line.weighedTons}`);
    deliveredGoods += Math.min(line.paidGoodsCents, roundCents(line.priceCentsPerTon * line.weighedTons));
  }
  const deliveredFee = Math.min(input.paidFeeCents, platformFeeCents(deliveredGoods, input.feeBps));
  return paidGoods - deliveredGoods + (input.paidFeeCents - deliveredFee);
}
