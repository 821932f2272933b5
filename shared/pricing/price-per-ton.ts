/**
 * The price per short ton as-fed of a lot, however the grower prices it. Growers price by the ton or
 * by the bale; the catalogue, sorting, orders by weight and every cost per nutrient work per ton, so a
 * bale price is turned into a ton price here and nowhere else. Per ton of dry matter: see
 * `costPerTonDryMatterCents` in cost-per-nutrient.
 */

import { type Cents, roundCents } from '../units/money';
import { LB_PER_SHORT_TON } from '../units/mass';

/**
 * Price per bale → whole cents per short ton as-fed: $/ton = $/bale × 2000 ÷ bale weight in lb
 * (domain brief §11). $12 for a 60 lb bale → $400.00/ton.
 *
 * @param centsPerBale cents per bale
 * @param avgBaleWeightLb average bale weight in lb (ideally from a scale ticket), > 0
 */
export function pricePerTonFromBaleCents(centsPerBale: Cents, avgBaleWeightLb: number): Cents {
  if (!(avgBaleWeightLb > 0) || !Number.isFinite(avgBaleWeightLb)) {
    throw new RangeError(`avgBaleWeightLb must be a positive number; got ${avgBaleWeightLb}`);
  }
  return roundCents((centsPerBale * LB_PER_SHORT_TON) / avgBaleWeightLb);
}

/** How a lot is priced, as the grower entered it. */
export interface ListedPrice {
  readonly pricingUnit: 'ton' | 'bale';
  readonly priceCentsPerTon: Cents | null;
  readonly priceCentsPerBale: Cents | null;
}

/**
 * The lot's price per short ton as-fed: the ton price as entered, or the bale price converted at the
 * lot's average bale weight. A lot priced by the bale whose bale price is missing keeps its ton price.
 */
export function listedPricePerTonCents(price: ListedPrice, avgBaleWeightLb: number): Cents {
  if (price.pricingUnit === 'bale' && price.priceCentsPerBale !== null) return pricePerTonFromBaleCents(price.priceCentsPerBale, avgBaleWeightLb);
  if (price.priceCentsPerTon === null) throw new RangeError('a lot priced by the ton needs its ton price');
  return price.priceCentsPerTon;
}
