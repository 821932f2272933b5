/**
 * Truck freight for hay. Freight is quoted per loaded mile (practice, domain brief §11):
 * cost = rate per loaded mile × miles × loads.
 */

import { type Cents, roundCents } from '../units/money';

/**
 * Short tons of hay per semi load (practice). The 80,000 lb Interstate gross-weight limit
 * (23 CFR 658.17) leaves roughly 22–26 t of hay; light small bales can fill by volume first.
 */
export const DEFAULT_TONS_PER_LOAD = 24;

function nonNegative(value: number, name: string): number {
  if (!Number.isFinite(value) || value < 0) throw new RangeError(`${name} must be a non-negative number; got ${value}`);
  return value;
}

/**
 * Number of truck loads needed to haul `tons` short tons: ceil(tons / tonsPerLoad).
 * A hair over a full load from float arithmetic (24.000000001 t) still counts as one load.
 */
export function loadsForTons(tons: number, tonsPerLoad: number = DEFAULT_TONS_PER_LOAD): number {
  nonNegative(tons, 'tons');
  if (!(tonsPerLoad > 0) || !Number.isFinite(tonsPerLoad)) throw new RangeError(`tonsPerLoad must be positive; got ${tonsPerLoad}`);
  return Math.ceil(Number((tons / tonsPerLoad).toPrecision(12)));
}

/** Freight for one load, whole cents: rate (cents per loaded mile) × one-way loaded miles. */
export function freightPerLoadCents(ratePerLoadedMileCents: number, miles: number): Cents {
  return roundCents(nonNegative(ratePerLoadedMileCents, 'ratePerLoadedMileCents') * nonNegative(miles, 'miles'));
}

/**
 * Freight for a whole delivery, whole cents: rate × miles × loads.
 * $3.50/loaded mile × 300 mi × 1 load = $1,050.00 (domain brief §11).
 */
export function freightCents(input: { ratePerLoadedMileCents: number; miles: number; loads: number }): Cents {
  const { loads } = input;
  if (!Number.isInteger(loads) || loads < 0) throw new RangeError(`loads must be a non-negative integer; got ${loads}`);
  return freightPerLoadCents(input.ratePerLoadedMileCents, input.miles) * loads;
}
