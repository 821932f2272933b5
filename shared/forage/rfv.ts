/*
 * Relative Feed Value (RFV): Rohweder, Barnes & Jorgensen (1978), as adopted by the AFGC
 * Hay Marketing Task Force. Built for legume and legume/grass hay; it under-ranks grasses
 * (Undersander, UW–Madison Ext., Relative Forage Quality).
 */

/** Divisor that makes full-bloom alfalfa (ADF 41, NDF 53 % DM) score 100. */
export const RFV_DIVISOR = 1.29;

/** Digestible dry matter, % of DM, from ADF (% DM): DDM = 88.9 − 0.779·ADF. */
export function digestibleDryMatter(adfPct: number): number {
  return 88.9 - 0.779 * adfPct;
}

/** Dry matter intake, % of body weight per day, from NDF (% DM, > 0): DMI = 120/NDF. */
export function rfvDryMatterIntake(ndfPct: number): number {
  return 120 / ndfPct;
}

/** Relative feed value (unitless) from ADF and NDF, both % of DM: RFV = DDM·DMI/1.29. */
export function relativeFeedValue(adfPct: number, ndfPct: number): number {
  return (digestibleDryMatter(adfPct) * rfvDryMatterIntake(ndfPct)) / RFV_DIVISOR;
}
