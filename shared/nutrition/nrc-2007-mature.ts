/**
 * NRC (2007) Nutrient Requirements of Horses, 6th rev. ed. — daily requirements of mature horses,
 * expressed per kg of body weight (BW) so they apply to any mature weight.
 *
 * Why per-kg coefficients: every NRC 2007 term for mature horses is proportional to BW
 * (maintenance, the work multipliers, milk yield taken as a share of BW, conceptus growth from a
 * foal birth weight that is a share of the mare's BW). Dividing a 500 kg table row by 500 therefore
 * reproduces the table for other weights. Broodmares by month are in nrc-2007-reproduction.ts.
 *
 * Provenance of each number is recorded beside it; `verified` means checked against a published
 * secondary summary during implementation, `memory` means not re-checked.
 */

import type { SteadyHorseClass } from './horse-class';

/** Daily requirement coefficients per kg BW, and the dry-matter intake band as a fraction of BW. */
export interface MatureCoefficients {
  /** Digestible energy, Mcal per kg BW per day. */
  readonly deMcalPerKgBw: number;
  /** Crude protein, g per kg BW per day. */
  readonly crudeProteinGPerKgBw: number;
  /** Calcium, g per kg BW per day. */
  readonly calciumGPerKgBw: number;
  /** Phosphorus, g per kg BW per day. */
  readonly phosphorusGPerKgBw: number;
  /** Dry-matter intake, fraction of BW per day: planning minimum, typical, maximum. */
  readonly dmiFractionOfBw: { readonly min: number; readonly typical: number; readonly max: number };
  /** Human-readable provenance, returned to callers as `source`. */
  readonly source: string;
}

/**
 * Average maintenance DE, 0.0333 Mcal/kg BW/day (16.7 Mcal at 500 kg).
 * Verified: Merck Veterinary Manual, "Nutritional Requirements of Horses and Other Equids"
 * (Liburt, 2026, citing NRC 2007) table row "0.0333 × kg BW"; the 500 kg range 15.2–18.2 Mcal
 * (minimum 0.0303, elevated 0.0363) matches hoofrehab.com "NRC plus Kellon quick glance".
 */
export const MAINTENANCE_DE_MCAL_PER_KG = 0.0333;

/** Elevated maintenance DE, 0.0363 Mcal/kg BW/day; very heavy work multiplies this one. Verified as above. */
export const ELEVATED_MAINTENANCE_DE_MCAL_PER_KG = 0.0363;

export const MATURE_DMI = { min: 0.015, typical: 0.02, max: 0.025 } as const;

const NRC = 'NRC (2007) Nutrient Requirements of Horses';

/** Minimum maintenance DE, 0.0303 Mcal/kg BW/day (15.2 Mcal at 500 kg). Verified as above. */
export const MINIMUM_MAINTENANCE_DE_MCAL_PER_KG = 0.0303;

export const MATURE_COEFFICIENTS: Readonly<Record<SteadyHorseClass, MatureCoefficients>> = {
  'minimum-maintenance': {
    deMcalPerKgBw: MINIMUM_MAINTENANCE_DE_MCAL_PER_KG,
    // 1.08 g/kg BW (540 g at 500 kg): table — Kellon's open 400 kg mare needs 432 g = 1.08 × 400.
    crudeProteinGPerKgBw: 1.08,
    // Same Ca/P as average maintenance: table — Kellon 400 kg open mare Ca 16 g = 0.04 × 400, P 11.2 g = 0.028 × 400.
    calciumGPerKgBw: 0.04,
    phosphorusGPerKgBw: 0.028,
    dmiFractionOfBw: MATURE_DMI,
    source: `${NRC}: minimum maintenance, DE 0.0303·BW Mcal (table), CP 1.08 g/kg BW (table), Ca 0.04 g/kg, P 0.028 g/kg (table)`,
  },
  'elevated-maintenance': {
    deMcalPerKgBw: ELEVATED_MAINTENANCE_DE_MCAL_PER_KG,
    // 1.44 g/kg BW (720 g at 500 kg): memory.
    crudeProteinGPerKgBw: 1.44,
    calciumGPerKgBw: 0.04, // memory (same as average maintenance)
    phosphorusGPerKgBw: 0.028, // memory
    dmiFractionOfBw: MATURE_DMI,
    source: `${NRC}: elevated maintenance, DE 0.0363·BW Mcal (table), CP 1.44 g/kg BW, Ca 0.04 g/kg, P 0.028 g/kg (from memory)`,
  },
  maintenance: {
    deMcalPerKgBw: MAINTENANCE_DE_MCAL_PER_KG,
    // 630 g at 500 kg — verified (hoofrehab.com NRC quick glance: 630–699 g average-to-light work).
    crudeProteinGPerKgBw: 1.26,
    // 20 g Ca / 14 g P at 1,100 lb — verified (Sparrow Valley Ranch fact sheet from NRC 2007:
    // 1,000/1,100/1,200 lb → Ca 18/20/22 g, P 13/14/15 g); coefficients 0.04 / 0.028 are memory.
    calciumGPerKgBw: 0.04,
    phosphorusGPerKgBw: 0.028,
    dmiFractionOfBw: MATURE_DMI,
    source: `${NRC}: average maintenance, DE 0.0333·BW Mcal, CP 1.26 g/kg BW, Ca 0.04 g/kg, P 0.028 g/kg`,
  },
  'light-work': {
    // ×1.2 of average maintenance — verified (Merck Vet Manual table, citing NRC 2007).
    deMcalPerKgBw: MAINTENANCE_DE_MCAL_PER_KG * 1.2,
    // 699 g at 500 kg — verified (hoofrehab.com). 699/500 = 1.398 ≈ the 1.40 often quoted.
    crudeProteinGPerKgBw: 699 / 500,
    // Ca 30 g, P 18 g at 500 kg — memory.
    calciumGPerKgBw: 30 / 500,
    phosphorusGPerKgBw: 18 / 500,
    dmiFractionOfBw: MATURE_DMI,
    source: `${NRC}: light work, DE 0.0333·BW × 1.2; CP 699 g per 500 kg`,
  },
  'moderate-work': {
    deMcalPerKgBw: MAINTENANCE_DE_MCAL_PER_KG * 1.4, // ×1.4 — verified (Merck).
    crudeProteinGPerKgBw: 768 / 500, // 768 g at 500 kg (≈ 1.54 g/kg) — memory.
    calciumGPerKgBw: 35 / 500, // memory
    phosphorusGPerKgBw: 21 / 500, // memory
    dmiFractionOfBw: MATURE_DMI,
    source: `${NRC}: moderate work, DE 0.0333·BW × 1.4; CP 768 g per 500 kg (CP from memory)`,
  },
  'heavy-work': {
    deMcalPerKgBw: MAINTENANCE_DE_MCAL_PER_KG * 1.6, // ×1.6 — verified (Merck).
    crudeProteinGPerKgBw: 862 / 500, // 862 g at 500 kg (≈ 1.72 g/kg) — memory.
    calciumGPerKgBw: 40 / 500, // memory
    phosphorusGPerKgBw: 29 / 500, // memory
    dmiFractionOfBw: MATURE_DMI,
    source: `${NRC}: heavy work, DE 0.0333·BW × 1.6; CP 862 g per 500 kg (CP from memory)`,
  },
  'very-heavy-work': {
    deMcalPerKgBw: ELEVATED_MAINTENANCE_DE_MCAL_PER_KG * 1.9, // elevated maintenance ×1.9 — verified (Merck).
    crudeProteinGPerKgBw: 1004 / 500, // 1,004 g at 500 kg (≈ 2.01 g/kg) — memory.
    calciumGPerKgBw: 40 / 500, // memory
    phosphorusGPerKgBw: 29 / 500, // memory
    dmiFractionOfBw: MATURE_DMI,
    source: `${NRC}: very heavy work, DE 0.0363·BW × 1.9; CP 1,004 g per 500 kg (CP from memory)`,
  },
};
