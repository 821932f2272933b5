import type { Nutrients } from './forage-contract';

/*
 * Dry matter (DM) ↔ as-fed (AF) conversions. Source: domain brief §1.
 * Nutrient_AF = Nutrient_DM × DM%/100, and back by dividing. Grade and compare on DM only.
 */

/** Dry matter % (of the sample as fed) from moisture %: DM% = 100 − moisture%. */
export function dryMatterFromMoisture(moisturePct: number): number {
  return 100 - moisturePct;
}

/** Converts a DM-basis percentage to as-fed, given dry matter % of the sample. */
export function toAsFed(valueDm: number, dryMatterPct: number): number {
  // Scaling by the fraction (≤ 1) guarantees an as-fed value never exceeds its DM value in floating point.
  return valueDm * (dryMatterPct / 100);
}

/** Converts an as-fed percentage to DM basis, given dry matter % of the sample (> 0). */
export function toDryMatter(valueAsFed: number, dryMatterPct: number): number {
  return valueAsFed / (dryMatterPct / 100);
}

/** Weight of dry matter in a weight of hay as fed (same unit in and out). */
export function dryMatterWeight(asFedWeight: number, dryMatterPct: number): number {
  return asFedWeight * (dryMatterPct / 100);
}

/** Nutrients moved from one basis to the other; `convert` is `toAsFed` or `toDryMatter`. */
export function convertNutrients(
  nutrients: Nutrients,
  dryMatterPct: number,
  convert: (value: number, dryMatterPct: number) => number,
): Nutrients {
  const orNull = (value: number | null) => (value === null ? null : convert(value, dryMatterPct));
  return {
    crudeProteinPct: convert(nutrients.crudeProteinPct, dryMatterPct),
    adfPct: convert(nutrients.adfPct, dryMatterPct),
    ndfPct: convert(nutrients.ndfPct, dryMatterPct),
    fatPct: orNull(nutrients.fatPct),
    ashPct: orNull(nutrients.ashPct),
    escPct: orNull(nutrients.escPct),
    wscPct: orNull(nutrients.wscPct),
    starchPct: orNull(nutrients.starchPct),
    calciumPct: orNull(nutrients.calciumPct),
    phosphorusPct: orNull(nutrients.phosphorusPct),
    nscPct: orNull(nutrients.nscPct),
  };
}
