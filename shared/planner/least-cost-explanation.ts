/**
 * Plain-English explanation of a least-cost plan: the summary, one sentence per line bought, which
 * need binds, why several lots, why the others are left, and why no plan exists when none does.
 */

import type { Solution } from 'yalps';
import { balesForTons } from '../units/bales';
import { type Cents, formatCents } from '../units/money';
import { formatNumber, roundTo } from '../units/rounding';
import type { FreightModel, LeastCostPlan, ParsedLeastCostRequest, PlanLine } from './least-cost-contract';
import type { LotYield } from './least-cost-model';

type ParsedRequest = ParsedLeastCostRequest;

export const CONSULT = 'consult your veterinarian or an equine nutritionist';

const tonsText = (tons: number): string => `${formatNumber(tons, 2)} t`;
/** A lot by its title when the caller gave one ("Second-cut alfalfa"), else by id ("lot A"). */
const lotText = (lot: { lotId: string; title?: string | undefined }): string => (lot.title ? `“${lot.title}”` : `lot ${lot.lotId}`);

export function summarySentences(
  lines: readonly PlanLine[],
  totalCostCents: Cents,
  supplied: LeastCostPlan['supplied'],
  request: ParsedRequest,
): string[] {
  const tons = lines.reduce((sum, l) => sum + l.tons, 0);
  const freight = lines.reduce((sum, l) => sum + l.freightCents, 0);
  const hay = lines.reduce((sum, l) => sum + l.hayCents, 0);
  const { needs } = request;
  const wasteNote = request.wasteFraction > 0 ? ` after ${roundTo(request.wasteFraction * 100, 1)} % feeding waste` : '';
  return [
    `Buy ${tonsText(tons)} of hay from ${lines.length === 1 ? 'one lot' : `${lines.length} lots`} for ${formatCents(totalCostCents)} delivered (${formatCents(hay)} hay and ${formatCents(freight)} freight).`,
    `Eaten${wasteNote}, it supplies ${formatNumber(supplied.deMcal, 0)} Mcal of digestible energy (need ${formatNumber(needs.deMcal, 0)}) and ${formatNumber(supplied.crudeProteinKg, 0)} kg of crude protein (need ${formatNumber(needs.crudeProteinKg, 0)}), in ${formatNumber(supplied.dryMatterKg, 0)} kg of dry matter (the horses can eat up to ${formatNumber(needs.maxDryMatterKg, 0)} kg).`,
  ];
}

export function lineSentence(y: LotYield, line: PlanLine, freightModel: FreightModel): string {
  const { lot } = y;
  const freight =
    line.freightCents === 0
      ? 'with no freight'
      : freightModel === 'per-load'
        ? `plus ${formatCents(line.freightCents)} freight (${line.loads} ${line.loads === 1 ? 'load' : 'loads'} × ${formatNumber(lot.distanceMi, 0)} mi × ${formatCents(lot.freightCentsPerLoadedMile)} per loaded mile)`
        : `plus ${formatCents(line.freightCents)} freight spread per ton`;
  const limits: string[] = [];
  if (Math.abs(line.tons - lot.tonsAvailable) < 1e-9) limits.push('all of its stock');
  else if (lot.minOrderTons > 0 && (line.bales === undefined ? Math.abs(line.tons - lot.minOrderTons) < 0.0015 : line.bales === balesForTons(lot.minOrderTons, lot.avgBaleWeightLb!))) {
    limits.push('its minimum order');
  }
  const limitText = limits.length > 0 ? ` That is ${limits.join(' and ')}.` : '';
  const quantity = line.bales === undefined ? tonsText(line.tons) : `${formatNumber(line.bales, 0)} ${line.bales === 1 ? 'bale' : 'bales'} (${tonsText(line.tons)})`;
  const price = lot.pricingUnit === 'bale' && lot.priceCentsPerBale !== null ? `${formatCents(lot.priceCentsPerBale)} a bale` : `${formatCents(lot.pricePerTonCents)}/t`;
  return `From ${lotText(lot)}, buy ${quantity} at ${price} (${formatCents(line.hayCents)}) ${freight}: ${formatCents(line.costCents)} in all, ${formatCents(line.costCents / line.tons)}/t delivered.${limitText}`;
}

/** Why the hay bought is a little more than the need: nobody sells part of a bale. */
export function wholeBaleSentences(lines: readonly PlanLine[]): string[] {
  return lines.some((l) => l.bales !== undefined)
    ? ['Quantities are rounded up to whole bales, and the cost is what an order for those bales costs, so the hay supplies a little more than the need.']
    : [];
}

export function bindingSentences(supplied: LeastCostPlan['supplied'], request: ParsedRequest): string[] {
  const { needs } = request;
  const tight = (have: number, limit: number): boolean => limit > 0 && Math.abs(have - limit) <= limit * 0.002;
  const sentences: string[] = [];
  const energy = tight(supplied.deMcal, needs.deMcal);
  const protein = tight(supplied.crudeProteinKg, needs.crudeProteinKg);
  if (energy && protein) sentences.push('Energy and protein are both met exactly, so the plan buys no more than it must.');
  else if (energy) sentences.push('Energy is the limiting need: the plan buys just enough hay for it, and protein comes out above the need.');
  else if (protein) sentences.push('Protein is the limiting need: the plan buys just enough protein, and energy comes out above the need.');
  if (tight(supplied.dryMatterKg, needs.minDryMatterKg)) {
    sentences.push('The forage floor binds: the plan buys more hay than energy and protein alone would need, so the horses get enough forage.');
  }
  if (tight(supplied.dryMatterKg, needs.maxDryMatterKg)) {
    sentences.push('The horses would be eating as much as they can, so the plan leans on the most nutrient-dense hay.');
  }
  return sentences;
}

/**
 * The forage the mix feeds against the floor and the herd planner's usual amount, per day and as % of
 * body weight, with the supervision caution below 1.5 % BW (domain brief S14).
 */
export function forageSentences(supplied: LeastCostPlan['supplied'], request: ParsedRequest): string[] {
  const { forage, needs } = request;
  if (forage === undefined) {
    return needs.minDryMatterKg > 0
      ? [`It includes at least the forage floor of ${formatNumber(needs.minDryMatterKg, 0)} kg of hay dry matter over the period.`]
      : [];
  }
  const perDay = (kg: number) => kg / forage.days;
  const pctBw = (kg: number) => (perDay(kg) / forage.herdBodyWeightKg) * 100;
  const floorPct = pctBw(needs.minDryMatterKg);
  const floorText =
    Math.abs(floorPct - forage.floorPctBw) < 0.005
      ? `${formatNumber(forage.floorPctBw, 1)} % of body weight; NRC 2007 advises at least 1.5 %`
      : `${formatNumber(floorPct, 2)} % of body weight, the hay's share of a ${formatNumber(forage.floorPctBw, 1)} % floor`;
  const sentences = [
    `Forage: the mix feeds ${formatNumber(perDay(supplied.dryMatterKg), 1)} kg of hay dry matter a day (${formatNumber(pctBw(supplied.dryMatterKg), 2)} % of body weight), ` +
      `at least the forage floor of ${formatNumber(perDay(needs.minDryMatterKg), 1)} kg a day (${floorText}) ` +
      `and no more than the ${formatNumber(perDay(needs.maxDryMatterKg), 1)} kg the horses can eat. ` +
      `The single-lot planner feeds the same herd ${formatNumber(perDay(forage.typicalDryMatterKg), 1)} kg a day (${formatNumber(pctBw(forage.typicalDryMatterKg), 2)} % of body weight); both use the same herd figures.`,
  ];
  if (forage.floorPctBw < 1.5) {
    sentences.push(`A forage floor below 1.5 % of body weight should be fed only under veterinary supervision; ${CONSULT}.`);
  }
  return sentences;
}

/** Why several lots: the cheapest energy lot falls short on protein, stock or density. */
export function mixSentences(chosen: readonly { y: LotYield; line: PlanLine }[], request: ParsedRequest): string[] {
  if (chosen.length < 2) return [];
  const costPerMcal = (y: LotYield): number => (y.deMcalPerTon > 0 ? y.fullLoadDeliveredPerTonCents / y.deMcalPerTon : Number.POSITIVE_INFINITY);
  const cheapest = [...chosen].sort((a, b) => costPerMcal(a.y) - costPerMcal(b.y))[0]!;
  const others = chosen.filter((c) => c !== cheapest).map((c) => lotText(c.y.lot));
  const othersText = others.join(' and ');
  const { lot } = cheapest.y;
  const { needs } = request;
  const proteinPerMcal = (cheapest.y.cpKgPerTon * 1000) / Math.max(cheapest.y.deMcalPerTon, 1e-12);
  const neededProteinPerMcal = needs.deMcal > 0 ? (needs.crudeProteinKg * 1000) / needs.deMcal : 0;
  const lead = `${capitalise(lotText(lot))} is the cheapest energy in the plan (${formatCents(costPerMcal(cheapest.y))} per Mcal delivered)`;
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
  return [`Splitting the order between ${lotText(lot)} and ${othersText} costs less than filling it from one lot, mainly because freight is charged by the whole load.`];
}

export function unusedSentences(yields: readonly LotYield[], chosen: readonly { y: LotYield }[], request: ParsedRequest): string[] {
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
      return `${capitalise(lotText(y.lot))} is not bought: delivered in full loads it costs ${perMcal} and ${perKgCp}; the chosen lots meet the needs for less.${minOrder}`;
    });
}

export function perTonSentences(chosen: readonly { y: LotYield; line: PlanLine }[]): string[] {
  const actual = chosen.reduce((sum, c) => sum + c.line.loads * c.y.freightPerLoadCents, 0);
  const spread = chosen.reduce((sum, c) => sum + c.line.freightCents, 0);
  if (actual === spread) return ['Freight is spread per ton at full loads (a linear approximation).'];
  return [
    `Freight is spread per ton at full loads (a linear approximation): trucked in whole loads it would cost ${formatCents(actual)} rather than ${formatCents(spread)}.`,
  ];
}

/** Reasons the needs cannot be met, in the order a buyer can act on them. */
export function explainInfeasible(
  yields: readonly LotYield[],
  request: ParsedRequest,
  solution: Solution,
  feasibleWithoutMinimumOrders: () => boolean,
): string[] {
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
  const allDm = yields.reduce((sum, y) => sum + y.lot.tonsAvailable * y.dmKgPerTon, 0);
  if (allDm < needs.minDryMatterKg) {
    reasons.push(
      `Even buying every listed ton, the lots supply only ${formatNumber(allDm, 0)} kg of the ${formatNumber(needs.minDryMatterKg, 0)} kg of hay dry matter the forage floor needs.`,
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
    reasons.push(
      feasibleWithoutMinimumOrders()
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
