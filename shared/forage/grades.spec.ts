import { afgcGradeRule, afgcLegumeGrade, gradeForage, usdaAlfalfaCriterionGrade, usdaAlfalfaGrade, usdaGradeRule, usdaGrassGrade } from './grades';
import { relativeFeedValue } from './rfv';
import { tdnFromAdf } from './tdn';

const supreme = { adfPct: 25, ndfPct: 30, rfv: 200, tdnWesternPct: 65, crudeProteinPct: 24 };

describe('grades', () => {
  // Source: USDA AMS Market News alfalfa guidelines (2003) via Cash & Dixon, Montana State Ext. (S7) and the
  // Missouri Market News "National hay test guidelines" (S8). Both sides of each band, including the tie rule:
  // a value on a shared endpoint takes the better grade; the printed open ends (<27, >35 …) are kept.
  describe('USDA alfalfa, one criterion at a time', () => {
    it.each([
      // ADF: Supreme <27, Premium 27–29, Good 29–32, Fair 32–35, Utility >35
      ['adf', 26.99, 'Supreme'],
      ['adf', 27, 'Premium'],
      ['adf', 29, 'Premium'], // tie → better grade
      ['adf', 29.01, 'Good'],
      ['adf', 32, 'Good'], // tie → better grade
      ['adf', 32.01, 'Fair'],
      ['adf', 35, 'Fair'],
      ['adf', 35.01, 'Utility'],
      // NDF: Supreme <34, Premium 34–36, Good 36–40, Fair 40–44, Utility >44
      ['ndf', 33.99, 'Supreme'],
      ['ndf', 34, 'Premium'],
      ['ndf', 36, 'Premium'], // tie → better grade
      ['ndf', 36.01, 'Good'],
      ['ndf', 40, 'Good'], // tie → better grade
      ['ndf', 40.01, 'Fair'],
      ['ndf', 44, 'Fair'],
      ['ndf', 44.01, 'Utility'],
      // RFV: Supreme >185, Premium 170–185, Good 150–170, Fair 130–150, Utility <130
      ['rfv', 185.01, 'Supreme'],
      ['rfv', 185, 'Premium'],
      ['rfv', 170, 'Premium'], // tie → better grade
      ['rfv', 169.99, 'Good'],
      ['rfv', 150, 'Good'], // tie → better grade
      ['rfv', 149.99, 'Fair'],
      ['rfv', 130, 'Fair'],
      ['rfv', 129.99, 'Utility'],
      // TDN (western, 100% DM): Supreme >62, Premium 60.5–62, Good 58–60, Fair 56–58, Utility <56
      ['tdn', 62.01, 'Supreme'],
      ['tdn', 62, 'Premium'],
      ['tdn', 60.5, 'Premium'],
      ['tdn', 60.49, 'Good'], // printed gap 60–60.5 falls to the band below
      ['tdn', 60, 'Good'],
      ['tdn', 58, 'Good'], // tie → better grade
      ['tdn', 57.99, 'Fair'],
      ['tdn', 56, 'Fair'],
      ['tdn', 55.99, 'Utility'],
      // CP: Supreme >22, Premium 20–22, Good 18–20, Fair 16–18, Utility <16
      ['crudeProtein', 22.01, 'Supreme'],
      ['crudeProtein', 22, 'Premium'],
      ['crudeProtein', 20, 'Premium'], // tie → better grade
      ['crudeProtein', 19.99, 'Good'],
      ['crudeProtein', 18, 'Good'], // tie → better grade
      ['crudeProtein', 17.99, 'Fair'],
      ['crudeProtein', 16, 'Fair'],
      ['crudeProtein', 15.99, 'Utility'],
    ] as const)('grades %s %s as %s', (criterion, value, grade) => {
      expect(usdaAlfalfaCriterionGrade(criterion, value)).toBe(grade);
    });
  });

  describe('USDA alfalfa, overall', () => {
    it('takes the lowest grade any criterion gives and names that criterion', () => {
      const grade = usdaAlfalfaGrade({ ...supreme, ndfPct: 41 });
      expect(grade).toMatchObject({ name: 'Fair', basis: 'ndf', table: 'usda-ams-2003-alfalfa' });
      expect(grade.criteria.find((c) => c.criterion === 'adf')?.name).toBe('Supreme');
    });

    it('names the first criterion in table order (ADF, NDF, RFV, TDN, CP) when several tie', () => {
      expect(usdaAlfalfaGrade({ ...supreme, rfv: 160, crudeProteinPct: 19 }).basis).toBe('rfv');
      expect(usdaAlfalfaGrade({ ...supreme, adfPct: 30, crudeProteinPct: 19 }).basis).toBe('adf');
    });

    it('grades Supreme only when every criterion is Supreme', () => {
      expect(usdaAlfalfaGrade(supreme).name).toBe('Supreme');
    });

    // Source: full-bloom alfalfa reference ADF 41 / NDF 53 (S2) scores RFV ≈ 100 (S1): well into Utility.
    it('grades the full-bloom alfalfa reference as Utility', () => {
      const grade = usdaAlfalfaGrade({ adfPct: 41, ndfPct: 53, rfv: relativeFeedValue(41, 53), tdnWesternPct: tdnFromAdf(41), crudeProteinPct: 17 });
      expect(grade.name).toBe('Utility');
      expect(grade.basis).toBe('adf');
    });
  });

  // Source: USDA AMS grass guidelines via Cash & Dixon (S7) and Missouri Market News (S8):
  // Premium >13, Good 9–13, Fair 5–9, Low <5 (tie → better grade).
  describe('USDA grass', () => {
    it.each([
      [13.01, 'Premium'],
      [13, 'Good'],
      [9, 'Good'], // tie → better grade
      [8.99, 'Fair'],
      [5, 'Fair'],
      [4.99, 'Low'],
    ] as const)('grades CP %s as %s', (cp, grade) => {
      expect(usdaGrassGrade(cp)).toEqual({ name: grade, basis: 'crudeProtein', table: 'usda-ams-2003-grass', criteria: [{ criterion: 'crudeProtein', name: grade }] });
    });
  });

  // Source: UW–Madison Hay Market Demand and Price Report 2022 (S9) for Prime >151, 1: 125–150(151), 2: 103–124,
  // 3: 87–102; Grade 4 (75–86) and Grade 5 (<75) from memory (AFGC Hay Marketing Task Force table).
  describe('AFGC legume', () => {
    it.each([
      [151.01, 'Prime'],
      [151, 'Grade 1'], // Prime needs more than 151
      [150.5, 'Grade 1'],
      [125, 'Grade 1'],
      [124.99, 'Grade 2'], // printed gap 124–125 falls to the band below
      [103, 'Grade 2'],
      [102.99, 'Grade 3'],
      [87, 'Grade 3'],
      [86.99, 'Grade 4'], // from memory
      [75, 'Grade 4'], // from memory
      [74.99, 'Grade 5'], // from memory
    ] as const)('grades RFV %s as %s', (rfv, grade) => {
      expect(afgcLegumeGrade(rfv)).toEqual({ name: grade, basis: 'rfv' });
    });

    it('puts the full-bloom alfalfa reference (RFV ≈ 100) in Grade 3', () => {
      expect(afgcLegumeGrade(relativeFeedValue(41, 53)).name).toBe('Grade 3');
    });
  });

  describe('by forage class', () => {
    it('grades grass on CP only and gives no AFGC grade', () => {
      const grades = gradeForage('grass', { ...supreme, crudeProteinPct: 10 });
      expect(grades.usda.table).toBe('usda-ams-2003-grass');
      expect(grades.usda.name).toBe('Good');
      expect(grades.afgc).toBeNull();
    });

    // Decision: RFV was built for legume and legume/grass hay (S1); Illinois groups "Alfalfa, Alfalfa/Mix" (S10).
    it('grades mixed hay on the alfalfa table and the AFGC legume bands', () => {
      const grades = gradeForage('mixed', supreme);
      expect(grades.usda.table).toBe('usda-ams-2003-alfalfa');
      expect(grades.afgc).toEqual({ name: 'Prime', basis: 'rfv' });
    });

    it('grades legume hay on the alfalfa table and the AFGC legume bands', () => {
      const grades = gradeForage('legume', supreme);
      expect(grades.usda.name).toBe('Supreme');
      expect(grades.afgc?.name).toBe('Prime');
    });
  });
});

describe('grading rule in words', () => {
  // USDA AMS (S7): the overall alfalfa grade is the lowest any criterion gives; grass hay on CP alone.
  it('names the measure that set an alfalfa grade', () => {
    const grade = usdaAlfalfaGrade({ ...supreme, ndfPct: 41 });
    expect(usdaGradeRule(grade)).toBe(
      'The USDA AMS alfalfa grade is the worst grade any one measure gives (ADF, NDF, RFV, TDN and crude protein, on dry matter); here NDF sets it at Fair.',
    );
  });

  it('states the grass and AFGC rules with their printed bands (S7, S9)', () => {
    expect(usdaGradeRule(usdaGrassGrade(10))).toMatch(/crude protein alone \(Premium above 13 %, Good 9–13 %, Fair 5–9 %, Low below 5 %.*this hay is Good\.$/);
    expect(afgcGradeRule(afgcLegumeGrade(130))).toMatch(/RFV alone \(Prime above 151, Grade 1 125–151.*this hay is Grade 1\.$/);
  });
});
