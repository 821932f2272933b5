/**
 * Least-cost hay purchase plan: which candidate lots to buy, and how many tons of each, so the
 * herd's energy and protein needs over a period are met at the lowest delivered cost.
 *
 * Mixed-integer model solved with yalps (branch and cut over a simplex LP):
 *
 *   minimise   Σ price_i·t_i + Σ freightPerLoad_i·L_i
 *   subject to Σ t_i·dm_i·DE_i ≥ DE need            (energy eaten, Mcal)
 *              Σ t_i·dm_i·CP_i ≥ CP need            (crude protein eaten, kg)
 *              Σ t_i·dm_i      ≤ max DM intake      (what the horses can eat, kg DM)
 *              t_i ≤ tonsPerLoad·L_i, L_i integer   (freight charged per whole load)
 *              minOrder_i·y_i ≤ t_i ≤ stock_i·y_i, y_i binary (buy nothing, or at least the minimum)
 *
 * where t_i is short tons as-fed bought from lot i and dm_i is the kg of dry matter eaten per ton
 * bought (907.2 kg × DM % × (1 − waste)). Lots without a minimum order skip y_i; lots with free
 * freight skip L_i. A handful of lots solves in milliseconds; 20–40 lots usually within a second,
 * because whole-load freight is a fixed charge whose LP relaxation is weak. The search has a time
 * limit; when it is reached the plan is the cheaper, at whole-load freight, of the best integer
 * plan found and the linear plan, and the explanation says it may not be the cheapest. Callers
 * can ask for the linear approximation directly with `freightModel: 'per-ton'` (freight spread
 * per ton at full loads, a pure LP apart from minimum orders).
 */

import { solve, type Model, type Solution } from 'yalps';
import { z } from 'zod';
import { deliveredPrice } from '../pricing/delivered-price';
import { DEFAULT_TONS_PER_LOAD, freightPerLoadCents, loadsForTons } from '../pricing/freight';
import { type Cents, formatCents, roundCents } from '../units/money';
import { KG_PER_SHORT_TON } from '../units/mass';
import { ceilTo, formatNumber } from '../units/rounding';
import type { HerdNeedsPlan } from './herd-needs';

/** What the hay must supply over the whole period, as eaten (after waste). */
export const PlanNeedsSchema = z
  .object({
    /** Digestible energy, Mcal. */
    deMcal: z.number().min(0, 'needs.deMcal cannot be negative'),
    /** Crude protein, kg. */
    crudeProteinKg: z.number().min(0, 'needs.crudeProteinKg cannot be negative'),
    /** Most dry matter the horses can eat, kg DM. */
    maxDryMatterKg: z.number().min(0, 'needs.maxDryMatterKg cannot be negative'),
  })
  .strict();

/** A lot on offer. Prices are as-fed; nutrients are on a dry-matter basis. */
export const CandidateLotSchema = z
  .object({
    lotId: z.string().min(1, 'lotId is required'),
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
  })
  .strict()
  .refine((lot) => lot.minOrderTons <= lot.tonsAvailable, {
    path: ['minOrderTons'],
    message: 'minOrderTons cannot exceed tonsAvailable',
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
  })
  .strict()
  .superRefine((request, ctx) => {
    const seen = new Set<string>();
    request.lots.forEach((lot, index) => {
      if (seen.has(lot.lotId)) ctx.addIssue({ code: 'custom', path: ['lots', index, 'lotId'], message: `duplicate lotId '${lot.lotId}'` });
      seen.add(lot.lotId);
    });
  });

export type PlanNeeds = z.infer<typeof PlanNeedsSchema>;
export type CandidateLot = z.input<typeof CandidateLotSchema>;
export type LeastCostPlanRequest = z.input<typeof LeastCostPlanRequestSchema>;
export type FreightModel = (typeof FREIGHT_MODELS)[number];

/** One lot in the plan. */
export interface PlanLine {
  readonly lotId: string;
  /** Short tons as-fed to buy, rounded up to 0.001 t (2 lb). */
  readonly tons: number;
  /** Truck loads to haul it (counted even when freight is free, e.g. the buyer collects). */
  readonly loads: number;
  /** Hay before freight, whole cents. */
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

/** Time limit for the integer search, ms; far above what realistic inputs need. */
const SOLVER_TIMEOUT_MS = 1500;
const CONSULT = 'consult your veterinarian or an equine nutritionist';

type ParsedRequest = z.infer<typeof LeastCostPlanRequestSchema>;
type Lot = z.infer<typeof CandidateLotSchema>;

/** Per-lot figures per short ton bought, after waste. */
interface LotYield {
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
 * the hay share of maximum intake, with the plan's feeding waste.
 */
export function needsFromHerdPlan(plan: HerdNeedsPlan): { needs: PlanNeeds; wasteFraction: number } {
  const period = plan.totals.period;
  return {
    needs: { deMcal: period.deFromHayMcal, crudeProteinKg: period.crudeProteinFromHayKg, maxDryMatterKg: period.hayDmMaxKg },
    wasteFraction: plan.waste.wasteFraction,
  };
}

export interface LeastCostPlanOptions {
  /** Time limit for the whole-load integer search, ms (default 1500). */
  readonly timeoutMs?: number;
}

/**
 * Chooses tons per lot to meet energy and protein at least delivered cost, within stock, minimum
 * orders and the herd's dry-matter intake. Validates with {@link LeastCostPlanRequestSchema}
 * (throws `ZodError`). Returns `feasible: false` with reasons when the lots cannot meet the needs.
 *
 * With whole-load freight, if the integer search reaches its time limit the plan is the cheaper
 * (costed at whole loads) of the best integer plan found and the linear plan, and says so.
 */
export function leastCostPlan(input: LeastCostPlanRequest, options: LeastCostPlanOptions = {}): LeastCostPlan {
  const request = LeastCostPlanRequestSchema.parse(input);
  const yields = request.lots.map((lot) => lotYield(lot, request));
  const { needs } = request;
  const timeout = options.timeoutMs ?? SOLVER_TIMEOUT_MS;

  if (needs.deMcal === 0 && needs.crudeProteinKg === 0) {
    return emptyPlan(true, request.freightModel, ['Nothing needs to be bought: the energy and protein needs are zero.']);
  }

  const solution = solve(buildModel(yields, request, request.freightModel), { timeout });
  if (solution.status === 'optimal') {
    return describePlan(yields, request, request.freightModel, tonsFrom(solution, yields.length), []);
  }
  if (solution.status !== 'timedout') {
    return emptyPlan(false, request.freightModel, explainInfeasible(yields, request, solution));
  }

  // Time limit reached: keep whatever is cheapest at the freight the buyer will actually pay.
  const candidates: number[][] = [];
  if (Number.isFinite(solution.result)) candidates.push(tonsFrom(solution, yields.length));
  if (request.freightModel === 'per-load') {
    const linear = solve(buildModel(yields, request, 'per-ton'), { timeout });
    if (Number.isFinite(linear.result)) candidates.push(tonsFrom(linear, yields.length));
  }
  if (candidates.length === 0) {
    return emptyPlan(false, request.freightModel, [
      'The search for a plan reached its time limit without finding one; try fewer lots.',
      `If the lots should cover the needs, ${CONSULT} to check the figures.`,
    ]);
  }
  const costed = candidates.map((tons) => ({ tons, cost: priceLines(yields, tons, request, request.freightModel).totalCostCents }));
  const best = costed.reduce((a, b) => (b.cost < a.cost ? b : a));
  return describePlan(yields, request, request.freightModel, best.tons, [
    'The search for the cheapest plan reached its time limit; this is the best plan found, possibly not the cheapest.',
  ]);
}

/** Raw tons per lot, by lot index, from a solver solution. */
function tonsFrom(solution: Solution, lotCount: number): number[] {
  const values = new Map(solution.variables);
  return Array.from({ length: lotCount }, (_, i) => values.get(`tons:${i}`) ?? 0);
}

function lotYield(lot: Lot, request: ParsedRequest): LotYield {
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

function buildModel(yields: readonly LotYield[], request: ParsedRequest, freightModel: FreightModel): Model {
  const constraints = new Map<string, { min?: number; max?: number }>([
    ['de', { min: request.needs.deMcal }],
    ['cp', { min: request.needs.crudeProteinKg }],
    ['dm', { max: request.needs.maxDryMatterKg }],
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

interface PricedLines {
  readonly chosen: readonly { y: LotYield; line: PlanLine }[];
  readonly totalCostCents: Cents;
  readonly supplied: LeastCostPlan['supplied'];
}

/** Turns raw solver tons into plan lines: rounded up to 0.001 t, priced with whole-load or pro-rata freight. */
function priceLines(yields: readonly LotYield[], rawTons: readonly number[], request: ParsedRequest, freightModel: FreightModel): PricedLines {
  const chosen: { y: LotYield; line: PlanLine }[] = [];
  const supplied = { deMcal: 0, crudeProteinKg: 0, dryMatterKg: 0 };
  yields.forEach((y, i) => {
    const raw = rawTons[i] ?? 0;
    if (raw <= 1e-6) return;
    // Round up so rounding never leaves a shortfall; never above the stock.
    const tons = Math.min(y.lot.tonsAvailable, ceilTo(raw - 1e-9, 3));
    const price = deliveredPrice({
      pricePerTonCents: y.lot.pricePerTonCents,
      tons,
      freightCentsPerLoadedMile: y.lot.freightCentsPerLoadedMile,
      distanceMi: y.lot.distanceMi,
      tonsPerLoad: request.tonsPerLoad,
    });
    const freightCents = freightModel === 'per-load' ? price.freightCents : roundCents((tons * y.freightPerLoadCents) / request.tonsPerLoad);
    chosen.push({
      y,
      line: { lotId: y.lot.lotId, tons, loads: price.loads, hayCents: price.hayCents, freightCents, costCents: price.hayCents + freightCents },
    });
    supplied.deMcal += tons * y.deMcalPerTon;
    supplied.crudeProteinKg += tons * y.cpKgPerTon;
    supplied.dryMatterKg += tons * y.dmKgPerTon;
  });
  return { chosen, totalCostCents: chosen.reduce((sum, c) => sum + c.line.costCents, 0), supplied };
}

function describePlan(
  yields: readonly LotYield[],
  request: ParsedRequest,
  freightModel: FreightModel,
  rawTons: readonly number[],
  notes: readonly string[],
): LeastCostPlan {
  const { chosen, totalCostCents, supplied } = priceLines(yields, rawTons, request, freightModel);
  const lines = chosen.map((c) => c.line);
  const explanation = [
    ...summarySentences(lines, totalCostCents, supplied, request),
    ...chosen.map(({ y, line }) => lineSentence(y, line, freightModel)),
    ...bindingSentences(supplied, request),
    ...mixSentences(chosen, request),
    ...unusedSentences(yields, chosen, request),
    ...(freightModel === 'per-ton' ? perTonSentences(chosen) : []),
    ...notes,
  ];
  return { feasible: true, totalCostCents, lines, supplied, freightModel, explanation };
}

function emptyPlan(feasible: boolean, freightModel: FreightModel, explanation: string[]): LeastCostPlan {
  return { feasible, totalCostCents: 0, lines: [], supplied: { deMcal: 0, crudeProteinKg: 0, dryMatterKg: 0 }, freightModel, explanation };
}

const tonsText = (tons: number): string => `${formatNumber(tons, 2)} t`;
const lotText = (lotId: string): string => `lot ${lotId}`;

function summarySentences(
  lines: readonly PlanLine[],
  totalCostCents: Cents,
  supplied: LeastCostPlan['supplied'],
  request: ParsedRequest,
): string[] {
  const tons = lines.reduce((sum, l) => sum + l.tons, 0);
  const freight = lines.reduce((sum, l) => sum + l.freightCents, 0);
  const hay = lines.reduce((sum, l) => sum + l.hayCents, 0);
  const { needs } = request;
  const wasteNote = request.wasteFraction > 0 ? ` after ${formatNumber(request.wasteFraction * 100, 0)} % feeding waste` : '';
  return [
    `Buy ${tonsText(tons)} of hay from ${lines.length === 1 ? 'one lot' : `${lines.length} lots`} for ${formatCents(totalCostCents)} delivered (${formatCents(hay)} hay and ${formatCents(freight)} freight).`,
    `Eaten${wasteNote}, it supplies ${formatNumber(supplied.deMcal, 0)} Mcal of digestible energy (need ${formatNumber(needs.deMcal, 0)}) and ${formatNumber(supplied.crudeProteinKg, 0)} kg of crude protein (need ${formatNumber(needs.crudeProteinKg, 0)}), in ${formatNumber(supplied.dryMatterKg, 0)} kg of dry matter (the horses can eat up to ${formatNumber(needs.maxDryMatterKg, 0)} kg).`,
  ];
}

function lineSentence(y: LotYield, line: PlanLine, freightModel: FreightModel): string {
  const { lot } = y;
  const freight =
    line.freightCents === 0
      ? 'with no freight'
      : freightModel === 'per-load'
        ? `plus ${formatCents(line.freightCents)} freight (${line.loads} ${line.loads === 1 ? 'load' : 'loads'} × ${formatNumber(lot.distanceMi, 0)} mi × ${formatCents(lot.freightCentsPerLoadedMile)} per loaded mile)`
        : `plus ${formatCents(line.freightCents)} freight spread per ton`;
  const limits: string[] = [];
  if (Math.abs(line.tons - lot.tonsAvailable) < 1e-9) limits.push('all of its stock');
  else if (lot.minOrderTons > 0 && Math.abs(line.tons - lot.minOrderTons) < 0.0015) limits.push('its minimum order');
  const limitText = limits.length > 0 ? ` That is ${limits.join(' and ')}.` : '';
  return `From ${lotText(lot.lotId)}, buy ${tonsText(line.tons)} at ${formatCents(lot.pricePerTonCents)}/t (${formatCents(line.hayCents)}) ${freight}: ${formatCents(line.costCents)} in all, ${formatCents(line.costCents / line.tons)}/t delivered.${limitText}`;
}

function bindingSentences(supplied: LeastCostPlan['supplied'], request: ParsedRequest): string[] {
  const { needs } = request;
  const tight = (have: number, limit: number): boolean => limit > 0 && Math.abs(have - limit) <= limit * 0.002;
  const sentences: string[] = [];
  const energy = tight(supplied.deMcal, needs.deMcal);
  const protein = tight(supplied.crudeProteinKg, needs.crudeProteinKg);
  if (energy && protein) sentences.push('Energy and protein are both met exactly, so the plan buys no more than it must.');
  else if (energy) sentences.push('Energy is the limiting need: the plan buys just enough hay for it, and protein comes out above the need.');
  else if (protein) sentences.push('Protein is the limiting need: the plan buys just enough protein, and energy comes out above the need.');
  if (tight(supplied.dryMatterKg, needs.maxDryMatterKg)) {
    sentences.push('The horses would be eating as much as they can, so the plan leans on the most nutrient-dense hay.');
  }
  return sentences;
}

/** Why several lots: the cheapest energy lot falls short on protein, stock or density. */
function mixSentences(chosen: readonly { y: LotYield; line: PlanLine }[], request: ParsedRequest): string[] {
  if (chosen.length < 2) return [];
  const costPerMcal = (y: LotYield): number => (y.deMcalPerTon > 0 ? y.fullLoadDeliveredPerTonCents / y.deMcalPerTon : Number.POSITIVE_INFINITY);
  const cheapest = [...chosen].sort((a, b) => costPerMcal(a.y) - costPerMcal(b.y))[0]!;
  const others = chosen.filter((c) => c !== cheapest).map((c) => lotText(c.y.lot.lotId));
  const othersText = others.join(' and ');
  const { lot } = cheapest.y;
  const { needs } = request;
  const proteinPerMcal = (cheapest.y.cpKgPerTon * 1000) / Math.max(cheapest.y.deMcalPerTon, 1e-12);
  const neededProteinPerMcal = needs.deMcal > 0 ? (needs.crudeProteinKg * 1000) / needs.deMcal : 0;
  const lead = `${capitalise(lotText(lot.lotId))} is the cheapest energy in the plan (${formatCents(costPerMcal(cheapest.y))} per Mcal delivered)`;
  if (proteinPerMcal < neededProteinPerMcal) {
    return [
      `${lead}, but its hay carries only ${formatNumber(proteinPerMcal, 0)} g of crude protein per Mcal against the ${formatNumber(neededProteinPerMcal, 0)} g per Mcal the horses need, so ${othersText} ${others.length === 1 ? 'is' : 'are'} mixed in for protein.`,
    ];
  }
  if (Math.abs(cheapest.line.tons - lot.tonsAvailable) < 1e-9) {
    return [`${lead}, but it has only ${tonsText(lot.tonsAvailable)} for sale, so ${othersText} ${others.length === 1 ? 'makes' : 'make'} up the rest.`];
  }
  const densityNeeded = needs.maxDryMatterKg > 0 ? needs.deMcal / needs.maxDryMatterKg : Number.POSITIVE_INFINITY;
  if (lot.deMcalPerKgDm * (1 - request.wasteFraction) < densityNeeded) {
    return [`${lead}, but it is too low in energy for the horses to eat enough of it, so denser hay from ${othersText} is added.`];
  }
  return [`Splitting the order between ${lotText(lot.lotId)} and ${othersText} costs less than filling it from one lot, mainly because freight is charged by the whole load.`];
}

function unusedSentences(yields: readonly LotYield[], chosen: readonly { y: LotYield }[], request: ParsedRequest): string[] {
  const used = new Set(chosen.map((c) => c.y));
  return yields
    .filter((y) => !used.has(y))
    .map((y) => {
      const perMcal = y.deMcalPerTon > 0 ? `${formatCents(y.fullLoadDeliveredPerTonCents / y.deMcalPerTon)} per Mcal` : 'no energy';
      const perKgCp = y.cpKgPerTon > 0 ? `${formatCents(y.fullLoadDeliveredPerTonCents / y.cpKgPerTon)} per kg of crude protein` : 'no protein';
      const minOrder =
        y.lot.minOrderTons > 0 && y.lot.minOrderTons * y.dmKgPerTon > request.needs.maxDryMatterKg
          ? ` Its minimum order of ${tonsText(y.lot.minOrderTons)} is more than the horses can eat.`
          : '';
      return `${capitalise(lotText(y.lot.lotId))} is not bought: delivered in full loads it costs ${perMcal} and ${perKgCp}; the chosen lots meet the needs for less.${minOrder}`;
    });
}

function perTonSentences(chosen: readonly { y: LotYield; line: PlanLine }[]): string[] {
  const actual = chosen.reduce((sum, c) => sum + c.line.loads * c.y.freightPerLoadCents, 0);
  const spread = chosen.reduce((sum, c) => sum + c.line.freightCents, 0);
  if (actual === spread) return ['Freight is spread per ton at full loads (a linear approximation).'];
  return [
    `Freight is spread per ton at full loads (a linear approximation): trucked in whole loads it would cost ${formatCents(actual)} rather than ${formatCents(spread)}.`,
  ];
}

/** Reasons the needs cannot be met, in the order a buyer can act on them. */
function explainInfeasible(yields: readonly LotYield[], request: ParsedRequest, solution: Solution): string[] {
  const advice = `Consider adding lots, a richer hay or a concentrate to the ration; ${CONSULT}.`;
  const { needs } = request;
  if (solution.status !== 'infeasible') {
    return [`The solver could not finish (status: ${solution.status}), so no plan is offered.`, advice];
  }
  if (yields.length === 0) return ['No lots were offered, so nothing can meet the needs.', advice];

  const reasons: string[] = [];
  const allDe = yields.reduce((sum, y) => sum + y.lot.tonsAvailable * y.deMcalPerTon, 0);
  const allCp = yields.reduce((sum, y) => sum + y.lot.tonsAvailable * y.cpKgPerTon, 0);
  if (allDe < needs.deMcal) {
    reasons.push(
      `Even buying every listed ton, the lots supply only ${formatNumber(allDe, 0)} Mcal of the ${formatNumber(needs.deMcal, 0)} Mcal of digestible energy needed.`,
    );
  }
  if (allCp < needs.crudeProteinKg) {
    reasons.push(
      `Even buying every listed ton, the lots supply only ${formatNumber(allCp, 0)} kg of the ${formatNumber(needs.crudeProteinKg, 0)} kg of crude protein needed.`,
    );
  }
  if (reasons.length === 0) {
    const maxDe = bestWithinIntake(yields, needs.maxDryMatterKg, (y) => y.deMcalPerTon);
    const maxCp = bestWithinIntake(yields, needs.maxDryMatterKg, (y) => y.cpKgPerTon);
    const intake = `The horses can eat at most ${formatNumber(needs.maxDryMatterKg, 0)} kg of dry matter`;
    if (maxDe < needs.deMcal) {
      reasons.push(`${intake}; filled with the most energy-dense hay listed, that is only ${formatNumber(maxDe, 0)} Mcal of the ${formatNumber(needs.deMcal, 0)} Mcal needed.`);
    }
    if (maxCp < needs.crudeProteinKg) {
      reasons.push(`${intake}; filled with the most protein-rich hay listed, that is only ${formatNumber(maxCp, 0)} kg of the ${formatNumber(needs.crudeProteinKg, 0)} kg of crude protein needed.`);
    }
  }
  if (reasons.length === 0) {
    const relaxed = solve(buildModel(yields.map((y) => ({ ...y, lot: { ...y.lot, minOrderTons: 0 } })), request, 'per-ton'));
    reasons.push(
      relaxed.status === 'optimal'
        ? 'The minimum orders are the obstacle: every mix that meets the needs would have to take more of some lot than the horses can eat.'
        : 'Within what the horses can eat, no mix of these lots supplies both the energy and the protein needed.',
    );
  }
  return ['No combination of the offered lots meets the needs.', ...reasons, advice];
}

/** Most of a nutrient the horses could eat within their dry-matter limit (greedy, densest first, stock-limited). */
function bestWithinIntake(yields: readonly LotYield[], maxDryMatterKg: number, perTon: (y: LotYield) => number): number {
  const byDensity = [...yields].filter((y) => y.dmKgPerTon > 0).sort((a, b) => perTon(b) / b.dmKgPerTon - perTon(a) / a.dmKgPerTon);
  let roomKg = maxDryMatterKg;
  let total = 0;
  for (const y of byDensity) {
    if (roomKg <= 0) break;
    const tons = Math.min(y.lot.tonsAvailable, roomKg / y.dmKgPerTon);
    total += tons * perTon(y);
    roomKg -= tons * y.dmKgPerTon;
  }
  return total;
}

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}
