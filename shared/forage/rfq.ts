import type { ForageClass } from './forage-contract';
import {
  nonFiberCarbohydrate,
  summativeEquationFor,
  summativeTdnGrass,
  summativeTdnLegume,
  type SummativeInputs,
} from './tdn';

/*
 * Relative Forage Quality (RFQ), Undersander & Moore (2002): RFQ = DMI(%BW)·TDN(%DM)/1.23.
 * Intake equations as in the 2002 paper (reproduced by the foragelab.com "Relative Forage
 * Quality" handout and independently coded the same way in SDSU's NIR/RFQ scripts).
 * 'mixed' hay uses the legume equations, following the UGA glossary's grouping of
 * legume/grass mixtures with legumes.
 */

/** Divisor giving RFQ about the same mean and range as RFV. */
export const RFQ_DIVISOR = 1.23;

/** Legume DMI, % BW: 120/NDF + (NDFD − 45)·0.374/1350·100. */
export function rfqDmiLegume(ndfPct: number, ndfd48Pct: number): number {
  return 120 / ndfPct + (((ndfd48Pct - 45) * 0.374) / 1350) * 100;
}

/**
 * Grass DMI, % BW: −2.318 + 0.442·CP − 0.0100·CP² − 0.0638·TDN + 0.000922·TDN² + 0.180·ADF
 * − 0.00196·ADF² − 0.00529·CP·ADF (all % DM; TDN is the grass summative TDN).
 */
export function rfqDmiGrass(crudeProteinPct: number, adfPct: number, tdnPct: number): number {
  const cp = crudeProteinPct;
  const adf = adfPct;
  return (
    -2.318 +
    0.442 * cp -
    0.01 * cp * cp -
    0.0638 * tdnPct +
    0.000922 * tdnPct * tdnPct +
    0.18 * adf -
    0.00196 * adf * adf -
    0.00529 * cp * adf
  );
}

/** RFQ (unitless) from intake (% BW) and TDN (% DM). */
export function relativeForageQuality(dmiPctBw: number, tdnPct: number): number {
  return (dmiPctBw * tdnPct) / RFQ_DIVISOR;
}

/** DM-basis inputs of RFQ; all required. */
export interface RfqInputs extends SummativeInputs {
  forageClass: ForageClass;
  adfPct: number;
}

/** RFQ with the TDN and intake behind it. */
export interface RfqResult {
  rfq: number;
  tdnPct: number;
  dmiPctBw: number;
  equations: 'legume' | 'grass';
}

/** RFQ, or null when NFC < 0 (an impossible analysis; the summative TDN is meaningless). */
export function computeRfq(input: RfqInputs): RfqResult | null {
  if (nonFiberCarbohydrate(input) < 0) return null;
  if (summativeEquationFor(input.forageClass) === 'grass') {
    const tdnPct = summativeTdnGrass(input);
    const dmiPctBw = rfqDmiGrass(input.crudeProteinPct, input.adfPct, tdnPct);
    return { rfq: relativeForageQuality(dmiPctBw, tdnPct), tdnPct, dmiPctBw, equations: 'grass' };
  }
  const tdnPct = summativeTdnLegume(input);
  const dmiPctBw = rfqDmiLegume(input.ndfPct, input.ndfd48Pct);
  return { rfq: relativeForageQuality(dmiPctBw, tdnPct), tdnPct, dmiPctBw, equations: 'legume' };
}
