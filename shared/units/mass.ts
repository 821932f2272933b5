/**
 * Mass conversions for the US hay trade: pounds, kilograms and short tons.
 */

/**
 * Pounds per kilogram. The domain brief fixes 2.2046 (§6: "Convert lb to kg by dividing by 2.2046"),
 * so worked examples such as 1,100 lb = 499.0 kg reproduce exactly. The exact factor is 2.20462262…;
 * the difference is 0.001 %, far below weighing error on a scale ticket.
 */
export const LB_PER_KG = 2.2046;

/** Pounds in one US short ton, the ton used in hay prices ($/ton) and in this app. */
export const LB_PER_SHORT_TON = 2000;

/** Kilograms in one short ton under {@link LB_PER_KG} (≈ 907.19 kg). */
export const KG_PER_SHORT_TON = LB_PER_SHORT_TON / LB_PER_KG;

function finite(value: number, name: string): number {
  if (!Number.isFinite(value)) throw new RangeError(`${name} must be a finite number; got ${value}`);
  return value;
}

/** Pounds → kilograms. */
export function lbToKg(lb: number): number {
  return finite(lb, 'lb') / LB_PER_KG;
}

/** Kilograms → pounds. */
export function kgToLb(kg: number): number {
  return finite(kg, 'kg') * LB_PER_KG;
}

/** Pounds → short tons (2,000 lb). */
export function lbToShortTons(lb: number): number {
  return finite(lb, 'lb') / LB_PER_SHORT_TON;
}

/** Short tons → pounds. */
export function shortTonsToLb(tons: number): number {
  return finite(tons, 'tons') * LB_PER_SHORT_TON;
}

/** Kilograms → short tons. */
export function kgToShortTons(kg: number): number {
  return finite(kg, 'kg') / KG_PER_SHORT_TON;
}

/** Short tons → kilograms. */
export function shortTonsToKg(tons: number): number {
  return finite(tons, 'tons') * KG_PER_SHORT_TON;
}
