import type { HorseDe } from './forage-contract';
import { toAsFed } from './dry-matter';

/*
 * Digestible energy (DE) of hay for horses.
 *
 * NRC (2007) equation after Pagan (1998); Kentucky Equine Research confirms its inputs
 * (CP, fat, ADF, hemicellulose = NDF − ADF, NSC, ash). The coefficients are from memory of
 * NRC 2007 and reproduce the domain brief's worked hays. Its NSC term is NSC *by difference*
 * (100 − NDF − CP − EE − ash), the fraction KER derived it with; a lab's WSC/ESC + starch is a
 * much smaller number and would bias DE low, so it is not substituted here.
 * Unreliable for high-fat feeds and unusual fibre (beet pulp) (KER).
 */

/** Pounds per kilogram. */
export const LB_PER_KG = 2.2046;

/** Mcal DE per kg DM per TDN point (KER: DE ≈ 0.044·TDN%). */
export const DE_MCAL_PER_KG_PER_TDN_POINT = 0.044;

/** DM-basis inputs (%) of the NRC 2007 horse DE equation. */
export interface HorseDeInputs {
  crudeProteinPct: number;
  adfPct: number;
  ndfPct: number;
  fatPct: number;
  ashPct: number;
}

/** NSC by difference, % DM: 100 − NDF − CP − EE − ash (not the lab's WSC/ESC + starch). */
export function nscByDifference(input: HorseDeInputs): number {
  return 100 - input.ndfPct - input.crudeProteinPct - input.fatPct - input.ashPct;
}

/**
 * Horse DE, Mcal/kg DM (NRC 2007, after Pagan 1998):
 * 2.118 + 0.01218·CP − 0.00937·ADF − 0.00383·(NDF − ADF) + 0.04718·EE + 0.02035·NSC − 0.0262·ash.
 */
export function horseDeNrc2007(input: HorseDeInputs): number {
  return (
    2.118 +
    0.01218 * input.crudeProteinPct -
    0.00937 * input.adfPct -
    0.00383 * (input.ndfPct - input.adfPct) +
    0.04718 * input.fatPct +
    0.02035 * nscByDifference(input) -
    0.0262 * input.ashPct
  );
}

/** Horse DE, Mcal/kg DM, approximated from TDN (% DM). Flatters mature grass. */
export function horseDeFromTdn(tdnPct: number): number {
  return DE_MCAL_PER_KG_PER_TDN_POINT * tdnPct;
}

/** DM-basis analysis for horse DE; absent nutrients are null. */
export interface HorseDeAnalysis {
  crudeProteinPct: number;
  adfPct: number;
  ndfPct: number;
  fatPct: number | null;
  ashPct: number | null;
  /** TDN (% DM) used when the NRC equation cannot be applied. */
  tdnPct: number;
  /** Dry matter, % of the sample as fed, for the as-fed figures. */
  dryMatterPct: number;
}

/**
 * Horse DE on DM and as-fed bases, per kg and per lb. Uses the NRC 2007 equation when fat and
 * ash are reported and CP + NDF + fat + ash ≤ 100 (otherwise its NSC term is negative),
 * else the TDN approximation.
 */
export function horseDigestibleEnergy(analysis: HorseDeAnalysis): HorseDe {
  const { fatPct, ashPct } = analysis;
  let mcalPerKgDm: number;
  let method: HorseDe['method'];
  if (fatPct !== null && ashPct !== null && nscByDifference({ ...analysis, fatPct, ashPct }) >= 0) {
    mcalPerKgDm = horseDeNrc2007({ ...analysis, fatPct, ashPct });
    method = 'nrc-2007-pagan';
  } else {
    mcalPerKgDm = horseDeFromTdn(analysis.tdnPct);
    method = 'tdn-approximation';
  }
  const mcalPerKgAsFed = toAsFed(mcalPerKgDm, analysis.dryMatterPct);
  return {
    mcalPerKgDm,
    mcalPerLbDm: mcalPerKgDm / LB_PER_KG,
    mcalPerKgAsFed,
    mcalPerLbAsFed: mcalPerKgAsFed / LB_PER_KG,
    method,
  };
}
