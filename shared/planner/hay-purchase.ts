/**
 * From hay eaten to hay bought: tons = eaten / (1 − waste); bales = tons × 2000 / bale weight,
 * rounded up to whole bales (domain brief §11, "Annual need").
 */

import { LB_PER_SHORT_TON, lbToShortTons } from '../units/mass';

export interface HayPurchaseInput {
  /** Hay the horses eat over the period, lb as-fed. */
  readonly eatenLbAsFed: number;
  /** Share of hay offered that is wasted, 0 ≤ waste < 1. */
  readonly wasteFraction: number;
  /** Average bale weight, lb as-fed, > 0. */
  readonly baleWeightLb: number;
}

export interface HayPurchase {
  /** Hay eaten, short tons as-fed. */
  readonly eatenTons: number;
  /** Hay to buy including waste, lb as-fed. */
  readonly purchaseLb: number;
  /** Hay to buy including waste, short tons as-fed (unrounded). */
  readonly purchaseTons: number;
  /** Whole bales to buy, rounded up. */
  readonly bales: number;
}

/**
 * Hay to buy so that, after waste, the horses still eat `eatenLbAsFed`.
 * 4 horses × 1,100 lb × 2 % × 365 d = 32,120 lb (16.1 t) eaten; with a round-bale feeder
 * (10 % waste) that is 17.8 t, or 36 bales of 1,000 lb.
 */
export function hayPurchase(input: HayPurchaseInput): HayPurchase {
  const { eatenLbAsFed, wasteFraction, baleWeightLb } = input;
  if (!Number.isFinite(eatenLbAsFed) || eatenLbAsFed < 0) throw new RangeError(`eatenLbAsFed must be non-negative; got ${eatenLbAsFed}`);
  if (!(wasteFraction >= 0 && wasteFraction < 1)) throw new RangeError(`wasteFraction must be in [0, 1); got ${wasteFraction}`);
  if (!(baleWeightLb > 0) || !Number.isFinite(baleWeightLb)) throw new RangeError(`baleWeightLb must be positive; got ${baleWeightLb}`);
  const purchaseLb = eatenLbAsFed / (1 - wasteFraction);
  return {
    eatenTons: lbToShortTons(eatenLbAsFed),
    purchaseLb,
    purchaseTons: purchaseLb / LB_PER_SHORT_TON,
    // 12 significant digits drop float dust so an exact 36.0 bales is not bought as 37.
    bales: Math.ceil(Number((purchaseLb / baleWeightLb).toPrecision(12))),
  };
}
