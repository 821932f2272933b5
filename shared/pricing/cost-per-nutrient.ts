/**
 * Cost of hay per unit of what the horse actually gets: dry matter, crude protein, digestible
 * energy. Lots are compared on dry matter only (domain brief §1). Results are fractional cents,
 * kept precise for ranking; round with `roundCents`/`formatCents` only for display.
 */

import { KG_PER_SHORT_TON, LB_PER_SHORT_TON } from '../units/mass';

function dryMatterFraction(dryMatterPct: number): number {
  if (!(dryMatterPct > 0 && dryMatterPct <= 100)) throw new RangeError(`dryMatterPct must be in (0, 100]; got ${dryMatterPct}`);
  return dryMatterPct / 100;
}

function positivePrice(cents: number): number {
  if (!Number.isFinite(cents) || cents < 0) throw new RangeError(`price must be a non-negative number of cents; got ${cents}`);
  return cents;
}

/**
 * Cents per short ton of dry matter: price as-fed ÷ DM fraction.
 * $400/t as-fed at 88 % DM → 45,454.5 cents ($454.55) per ton DM (domain brief §11).
 */
export function costPerTonDryMatterCents(pricePerTonAsFedCents: number, dryMatterPct: number): number {
  return positivePrice(pricePerTonAsFedCents) / dryMatterFraction(dryMatterPct);
}

/**
 * Cents per lb of crude protein: price per ton ÷ (2000 lb × DM fraction × CP % DM / 100).
 * $200/t at 88 % DM and 18 % CP → 20,000 / 316.8 lb ≈ 63.1 cents per lb CP.
 *
 * @param crudeProteinPctDm crude protein, % of dry matter, > 0
 */
export function costPerLbCrudeProteinCents(pricePerTonAsFedCents: number, dryMatterPct: number, crudeProteinPctDm: number): number {
  if (!(crudeProteinPctDm > 0 && crudeProteinPctDm <= 100)) {
    throw new RangeError(`crudeProteinPctDm must be in (0, 100]; got ${crudeProteinPctDm}`);
  }
  const lbProteinPerTon = LB_PER_SHORT_TON * dryMatterFraction(dryMatterPct) * (crudeProteinPctDm / 100);
  return positivePrice(pricePerTonAsFedCents) / lbProteinPerTon;
}

/**
 * Cents per Mcal of horse digestible energy: price per ton ÷ (kg DM per ton × DE Mcal/kg DM).
 * One short ton as-fed at 88 % DM holds ≈ 798.3 kg DM; at 2.0 Mcal/kg that is ≈ 1,596.7 Mcal,
 * so $200/t costs ≈ 12.5 cents per Mcal.
 *
 * @param deMcalPerKgDm horse DE of the hay, Mcal per kg DM, > 0
 */
export function costPerMcalDeCents(pricePerTonAsFedCents: number, dryMatterPct: number, deMcalPerKgDm: number): number {
  if (!(deMcalPerKgDm > 0) || !Number.isFinite(deMcalPerKgDm)) throw new RangeError(`deMcalPerKgDm must be positive; got ${deMcalPerKgDm}`);
  const mcalPerTon = KG_PER_SHORT_TON * dryMatterFraction(dryMatterPct) * deMcalPerKgDm;
  return positivePrice(pricePerTonAsFedCents) / mcalPerTon;
}
