/**
 * Least-cost hay purchase plan: which candidate lots to buy, and how many tons of each, so the
 * herd's energy and protein needs over a period are met at the lowest delivered cost, with at least
 * the forage floor of hay dry matter and no more than the horses can eat. The contract lives in
 * least-cost-contract.ts, the solver model in least-cost-model.ts and the sentences in
 * least-cost-explanation.ts.
 *
 * The integer search has a time limit; when it is reached the plan is the cheaper, at whole-load
 * freight, of the best integer plan found and the linear plan, and the explanation says it may not
 * be the cheapest.
 */

import { solve } from 'yalps';
import {
  type ForageBasis,
  type FreightModel,
  type LeastCostPlan,
  type LeastCostPlanRequest,
  LeastCostPlanRequestSchema,
  type ParsedLeastCostRequest,
  type PlanNeeds,
} from './least-cost-contract';
import {
  bindingSentences,
  CONSULT,
  forageSentences,
  explainInfeasible,
  lineSentence,
  mixSentences,
  perTonSentences,
  summarySentences,
  unusedSentences,
  wholeBaleSentences,
} from './least-cost-explanation';
import { buildModel, type LotYield, lotYield, priceLines, tonsFrom } from './least-cost-model';
import type { HerdNeedsPlan } from './herd-needs';

export * from './least-cost-contract';

/** Time limit for the integer search, ms; far above what realistic inputs need. */
const SOLVER_TIMEOUT_MS = 1500;

type ParsedRequest = ParsedLeastCostRequest;

/**
 * Herd-plan totals as least-cost needs: the hay share of energy and protein over the period, the
 * hay share of maximum intake and of the forage floor, with the plan's feeding waste — the same
 * herd figures the single-lot planner uses, so both plans feed the same herd the same way.
 */
export function needsFromHerdPlan(plan: HerdNeedsPlan): { needs: PlanNeeds; wasteFraction: number; forage: ForageBasis } {
  const period = plan.totals.period;
  return {
    needs: {
      deMcal: period.deFromHayMcal,
      crudeProteinKg: period.crudeProteinFromHayKg,
      maxDryMatterKg: period.hayDmMaxKg,
      minDryMatterKg: period.hayDmFloorKg,
    },
    wasteFraction: plan.waste.wasteFraction,
    forage: {
      floorPctBw: plan.totals.forageFloorPctBw,
      typicalDryMatterKg: period.hayDmKg,
      days: period.days,
      herdBodyWeightKg: plan.groups.reduce((sum, g) => sum + g.bodyWeightKg * g.count, 0),
    },
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

  if (needs.deMcal === 0 && needs.crudeProteinKg === 0 && needs.minDryMatterKg === 0) {
    return emptyPlan(true, request.freightModel, ['Nothing needs to be bought: the energy and protein needs are zero.']);
  }

  const solution = solve(buildModel(yields, request, request.freightModel), { timeout });
  if (solution.status === 'optimal') {
    return describePlan(yields, request, request.freightModel, tonsFrom(solution, yields.length), []);
  }
  if (solution.status !== 'timedout') {
    return emptyPlan(false, request.freightModel, explainInfeasible(yields, request, solution, () => feasibleWithoutMinimumOrders(yields, request)));
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


function describePlan(
  yields: readonly LotYield[],
  request: ParsedRequest,
  freightModel: FreightModel,
  rawTons: readonly number[],
  notes: readonly string[],
): LeastCostPlan {
  const { chosen, totalCostCents, supplied, solved } = priceLines(yields, rawTons, request, freightModel);
  const lines = chosen.map((c) => c.line);
  const explanation = [
    ...summarySentences(lines, totalCostCents, supplied, request),
    ...chosen.map(({ y, line }) => lineSentence(y, line, freightModel)),
    ...bindingSentences(solved, request),
    ...wholeBaleSentences(lines),
    ...forageSentences(supplied, request),
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


/** Whether dropping every minimum order would make the needs reachable (to name the obstacle). */
function feasibleWithoutMinimumOrders(yields: readonly LotYield[], request: ParsedRequest): boolean {
  const relaxed = yields.map((y) => ({ ...y, lot: { ...y.lot, minOrderTons: 0 } }));
  return solve(buildModel(relaxed, request, 'per-ton')).status === 'optimal';
}
