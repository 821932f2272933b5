import { evaluateForage } from './evaluate';
import type { ForageClass, ForageEvaluation, ForageEvaluationRequest, UsdaCriterion } from './forage-contract';
import { relativeFeedValue } from './rfv';
import { tdnFromAdf } from './tdn';

/*
 * Boundary sweep: every grade edge, and one report step (0.01) either side of it, entered on a dry-matter
 * basis and again as the same hay on an as-fed basis at several dry-matter contents, must give the grade the
 * published table gives — in both bases.
 *
 * Expected grades are the published bands, read with the tie rule of grades.ts (a value on a shared endpoint
 * takes the better grade; the open end bands are kept as printed):
 * - USDA AMS Market News alfalfa guidelines (2003), via Cash & Dixon, Montana State Ext. (S7) and Missouri
 *   Market News "National hay test guidelines" (S8): ADF <27/27–29/29–32/32–35/>35, NDF <34/34–36/36–40/40–44/>44,
 *   RFV >185/170–185/150–170/130–150/<130, TDN >62/60.5–62/58–60/56–58/<56, CP >22/20–22/18–20/16–18/<16.
 * - USDA AMS grass: CP >13 Premium, 9–13 Good, 5–9 Fair, <5 Low (S7, S8).
 * - AFGC legume RFV bands: Prime >151, 1: 125–151, 2: 103–124, 3: 87–102 (UW–Madison hay market report, S9);
 *   4: 75–86, 5: <75 from memory.
 */

type Edge = { label: string; criterion: UsdaCriterion | 'afgc-rfv' | 'grass-cp'; value: number; grade: string };

const ALFALFA: [UsdaCriterion, 'lower' | 'higher', [number, number, number, number]][] = [
  ['adf', 'lower', [27, 29, 32, 35]],
  ['ndf', 'lower', [34, 36, 40, 44]],
  ['rfv', 'higher', [185, 170, 150, 130]],
  ['tdn', 'higher', [62, 60.5, 58, 56]],
  ['crudeProtein', 'higher', [22, 20, 18, 16]],
];
const ALFALFA_NAMES = ['Supreme', 'Premium', 'Good', 'Fair', 'Utility'];

/** The edge itself and one 0.01 step on each side, with the grade the printed table gives each. */
function alfalfaEdges(): Edge[] {
  const edges: Edge[] = [];
  for (const [criterion, better, limits] of ALFALFA) {
    const step = better === 'lower' ? -0.01 : 0.01;
    limits.forEach((limit, i) => {
      // The first limit is the open Supreme edge (<27, >185): the limit itself is Premium.
      const onEdge = i === 0 ? ALFALFA_NAMES[1]! : ALFALFA_NAMES[i]!;
      const betterSide = ALFALFA_NAMES[i]!;
      const worseSide = ALFALFA_NAMES[i + 1]!;
      edges.push({ label: `${criterion} ${limit}`, criterion, value: limit, grade: onEdge });
      edges.push({ label: `${criterion} ${limit} better side`, criterion, value: twoPlaces(limit + step), grade: betterSide });
      // Below the printed gap TDN 60–60.5, 60.49 has not reached Premium's 60.5 and falls to Good.
      edges.push({ label: `${criterion} ${limit} worse side`, criterion, value: twoPlaces(limit - step), grade: i === 0 ? onEdge : worseSide });
    });
  }
  return edges;
}

const GRASS: Edge[] = [
  { label: 'grass CP 13.01', criterion: 'grass-cp', value: 13.01, grade: 'Premium' },
  { label: 'grass CP 13', criterion: 'grass-cp', value: 13, grade: 'Good' },
  { label: 'grass CP 9', criterion: 'grass-cp', value: 9, grade: 'Good' },
  { label: 'grass CP 8.99', criterion: 'grass-cp', value: 8.99, grade: 'Fair' },
  { label: 'grass CP 5', criterion: 'grass-cp', value: 5, grade: 'Fair' },
  { label: 'grass CP 4.99', criterion: 'grass-cp', value: 4.99, grade: 'Low' },
];

const AFGC: Edge[] = [
  [151.01, 'Prime'],
  [151, 'Grade 1'],
  [125, 'Grade 1'],
  [124.99, 'Grade 2'],
  [103, 'Grade 2'],
  [102.99, 'Grade 3'],
  [87, 'Grade 3'],
  [86.99, 'Grade 4'],
  [75, 'Grade 4'],
  [74.99, 'Grade 5'],
].map(([value, grade]) => ({ label: `AFGC RFV ${value}`, criterion: 'afgc-rfv', value: value as number, grade: grade as string }));

/** Dry-matter contents of marketed hay (7–20% moisture, domain brief §1) plus the 92% of the reported case. */
const DRY_MATTER = [80, 85.5, 87.3, 88, 89.9, 90, 91.1, 92, 93.7];

/** Hay that is Supreme/Prime on every criterion, so a single criterion can be moved alone. */
const BASE = { crudeProteinPct: 24, adfPct: 25, ndfPct: 31 };

/** DM-basis CP/ADF/NDF that put the edge criterion at `value`. */
function dmInputs(edge: Edge): { crudeProteinPct: number; adfPct: number; ndfPct: number } {
  switch (edge.criterion) {
    case 'crudeProtein':
    case 'grass-cp':
      return { ...BASE, crudeProteinPct: edge.value };
    case 'adf':
      return { ...BASE, adfPct: edge.value, ndfPct: 45 };
    case 'ndf':
      return { ...BASE, ndfPct: edge.value };
    case 'tdn':
      // ADF whose western TDN equals the edge, found by bisection on the engine's own equation (an input, not a check).
      return { ...BASE, adfPct: solve((adf) => tdnFromAdf(adf, 'western'), edge.value, 10, 60), ndfPct: 45 };
    case 'rfv':
    case 'afgc-rfv':
      // NDF whose RFV at ADF 30 equals the edge (RFV falls as NDF rises).
      return { ...BASE, adfPct: 30, ndfPct: solve((ndf) => relativeFeedValue(30, ndf), edge.value, 20, 99) };
  }
}

function gradeOf(edge: Edge, evaluation: ForageEvaluation): string | undefined {
  if (edge.criterion === 'afgc-rfv') return evaluation.grades.afgc?.name;
  if (edge.criterion === 'grass-cp') return evaluation.grades.usda.name;
  return evaluation.grades.usda.criteria.find((c) => c.criterion === edge.criterion)?.name;
}

describe('grade boundaries, dry-matter and as-fed entry', () => {
  const edges = [...alfalfaEdges(), ...GRASS, ...AFGC];

  it.each(edges.map((e) => [e.label, e] as const))('%s gives the published grade in both bases', (_label, edge) => {
    const forageClass: ForageClass = edge.criterion === 'grass-cp' ? 'grass' : 'legume';
    const dm = dmInputs(edge);
    for (const dryMatterPct of DRY_MATTER) {
      const onDm = evaluateForage({ forageClass, basis: 'dm', dryMatterPct, ...dm });
      const asFed: ForageEvaluationRequest = {
        forageClass,
        basis: 'asFed',
        dryMatterPct,
        crudeProteinPct: typed((dm.crudeProteinPct * dryMatterPct) / 100),
        adfPct: typed((dm.adfPct * dryMatterPct) / 100),
        ndfPct: typed((dm.ndfPct * dryMatterPct) / 100),
      };
      const onAsFed = evaluateForage(asFed);
      expect({ dryMatterPct, basis: 'dm', grade: gradeOf(edge, onDm) }).toEqual({ dryMatterPct, basis: 'dm', grade: edge.grade });
      expect({ dryMatterPct, basis: 'asFed', grade: gradeOf(edge, onAsFed) }).toEqual({ dryMatterPct, basis: 'asFed', grade: edge.grade });
      expect(onAsFed.grades).toEqual(onDm.grades);
    }
  });

  // The case reported: a lab's as-fed column at 92% DM that is exactly 18.00 / 31.00 / 39.00 on DM.
  it('grades CP 16.56 / ADF 28.52 / NDF 35.88 as fed at 92% DM like 18 / 31 / 39 on DM (USDA Good, S7)', () => {
    const asFed = evaluateForage({ forageClass: 'legume', basis: 'asFed', dryMatterPct: 92, crudeProteinPct: 16.56, adfPct: 28.52, ndfPct: 35.88 });
    const dm = evaluateForage({ forageClass: 'legume', basis: 'dm', dryMatterPct: 92, crudeProteinPct: 18, adfPct: 31, ndfPct: 39 });
    // CP 18 is Good by the tie rule (18–20), ADF 31 Good (29–32), NDF 39 Good (36–40): overall Good.
    expect(asFed.grades.usda.criteria.find((c) => c.criterion === 'crudeProtein')?.name).toBe('Good');
    expect(asFed.grades.usda.name).toBe('Good');
    expect(asFed.grades).toEqual(dm.grades);
  });
});

/** A value as a person types it off a report: the decimal printed to six places, not the float product. */
function typed(value: number): number {
  return Number(value.toFixed(6));
}

function twoPlaces(value: number): number {
  return Number(value.toFixed(2));
}

/** x in [lo, hi] with f(x) = target for a monotone f, by bisection. */
function solve(f: (x: number) => number, target: number, lo: number, hi: number): number {
  const rising = f(hi) > f(lo);
  for (let i = 0; i < 200; i++) {
    const mid = (lo + hi) / 2;
    if (f(mid) < target === rising) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}
