import { AFGC_GRADES, USDA_ALFALFA_GRADES, USDA_GRASS_GRADES } from './grade-names';
import type { AfgcGrade, ForageClass, Grades, UsdaCriterion, UsdaGrade } from './forage-contract';
import { roundTo } from '../units/rounding';

/*
 * Hay grades, all on a DM basis.
 *
 * USDA AMS Market News guidelines (effective 2003; Cash & Dixon, Montana State Ext.;
 * Missouri Market News "National hay test guidelines"). Alfalfa (< 10% grass):
 *
 *   Grade    ADF    NDF    RFV      TDN(western)  CP
 *   Supreme  <27    <34    >185     >62           >22
 *   Premium  27–29  34–36  170–185  60.5–62       20–22
 *   Good     29–32  36–40  150–170  58–60         18–20
 *   Fair     32–35  40–44  130–150  56–58         16–18
 *   Utility  >35    >44    <130     <56           <16
 *
 * Grass: Premium CP >13, Good 9–13, Fair 5–9, Low <5.
 * The Premium TDN floor is 60.5 in the AMS table as reproduced with its 90%-DM column
 * (54.5 = 0.9·60.5); the Montana transcription prints "60–62".
 *
 * TIE RULE (shared band endpoints, e.g. ADF 29 is printed in Premium and Good): a value on a
 * shared endpoint takes the BETTER grade. The top and bottom bands are open as printed
 * ("<27", ">35"), so this makes every band a contiguous half-open interval
 * (Premium 27 ≤ ADF ≤ 29, Good 29 < ADF ≤ 32, …) with no gaps. Where the printed table leaves
 * a gap (TDN 60–60.5), a value that does not reach a band's limit falls to the band below.
 *
 * PRECISION: every value is compared at the report's own precision, two decimals (lab reports print
 * nutrients to one or two decimals and RFV/TDN to at most two — common practice). A basis change carries
 * float error (16.56 as fed at 92% DM is 17.999999999999996 on DM, not 18); rounding first means a
 * value that is on an edge in the report is on the edge here, in either basis, while two values a
 * report can tell apart (18.00 and 17.99) still grade apart.
 *
 * Overall grade = the lowest grade any criterion gives; `basis` names the criterion that set
 * it (first in table order when several tie).
 *
 * 'mixed' hay is graded on the alfalfa table: RFV was built for legume and legume/grass hay,
 * and Illinois' guideline groups "Alfalfa, Alfalfa/Mix grass" on one table. A finding says so.
 *
 * AFGC legume grades (Hay Marketing Task Force), RFV bands: Prime >151, Grade 1 125–151,
 * Grade 2 103–124, Grade 3 87–102 (verified against UW–Madison hay market reports);
 * Grade 4 75–86 and Grade 5 <75 are from memory. Bands are printed as whole numbers: a value
 * qualifies for a band when it reaches the band's lower limit (Prime needs > 151; 151 is Grade 1;
 * 124.5 has not reached 125 and is Grade 2).
 */

type AlfalfaGrade = (typeof USDA_ALFALFA_GRADES)[number];

interface Band<G> {
  grade: G;
  limit: number;
  /** Whether a value equal to `limit` qualifies. */
  inclusive: boolean;
}

/** Decimals every graded value is rounded to before it meets a band limit (see PRECISION above). */
export const GRADE_DECIMALS = 2;

/** Best band whose limit the value, at report precision, reaches; `otherwise` when none. */
function band<G>(exact: number, direction: 'higher-is-better' | 'lower-is-better', bands: Band<G>[], otherwise: G): G {
  const value = roundTo(exact, GRADE_DECIMALS);
  for (const b of bands) {
    const reaches =
      direction === 'higher-is-better'
        ? b.inclusive ? value >= b.limit : value > b.limit
        : b.inclusive ? value <= b.limit : value < b.limit;
    if (reaches) return b.grade;
  }
  return otherwise;
}

function lowerIsBetter(supremeBelow: number, premiumMax: number, goodMax: number, fairMax: number): Band<AlfalfaGrade>[] {
  return [
    { grade: 'Supreme', limit: supremeBelow, inclusive: false },
    { grade: 'Premium', limit: premiumMax, inclusive: true },
    { grade: 'Good', limit: goodMax, inclusive: true },
    { grade: 'Fair', limit: fairMax, inclusive: true },
  ];
}

function higherIsBetter(supremeAbove: number, premiumMin: number, goodMin: number, fairMin: number): Band<AlfalfaGrade>[] {
  return [
    { grade: 'Supreme', limit: supremeAbove, inclusive: false },
    { grade: 'Premium', limit: premiumMin, inclusive: true },
    { grade: 'Good', limit: goodMin, inclusive: true },
    { grade: 'Fair', limit: fairMin, inclusive: true },
  ];
}

const ALFALFA_BANDS: Record<UsdaCriterion, { direction: 'higher-is-better' | 'lower-is-better'; bands: Band<AlfalfaGrade>[] }> = {
  adf: { direction: 'lower-is-better', bands: lowerIsBetter(27, 29, 32, 35) },
  ndf: { direction: 'lower-is-better', bands: lowerIsBetter(34, 36, 40, 44) },
  rfv: { direction: 'higher-is-better', bands: higherIsBetter(185, 170, 150, 130) },
  tdn: { direction: 'higher-is-better', bands: higherIsBetter(62, 60.5, 58, 56) },
  crudeProtein: { direction: 'higher-is-better', bands: higherIsBetter(22, 20, 18, 16) },
};

/** Table order of the alfalfa criteria; breaks ties when naming the limiting criterion. */
const ALFALFA_CRITERIA: readonly UsdaCriterion[] = ['adf', 'ndf', 'rfv', 'tdn', 'crudeProtein'];

/** DM-basis values the USDA alfalfa table grades on. */
export interface AlfalfaGradeInputs {
  adfPct: number;
  ndfPct: number;
  rfv: number;
  /** TDN by the western ADF equation, % DM (the equation behind the table's TDN column). */
  tdnWesternPct: number;
  crudeProteinPct: number;
}

/** Grade a single criterion alone gives on the USDA alfalfa table. */
export function usdaAlfalfaCriterionGrade(criterion: UsdaCriterion, value: number): AlfalfaGrade {
  const { direction, bands } = ALFALFA_BANDS[criterion];
  return band(value, direction, bands, 'Utility');
}

/** USDA AMS alfalfa grade: the lowest grade any of ADF, NDF, RFV, TDN and CP gives. */
export function usdaAlfalfaGrade(inputs: AlfalfaGradeInputs): UsdaGrade {
  const values: Record<UsdaCriterion, number> = {
    adf: inputs.adfPct,
    ndf: inputs.ndfPct,
    rfv: inputs.rfv,
    tdn: inputs.tdnWesternPct,
    crudeProtein: inputs.crudeProteinPct,
  };
  const criteria = ALFALFA_CRITERIA.map((criterion) => ({
    criterion,
    name: usdaAlfalfaCriterionGrade(criterion, values[criterion]),
  }));
  let limiting = criteria[0]!;
  for (const c of criteria) {
    if (USDA_ALFALFA_GRADES.indexOf(c.name) > USDA_ALFALFA_GRADES.indexOf(limiting.name)) limiting = c;
  }
  return { name: limiting.name, basis: limiting.criterion, table: 'usda-ams-2003-alfalfa', criteria };
}

const GRASS_CP_BANDS: Band<(typeof USDA_GRASS_GRADES)[number]>[] = [
  { grade: 'Premium', limit: 13, inclusive: false },
  { grade: 'Good', limit: 9, inclusive: true },
  { grade: 'Fair', limit: 5, inclusive: true },
];

const AFGC_RFV_BANDS: Band<(typeof AFGC_GRADES)[number]>[] = [
  { grade: 'Prime', limit: 151, inclusive: false },
  { grade: 'Grade 1', limit: 125, inclusive: true },
  { grade: 'Grade 2', limit: 103, inclusive: true },
  { grade: 'Grade 3', limit: 87, inclusive: true },
  { grade: 'Grade 4', limit: 75, inclusive: true }, // from memory
];

/** USDA AMS grass grade from crude protein (% DM). */
export function usdaGrassGrade(crudeProteinPct: number): UsdaGrade {
  const name = band<(typeof USDA_GRASS_GRADES)[number]>(crudeProteinPct, 'higher-is-better', GRASS_CP_BANDS, 'Low');
  return {
    name,
    basis: 'crudeProtein',
    table: 'usda-ams-2003-grass',
    criteria: [{ criterion: 'crudeProtein', name }],
  };
}

/** AFGC legume grade from RFV. */
export function afgcLegumeGrade(rfv: number): AfgcGrade {
  const name = band<(typeof AFGC_GRADES)[number]>(rfv, 'higher-is-better', AFGC_RFV_BANDS, 'Grade 5'); // Grade 5 from memory
  return { name, basis: 'rfv' };
}

/** All grades for a lot: legume and mixed on the alfalfa table plus AFGC; grass on CP only. */
export function gradeForage(forageClass: ForageClass, inputs: AlfalfaGradeInputs): Grades {
  if (forageClass === 'grass') return { usda: usdaGrassGrade(inputs.crudeProteinPct), afgc: null };
  return { usda: usdaAlfalfaGrade(inputs), afgc: afgcLegumeGrade(inputs.rfv) };
}

/** The USDA rule in one line, for places that show a grade without its measures (lot cards). */
export const USDA_GRADE_RULE_SHORT =
  'USDA grade: alfalfa and mixed hay take the worst grade of ADF, NDF, RFV, TDN and crude protein; grass hay is graded on crude protein alone.';

const CRITERION_NAMES: Record<UsdaCriterion, string> = { adf: 'ADF', ndf: 'NDF', rfv: 'RFV', tdn: 'TDN', crudeProtein: 'crude protein' };

/** The USDA grading rule in words, naming the measure that set this grade. */
export function usdaGradeRule(grade: UsdaGrade): string {
  if (grade.table === 'usda-ams-2003-grass') {
    return `USDA AMS grass hay is graded on crude protein alone (Premium above 13 %, Good 9–13 %, Fair 5–9 %, Low below 5 % of dry matter); this hay is ${grade.name}.`;
  }
  return (
    `The USDA AMS alfalfa grade is the worst grade any one measure gives (ADF, NDF, RFV, TDN and crude protein, on dry matter); ` +
    `here ${CRITERION_NAMES[grade.basis]} sets it at ${grade.name}.`
  );
}

/** The AFGC grading rule in words. */
export function afgcGradeRule(grade: AfgcGrade): string {
  return `AFGC legume grades follow RFV alone (Prime above 151, Grade 1 125–151, Grade 2 103–124, Grade 3 87–102, Grade 4 75–86, Grade 5 below 75); this hay is ${grade.name}.`;
}

/**
 * The limits of one graded measure, for drawing a value against its bands: grades best first, each with the
 * limit a value must reach for it (the last grade has none: it takes whatever reaches no limit).
 */
export interface GradeBandTable {
  criterion: UsdaCriterion;
  direction: 'higher-is-better' | 'lower-is-better';
  bands: { grade: string; limit: number | null }[];
}

/** Band limits of every measure the lot's USDA table grades on (the same numbers the grading uses). */
export function usdaBandTables(forageClass: ForageClass): GradeBandTable[] {
  if (forageClass === 'grass') {
    return [{ criterion: 'crudeProtein', direction: 'higher-is-better', bands: [...GRASS_CP_BANDS.map((b) => ({ grade: b.grade, limit: b.limit })), { grade: 'Low', limit: null }] }];
  }
  return ALFALFA_CRITERIA.map((criterion) => ({
    criterion,
    direction: ALFALFA_BANDS[criterion].direction,
    bands: [...ALFALFA_BANDS[criterion].bands.map((b) => ({ grade: b.grade, limit: b.limit })), { grade: 'Utility', limit: null }],
  }));
}

/** AFGC legume RFV limits, best first (Grade 5 takes the rest). */
export function afgcBandTable(): GradeBandTable['bands'] {
  return [...AFGC_RFV_BANDS.map((b) => ({ grade: b.grade, limit: b.limit })), { grade: 'Grade 5', limit: null }];
}
