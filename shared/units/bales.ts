/**
 * Bales ↔ short tons for a lot with a known average bale weight (domain brief §11:
 * bales = tons × 2000 / bale weight).
 */
import { LB_PER_SHORT_TON } from './mass';

function positive(value: number, name: string): number {
  if (!(value > 0) || !Number.isFinite(value)) throw new RangeError(`${name} must be a positive number; got ${value}`);
  return value;
}

/** Short tons as-fed in `bales` bales of `baleWeightLb` lb on average. */
export function balesToTons(bales: number, baleWeightLb: number): number {
  if (!Number.isInteger(bales) || bales < 0) throw new RangeError(`bales must be a non-negative integer; got ${bales}`);
  return (bales * positive(baleWeightLb, 'baleWeightLb')) / LB_PER_SHORT_TON;
}

/** Whole bales needed to make at least `tons` short tons (rounded up; float noise ignored). */
export function balesForTons(tons: number, baleWeightLb: number): number {
  if (!(tons >= 0) || !Number.isFinite(tons)) throw new RangeError(`tons must be a non-negative number; got ${tons}`);
  return Math.ceil(Number(((tons * LB_PER_SHORT_TON) / positive(baleWeightLb, 'baleWeightLb')).toPrecision(12)));
}

/** Whole bales that fit within `tons` short tons (rounded down; float noise ignored). */
export function balesWithinTons(tons: number, baleWeightLb: number): number {
  if (!(tons >= 0) || !Number.isFinite(tons)) throw new RangeError(`tons must be a non-negative number; got ${tons}`);
  return Math.floor(Number(((tons * LB_PER_SHORT_TON) / positive(baleWeightLb, 'baleWeightLb')).toPrecision(12)));
}
