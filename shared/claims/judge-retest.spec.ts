import { DEFAULT_SETTINGS } from '../contracts/platform-settings';
import { judgeRetest } from './judge-retest';

// Listed: the domain brief's worked alfalfa (§3: CP 20, ADF 30, NDF 40 on DM, 88 % DM).
const listed = { forageClass: 'legume' as const, basis: 'dm' as const, dryMatterPct: 88, crudeProteinPct: 20, adfPct: 30, ndfPct: 40 };

describe('judgeRetest', () => {
  it('finds a retest within the published between-lab variation (CP ±2, ADF ±2, NDF ±2.8 units; Hay & Forage Grower, Meyer) to agree', () => {
    const j = judgeRetest(listed, { ...listed, crudeProteinPct: 18.5, adfPct: 31.5, ndfPct: 42.5 }, DEFAULT_SETTINGS.tolerances);
    expect(j.outside).toEqual([]);
    expect(j.nutrients.find((n) => n.field === 'crudeProteinPct')).toMatchObject({ listed: 20, retest: 18.5, difference: -1.5, tolerance: 2 });
  });

  it('flags nutrients beyond tolerance, and that the retest changes the grade', () => {
    const j = judgeRetest(listed, { ...listed, crudeProteinPct: 16, adfPct: 36, ndfPct: 48 }, DEFAULT_SETTINGS.tolerances);
    expect(j.outside).toEqual(['Crude protein (CP)', 'Acid detergent fibre (ADF)', 'Neutral detergent fibre (NDF)']);
    expect(j.gradeChanged).toBe(true);
    // RFV (Rohweder et al. 1978): (88.9 − 0.779·30)·(120/40)/1.29 ≈ 152; with ADF 36, NDF 48: (88.9 − 28.04)·2.5/1.29 ≈ 118.
    expect(j.listed.rfv).toBe(152);
    expect(j.retest.rfv).toBe(118);
  });

  it('compares an as-fed retest on dry matter (as-fed ÷ DM share, domain brief §1)', () => {
    const j = judgeRetest(listed, { ...listed, basis: 'asFed', dryMatterPct: 90, crudeProteinPct: 18, adfPct: 27, ndfPct: 36 }, DEFAULT_SETTINGS.tolerances);
    expect(j.nutrients.find((n) => n.field === 'crudeProteinPct')!.retest).toBeCloseTo(20, 6);
    expect(j.outside).toEqual([]);
  });
});
