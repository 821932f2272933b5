/**
 * Rounding for display. Domain code keeps full precision and rounds only at the edge
 * (domain brief: "Keep full precision in code").
 */

const MAX_DECIMALS = 10;

function checkDecimals(decimals: number): void {
  if (!Number.isInteger(decimals) || decimals < 0 || decimals > MAX_DECIMALS) {
    throw new RangeError(`decimals must be an integer from 0 to ${MAX_DECIMALS}; got ${decimals}`);
  }
}

/**
 * Rounds half away from zero to `decimals` places, as a person would on paper.
 *
 * Binary floating point stores 1.005 as 1.00499999999999989…, so `Math.round(1.005 * 100) / 100`
 * gives 1.00. Re-reading the scaled value at 15 significant digits (the most a double holds
 * reliably) removes that representation error first, so `roundTo(1.005, 2)` is 1.01.
 *
 * @param value any finite number
 * @param decimals places after the point, 0–10 (default 0)
 */
export function roundTo(value: number, decimals = 0): number {
  if (!Number.isFinite(value)) throw new RangeError(`value must be finite; got ${value}`);
  checkDecimals(decimals);
  const factor = 10 ** decimals;
  const scaled = Number((Math.abs(value) * factor).toPrecision(15));
  const rounded = (Math.sign(value) * Math.round(scaled)) / factor;
  return rounded === 0 ? 0 : rounded; // never show "-0"
}

/**
 * Rounds up (towards +∞) to `decimals` places, ignoring representation noise
 * (so 17.8000000001 at 1 place stays 17.8). Used where a shortfall is worse than a surplus.
 */
export function ceilTo(value: number, decimals = 0): number {
  if (!Number.isFinite(value)) throw new RangeError(`value must be finite; got ${value}`);
  checkDecimals(decimals);
  const factor = 10 ** decimals;
  const scaled = Number((value * factor).toPrecision(12));
  const result = Math.ceil(scaled) / factor;
  return result === 0 ? 0 : result;
}

/** Inserts US thousands separators into a run of digits: "1234567" → "1,234,567". */
export function groupThousands(digits: string): string {
  return digits.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
}

/**
 * Formats a number for display with a fixed number of decimals and US thousands separators,
 * rounding half away from zero: `formatNumber(32120, 0)` → "32,120", `formatNumber(-0.04, 1)` → "0.0".
 */
export function formatNumber(value: number, decimals = 0): string {
  const rounded = roundTo(value, decimals);
  const [whole = '0', fraction] = Math.abs(rounded).toFixed(decimals).split('.');
  const sign = rounded < 0 ? '-' : '';
  return `${sign}${groupThousands(whole)}${fraction === undefined ? '' : `.${fraction}`}`;
}
