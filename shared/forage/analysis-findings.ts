import type { Finding, ForageClass, HorseDeMethod, NscFlag, NscMethod, Nutrients } from './forage-contract';
import { dryMatterFromMoisture } from './dry-matter';
import { NSC_STRICT_LIMIT_PCT, NSC_UPPER_LIMIT_PCT } from './nsc';

/*
 * Findings on a lab analysis: consistency checks (is the report possible and self-consistent?)
 * and method notes (which equations the numbers came from, and health cautions).
 */

/** |reported RFV − computed RFV| above this is a warning (labs print whole numbers; 3 points allows rounding of ADF/NDF). */
export const RFV_TOLERANCE_POINTS = 3;
/** |DM% + moisture% − 100| above this is an error (allows each to be rounded to 0.1–0.25). */
export const DM_MOISTURE_TOLERANCE_PCT = 0.5;
/** Moisture above this is unsafe to store (domain brief §1, §10; Illinois Dept. Agric. gives 7–20% for marketed hay). */
export const SAFE_STORAGE_MOISTURE_PCT = 20;
/** Typical marketed-hay dry matter range, % (moisture 7–20%, Illinois Dept. Agric.). */
export const TYPICAL_DRY_MATTER_PCT = { min: 80, max: 93 } as const;
/** CP above which nitrate should be tested (Shewmaker, Univ. Idaho). */
export const NITRATE_TEST_CP_PCT = 25;
/** Fat above which the NRC/Pagan horse DE equation under-reads (KER: correct above 5% fat). */
export const HORSE_DE_HIGH_FAT_PCT = 5;

const VET_ADVICE = 'Consult your veterinarian or an equine nutritionist.';

type RangedField = keyof Omit<Nutrients, 'nscPct'> | 'ndfd48Pct';

/**
 * Plausible hay ranges, DM basis (NDFD: % of NDF). CP, NDF, fat, ash and NDFD are the RFQ
 * valid-input ranges (common practice); ADF is the RFV input range (domain brief §2);
 * sugars, starch, Ca and P are from memory.
 */
export const PLAUSIBLE_HAY_RANGES: Record<RangedField, { label: string; min: number; max: number }> = {
  crudeProteinPct: { label: 'Crude protein', min: 3, max: 35 },
  adfPct: { label: 'ADF', min: 15, max: 55 },
  ndfPct: { label: 'NDF', min: 20, max: 80 },
  fatPct: { label: 'Fat', min: 0.5, max: 8 },
  ashPct: { label: 'Ash', min: 3, max: 20 },
  ndfd48Pct: { label: '48-h NDFD', min: 20, max: 85 },
  escPct: { label: 'ESC', min: 0, max: 25 },
  wscPct: { label: 'WSC', min: 0, max: 35 },
  starchPct: { label: 'Starch', min: 0, max: 10 },
  calciumPct: { label: 'Calcium', min: 0.1, max: 2.5 },
  phosphorusPct: { label: 'Phosphorus', min: 0.05, max: 0.8 },
};

const CODE_STEM: Record<RangedField, string> = {
  crudeProteinPct: 'crude-protein',
  adfPct: 'adf',
  ndfPct: 'ndf',
  fatPct: 'fat',
  ashPct: 'ash',
  ndfd48Pct: 'ndfd48',
  escPct: 'esc',
  wscPct: 'wsc',
  starchPct: 'starch',
  calciumPct: 'calcium',
  phosphorusPct: 'phosphorus',
};

const pct = (value: number) => `${value.toFixed(1)}%`;

/** What the consistency checks look at; nutrients on DM basis. */
export interface ConsistencyInput {
  dryMatterPct: number;
  moisturePct: number | null;
  dm: Nutrients;
  ndfd48Pct: number | null;
  reportedRfv: number | null;
  computedRfv: number;
  /** NFC (% DM) when fat and ash are reported, else null. */
  nfcPct: number | null;
}

/** Checks that a reported analysis is possible, self-consistent and within hay ranges. */
export function consistencyFindings(input: ConsistencyInput): Finding[] {
  const { dm } = input;
  const findings: Finding[] = [];

  if (dm.ndfPct <= dm.adfPct) {
    findings.push({
      severity: 'error',
      code: 'ndf-below-adf',
      message: `NDF (${pct(dm.ndfPct)}) must be higher than ADF (${pct(dm.adfPct)}): ADF is part of NDF, so one of the two values is wrong.`,
    });
  }

  const sum = dm.crudeProteinPct + dm.ndfPct + (dm.fatPct ?? 0) + (dm.ashPct ?? 0);
  if (sum > 100) {
    findings.push({
      severity: 'error',
      code: 'cp-ndf-fat-ash-over-100',
      message: `Crude protein, NDF, fat and ash add up to ${pct(sum)} of dry matter, more than 100%; check the report for a typo or a mixed-up basis.`,
    });
  }

  if (input.nfcPct !== null && input.nfcPct < 0) {
    findings.push({
      severity: 'error',
      code: 'nfc-negative',
      message: `Non-fibre carbohydrate comes out at ${pct(input.nfcPct)}, below zero, so RFQ and summative TDN cannot be computed.`,
    });
  }

  if (input.moisturePct !== null) {
    const total = input.dryMatterPct + input.moisturePct;
    if (Math.abs(total - 100) > DM_MOISTURE_TOLERANCE_PCT) {
      findings.push({
        severity: 'error',
        code: 'dm-moisture-mismatch',
        message: `Dry matter (${pct(input.dryMatterPct)}) and moisture (${pct(input.moisturePct)}) should add up to 100% but add up to ${pct(total)}; moisture ${pct(input.moisturePct)} means ${pct(dryMatterFromMoisture(input.moisturePct))} dry matter.`,
      });
    }
  }

  if (input.reportedRfv !== null && Math.abs(input.reportedRfv - input.computedRfv) > RFV_TOLERANCE_POINTS) {
    findings.push({
      severity: 'warning',
      code: 'reported-rfv-mismatch',
      message: `The reported RFV (${input.reportedRfv.toFixed(0)}) differs from the RFV computed from ADF and NDF (${input.computedRfv.toFixed(1)}) by more than ${RFV_TOLERANCE_POINTS} points; check the ADF, NDF and basis entered.`,
    });
  }

  const moisturePct = 100 - input.dryMatterPct;
  if (moisturePct > SAFE_STORAGE_MOISTURE_PCT) {
    findings.push({
      severity: 'warning',
      code: 'moisture-above-safe-storage',
      message: `Moisture of ${pct(moisturePct)} is above the ~${SAFE_STORAGE_MOISTURE_PCT}% at which baled hay stores safely; it risks mould and heating.`,
    });
  } else if (input.dryMatterPct > TYPICAL_DRY_MATTER_PCT.max) {
    findings.push({
      severity: 'warning',
      code: 'dry-matter-outside-hay-range',
      message: `Dry matter of ${pct(input.dryMatterPct)} is drier than marketed hay usually tests (${TYPICAL_DRY_MATTER_PCT.min}–${TYPICAL_DRY_MATTER_PCT.max}%); check that a DM-basis value was not entered as the dry matter.`,
    });
  }

  const ranged: Record<RangedField, number | null> = { ...withoutNsc(dm), ndfd48Pct: input.ndfd48Pct };
  for (const field of Object.keys(PLAUSIBLE_HAY_RANGES) as RangedField[]) {
    const value = ranged[field];
    const range = PLAUSIBLE_HAY_RANGES[field];
    if (value === null || (value >= range.min && value <= range.max)) continue;
    const basis = field === 'ndfd48Pct' ? 'of NDF' : 'of dry matter';
    findings.push({
      severity: 'warning',
      code: `${CODE_STEM[field]}-outside-hay-range`,
      message: `${range.label} of ${pct(value)} ${basis} is outside the usual range for hay (${range.min}–${range.max}%).`,
    });
  }

  if (dm.escPct !== null && dm.wscPct !== null && dm.escPct > dm.wscPct) {
    findings.push({
      severity: 'warning',
      code: 'esc-above-wsc',
      message: `ESC (${pct(dm.escPct)}) is higher than WSC (${pct(dm.wscPct)}), but ESC is part of WSC; one of the two values is wrong.`,
    });
  }

  findings.push(...calciumPhosphorusFindings(dm.calciumPct, dm.phosphorusPct));

  if (dm.crudeProteinPct > NITRATE_TEST_CP_PCT) {
    findings.push({
      severity: 'info',
      code: 'high-protein-test-nitrate',
      message: `Crude protein above ${NITRATE_TEST_CP_PCT}% of dry matter: test for nitrate, as some of the protein may be non-protein nitrogen.`,
    });
  }

  return findings;
}

/**
 * Ca:P ratio bands for horses (experts123 equine-nutrition FAQ; common practice): never less calcium than
 * phosphorus (below 1:1 is "inverted" and draws calcium from bone); about 2:1 is the aim and 1.5–3:1 the
 * range for growing horses; mature horses tolerate up to about 8:1 when phosphorus is adequate. Alfalfa's
 * usual 4–6:1 is therefore not flagged; only an inverted ratio or one far above 8:1.
 */
export const CA_P_RATIO = { inverted: 1, matureMax: 8 } as const;

/** Findings on the calcium : phosphorus ratio of the hay (both % DM), when both are reported. */
export function calciumPhosphorusFindings(calciumPct: number | null, phosphorusPct: number | null): Finding[] {
  if (calciumPct === null || phosphorusPct === null || phosphorusPct <= 0) return [];
  const ratio = calciumPct / phosphorusPct;
  const text = `${ratio.toFixed(1)}:1`;
  const vet = 'Balance the ration with your veterinarian or an equine nutritionist.';
  if (ratio < CA_P_RATIO.inverted) {
    return [{ severity: 'warning', code: 'ca-p-inverted', message: `Calcium : phosphorus is ${text}, inverted (less calcium than phosphorus); fed alone this hay can draw calcium from the horse's bones. ${vet}` }];
  }
  if (ratio > CA_P_RATIO.matureMax) {
    return [{ severity: 'warning', code: 'ca-p-far-above-range', message: `Calcium : phosphorus is ${text}, far above the up to about ${CA_P_RATIO.matureMax}:1 that mature horses tolerate; check phosphorus is adequate. ${vet}` }];
  }
  return [];
}

function withoutNsc(dm: Nutrients): Omit<Nutrients, 'nscPct'> {
  const { nscPct: _nsc, ...rest } = dm;
  return rest;
}

/** What the method notes look at. */
export interface MethodNotesInput {
  forageClass: ForageClass;
  dm: Nutrients;
  ndfd48Pct: number | null;
  rfqComputed: boolean;
  nfcNegative: boolean;
  horseDeMethod: HorseDeMethod;
  nscMethod: NscMethod | null;
  nscFlag: NscFlag | null;
}

/** Notes on which equations produced the numbers, and health cautions on NSC. */
export function methodFindings(input: MethodNotesInput): Finding[] {
  const { dm } = input;
  const findings: Finding[] = [];

  if (!input.rfqComputed && !input.nfcNegative) {
    const missing = [
      input.ndfd48Pct === null ? '48-h NDFD' : null,
      dm.fatPct === null ? 'fat' : null,
      dm.ashPct === null ? 'ash' : null,
    ].filter((name): name is string => name !== null);
    findings.push({
      severity: 'info',
      code: 'rfq-inputs-missing',
      message: `RFQ and summative TDN need 48-h NDFD, fat and ash (missing: ${missing.join(', ')}); TDN was estimated from ADF with the western equation.`,
    });
  }

  if (input.forageClass === 'grass') {
    findings.push({
      severity: 'info',
      code: 'rfv-under-ranks-grass',
      message: 'RFV was built for legume hay and under-ranks grass; compare grass hays on RFQ, TDN and crude protein.',
    });
  }

  if (input.forageClass === 'mixed') {
    findings.push({
      severity: 'info',
      code: 'mixed-graded-as-alfalfa',
      message: 'Mixed legume/grass hay is graded on the USDA alfalfa table and AFGC legume bands, and its RFQ and TDN use the legume equations.',
    });
  }

  if (input.horseDeMethod === 'tdn-approximation') {
    findings.push({
      severity: 'info',
      code: 'horse-de-from-tdn',
      message: 'Horse digestible energy was approximated from TDN because fat and ash are not both reported (or the analysis does not add up); this approximation flatters mature grass hay.',
    });
  } else if (dm.fatPct !== null && dm.fatPct > HORSE_DE_HIGH_FAT_PCT) {
    findings.push({
      severity: 'info',
      code: 'horse-de-high-fat',
      message: `With fat above ${HORSE_DE_HIGH_FAT_PCT}% the horse DE equation tends to under-read energy.`,
    });
  }

  if (input.nscMethod === null && dm.starchPct === null && (dm.wscPct !== null || dm.escPct !== null)) {
    findings.push({
      severity: 'info',
      code: 'nsc-needs-starch',
      message: 'NSC is sugar plus starch; add the starch result to see NSC.',
    });
  }

  const definition = input.nscMethod === 'esc-plus-starch' ? 'ESC + starch' : 'WSC + starch';
  if (input.nscFlag === 'above-strict-limit') {
    findings.push({
      severity: 'warning',
      code: 'nsc-above-strict-limit',
      message: `NSC (${definition}) is at or above ${NSC_STRICT_LIMIT_PCT}% of dry matter, the strict limit often advised for horses prone to laminitis or insulin dysregulation (advice ranges up to ${NSC_UPPER_LIMIT_PCT}%). ${VET_ADVICE}`,
    });
  } else if (input.nscFlag === 'above-upper-limit') {
    findings.push({
      severity: 'warning',
      code: 'nsc-above-upper-limit',
      message: `NSC (${definition}) is at or above ${NSC_UPPER_LIMIT_PCT}% of dry matter, above the 10–12% limit advised for horses prone to laminitis or insulin dysregulation. ${VET_ADVICE}`,
    });
  }

  return findings;
}
