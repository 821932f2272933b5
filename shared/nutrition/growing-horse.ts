/**
 * Requirements of a weaned, growing horse (4–24 months) after NRC (2007), from its current
 * weight and age. All NRC equations here are from memory (not re-read during implementation);
 * the tests check them against the 500 kg mature-weight rows of NRC 2007 Table 16-3, also from memory.
 *
 * NRC needs the average daily gain (ADG). Our request carries only weight and age, so ADG comes
 * from a growth curve: a monomolecular curve, BW(t) = mature × (1 − A·e^(−k·t)), fitted to the
 * NRC 2007 500 kg rows at 6 and 12 months (216 kg and 321 kg). That is a documented
 * simplification, not the NRC's own growth equation; it also reproduces the 4 and 24 month rows
 * (≈168 kg and ≈430 kg) and the table ADGs (≈0.84, 0.72, 0.45 kg/d at 4, 6, 12 months).
 */

/** Youngest and oldest ages (months) the growing equations are used for. */
export const GROWING_AGE_MONTHS = { min: 4, max: 24 } as const;

/** Growth-curve shape: A ≈ 0.90 (birth weight ≈ 10 % of mature), k per month. */
const CURVE_A = 0.9012;
const CURVE_K_PER_MONTH = 0.076935;
const DAYS_PER_MONTH = 365.25 / 12;

/** Share of mature body weight reached at `ageMonths` on the growth curve (0–1). */
export function fractionOfMatureWeight(ageMonths: number): number {
  return 1 - CURVE_A * Math.exp(-CURVE_K_PER_MONTH * ageMonths);
}

/**
 * Mature body weight (kg) implied by a current weight at a given age, on the growth curve.
 * A 216 kg six-month-old implies a 500 kg adult.
 */
export function impliedMatureWeightKg(bodyWeightKg: number, ageMonths: number): number {
  return bodyWeightKg / fractionOfMatureWeight(ageMonths);
}

/** Expected average daily gain, kg/day, at `ageMonths` for a horse of the given mature weight. */
export function averageDailyGainKg(matureWeightKg: number, ageMonths: number): number {
  const gainPerMonth = matureWeightKg * CURVE_A * CURVE_K_PER_MONTH * Math.exp(-CURVE_K_PER_MONTH * ageMonths);
  return gainPerMonth / DAYS_PER_MONTH;
}

/**
 * Efficiency of use of dietary protein for gain in NRC 2007, falling with age (memory):
 * 50 % to 6 months, 45 % months 7–8, 40 % months 9–10, 35 % month 11, 30 % from 12 months.
 */
export function proteinEfficiencyForGain(ageMonths: number): number {
  if (ageMonths < 7) return 0.5;
  if (ageMonths < 9) return 0.45;
  if (ageMonths < 11) return 0.4;
  if (ageMonths < 12) return 0.35;
  return 0.3;
}

export interface GrowingRequirements {
  /** Digestible energy, Mcal/day. */
  readonly deMcalPerDay: number;
  /** Crude protein, g/day. */
  readonly crudeProteinGPerDay: number;
  /** Calcium, g/day. */
  readonly calciumGPerDay: number;
  /** Phosphorus, g/day. */
  readonly phosphorusGPerDay: number;
  /** Mature weight implied by the growth curve, kg. */
  readonly matureBodyWeightKg: number;
  /** Average daily gain assumed, kg/day. */
  readonly averageDailyGainKg: number;
}

/**
 * NRC 2007 growing-horse requirements (all equations from memory), x = age in months:
 * - DE (Mcal/d) = 56.5·x^−0.145 · BW/1000 + (1.99 + 1.21·x − 0.021·x²) · ADG
 * - CP (g/d) = 1.44·BW + ADG·1000 · 0.20 / E / 0.79, with E from {@link proteinEfficiencyForGain}
 *   (20 % protein in gain, 79 % digestibility)
 * - Ca (g/d) = 0.072·BW + 32·ADG; P (g/d) = 0.04·BW + 17.8·ADG
 *
 * @param bodyWeightKg current body weight, kg
 * @param ageMonths age in months, 4–24 (caller validates)
 */
export function growingRequirements(bodyWeightKg: number, ageMonths: number): GrowingRequirements {
  const matureBodyWeightKg = impliedMatureWeightKg(bodyWeightKg, ageMonths);
  const adg = averageDailyGainKg(matureBodyWeightKg, ageMonths);
  const x = ageMonths;
  const deMcalPerDay = ((56.5 * x ** -0.145) * bodyWeightKg) / 1000 + (1.99 + 1.21 * x - 0.021 * x * x) * adg;
  const crudeProteinGPerDay = 1.44 * bodyWeightKg + (adg * 1000 * 0.2) / proteinEfficiencyForGain(x) / 0.79;
  return {
    deMcalPerDay,
    crudeProteinGPerDay,
    calciumGPerDay: 0.072 * bodyWeightKg + 32 * adg,
    phosphorusGPerDay: 0.04 * bodyWeightKg + 17.8 * adg,
    matureBodyWeightKg,
    averageDailyGainKg: adg,
  };
}
