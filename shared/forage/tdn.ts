import type { ForageClass, TdnMethod } from './forage-contract';

/*
 * Total digestible nutrients (TDN, % of DM).
 *
 * Summative: NRC (2001) Dairy in the form Undersander & Moore (2002) use for RFQ, with
 * 48-h NDFD in place of the lignin term (UGA Georgia Forages glossary, "TDN"). The glossary
 * assigns the legume equation to "alfalfa, clovers and legume/grass mixtures", so 'mixed'
 * hay uses the legume equation here.
 *
 * ADF-only equations differ by ~6 TDN points on the same hay, hence a method id with every TDN.
 */

/** NDFn ≈ 0.93·NDF when NDICP is not measured (UGA glossary). */
export const NDFN_FACTOR = 0.93;

/** ADF-only TDN equations: 'western' (Western/California), 'osu' (Oklahoma State), 'penn-state'. */
export type AdfTdnEquation = 'western' | 'osu' | 'penn-state';

/**
 * TDN (% DM) from ADF (% DM) alone.
 * - western: 82.38 − 0.7515·ADF — the formula behind the USDA AMS TDN column (Undersander,
 *   UW "Using digestible NDF" slides; Goeser & Mertens, Hay & Forage Grower).
 * - osu: 88.9 − 0.78·ADF (Oklahoma State forage lab).
 * - penn-state: NEL (Mcal/lb) = 1.044 − 0.0119·ADF, TDN = 4.898 + 89.796·NEL (Undersander slides, "From Pennsylvania").
 */
export function tdnFromAdf(adfPct: number, equation: AdfTdnEquation = 'western'): number {
  switch (equation) {
    case 'western':
      return 82.38 - 0.7515 * adfPct;
    case 'osu':
      return 88.9 - 0.78 * adfPct;
    case 'penn-state':
      return 4.898 + 89.796 * (1.044 - 0.0119 * adfPct);
  }
}

/** Nitrogen-free NDF (% DM), estimated as 0.93·NDF. */
export function nitrogenFreeNdf(ndfPct: number): number {
  return NDFN_FACTOR * ndfPct;
}

/** Lab values (% DM) the summative TDN needs. */
export interface SummativeInputs {
  crudeProteinPct: number;
  ndfPct: number;
  fatPct: number;
  ashPct: number;
  /** 48-h in-vitro NDF digestibility, % of NDF. */
  ndfd48Pct: number;
}

/** Non-fibre carbohydrate, % DM: NFC = 100 − (NDFn + CP + EE + ash). Negative means an impossible analysis. */
export function nonFiberCarbohydrate(input: Omit<SummativeInputs, 'ndfd48Pct'>): number {
  return 100 - (nitrogenFreeNdf(input.ndfPct) + input.crudeProteinPct + input.fatPct + input.ashPct);
}

/**
 * Fatty acids, % DM: FA = EE − 1 (NRC 2001), floored at 0 so a very lean hay adds no negative
 * fat energy (the floor is from memory of NRC 2001).
 */
export function fattyAcids(fatPct: number): number {
  return Math.max(fatPct - 1, 0);
}

/** Grass NDF digestibility adjusted for the summative equation: NDFDp = 22.7 + 0.664·NDFD. */
export function grassAdjustedNdfd(ndfd48Pct: number): number {
  return 22.7 + 0.664 * ndfd48Pct;
}

/** Summative TDN (% DM), legume: 0.98·NFC + 0.93·CP + 0.97·2.25·FA + NDFn·NDFD/100 − 7. */
export function summativeTdnLegume(input: SummativeInputs): number {
  return (
    0.98 * nonFiberCarbohydrate(input) +
    0.93 * input.crudeProteinPct +
    0.97 * 2.25 * fattyAcids(input.fatPct) +
    (nitrogenFreeNdf(input.ndfPct) * input.ndfd48Pct) / 100 -
    7
  );
}

/** Summative TDN (% DM), grass: 0.98·NFC + 0.87·CP + 0.97·2.25·FA + NDFn·NDFDp/100 − 10. */
export function summativeTdnGrass(input: SummativeInputs): number {
  return (
    0.98 * nonFiberCarbohydrate(input) +
    0.87 * input.crudeProteinPct +
    0.97 * 2.25 * fattyAcids(input.fatPct) +
    (nitrogenFreeNdf(input.ndfPct) * grassAdjustedNdfd(input.ndfd48Pct)) / 100 -
    10
  );
}

/** The summative equation a forage class uses ('mixed' → legume, see file note). */
export function summativeEquationFor(forageClass: ForageClass): 'legume' | 'grass' {
  return forageClass === 'grass' ? 'grass' : 'legume';
}

/** DM-basis analysis from which TDN is chosen; absent nutrients are null. */
export interface TdnInputs {
  forageClass: ForageClass;
  crudeProteinPct: number;
  adfPct: number;
  ndfPct: number;
  fatPct: number | null;
  ashPct: number | null;
  ndfd48Pct: number | null;
}

/** TDN with the id of the equation that produced it. */
export interface TdnResult {
  tdnPct: number;
  method: TdnMethod;
}

/**
 * TDN (% DM) by the best method the inputs allow: summative when fat, ash and NDFD are
 * present and NFC ≥ 0 (preferred; Goeser & Mertens), otherwise the western ADF equation.
 */
export function totalDigestibleNutrients(input: TdnInputs): TdnResult {
  const { fatPct, ashPct, ndfd48Pct } = input;
  if (fatPct !== null && ashPct !== null && ndfd48Pct !== null) {
    const summative = { ...input, fatPct, ashPct, ndfd48Pct };
    if (nonFiberCarbohydrate(summative) >= 0) {
      return summativeEquationFor(input.forageClass) === 'grass'
        ? { tdnPct: summativeTdnGrass(summative), method: 'summative-nrc2001-grass' }
        : { tdnPct: summativeTdnLegume(summative), method: 'summative-nrc2001-legume' };
    }
  }
  return { tdnPct: tdnFromAdf(input.adfPct, 'western'), method: 'adf-western' };
}
