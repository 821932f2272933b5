import { afgcBandTable, usdaBandTables } from './grades';
import { gradeStanding, usdaScaleFor } from './grade-scale';

describe('gradeStanding', () => {
  // USDA AMS Market News hay quality guidelines (2003): alfalfa Supreme > Premium > Good > Fair > Utility.
  it('orders USDA alfalfa grades from Supreme (best) to Utility (lowest)', () => {
    expect(gradeStanding('Supreme', 'usda-alfalfa')).toMatchObject({ rank: 1, of: 5 });
    expect(gradeStanding('Utility', 'usda-alfalfa')).toMatchObject({ rank: 5, of: 5 });
    const ranks = ['Utility', 'Good', 'Premium'].map((g) => gradeStanding(g, 'usda-alfalfa')!.rank);
    expect(new Set(ranks).size).toBe(3);
    expect(ranks[0]).toBeGreaterThan(ranks[1]!);
    expect(ranks[1]).toBeGreaterThan(ranks[2]!);
  });

  // USDA AMS grass guideline: Premium > Good > Fair > Low (four grades, no Supreme).
  it('puts grass Premium at the top of a four-grade table and has no Supreme for grass', () => {
    expect(gradeStanding('Premium', 'usda-grass')).toMatchObject({ rank: 1, of: 4 });
    expect(gradeStanding('Low', 'usda-grass')).toMatchObject({ rank: 4, of: 4 });
    expect(gradeStanding('Supreme', 'usda-grass')).toBeNull();
  });

  // AFGC Hay Marketing Task Force legume grades: Prime, then Grade 1 to Grade 5.
  it('ranks AFGC Prime above Grade 1 and Grade 5 last of six', () => {
    expect(gradeStanding('Prime', 'afgc')).toMatchObject({ rank: 1, of: 6 });
    expect(gradeStanding('Grade 5', 'afgc')).toMatchObject({ rank: 6, of: 6 });
  });

  // USDA AMS: mixed hay is graded on the alfalfa table (see grades.ts), grass on the grass table.
  it('grades grass on the grass table and legumes or mixes on the alfalfa table', () => {
    expect(usdaScaleFor('grass')).toBe('usda-grass');
    expect(usdaScaleFor('mixed')).toBe('usda-alfalfa');
    expect(usdaScaleFor('legume')).toBe('usda-alfalfa');
  });
});

describe('usdaBandTables', () => {
  // USDA AMS Market News hay quality guidelines (2003), alfalfa: ADF Supreme < 27, Premium 27–29, Good 29–32, Fair 32–35.
  it('gives the published ADF limits of the alfalfa table, lower is better', () => {
    const adf = usdaBandTables('legume').find((t) => t.criterion === 'adf')!;
    expect(adf.direction).toBe('lower-is-better');
    expect(adf.bands.map((b) => b.limit)).toEqual([27, 29, 32, 35, null]);
    expect(adf.bands.map((b) => b.grade)).toEqual(['Supreme', 'Premium', 'Good', 'Fair', 'Utility']);
  });
  // USDA AMS grass: Premium CP > 13, Good 9–13, Fair 5–9, Low < 5.
  it('grades grass on crude protein alone with limits 13, 9 and 5', () => {
    const tables = usdaBandTables('grass');
    expect(tables).toHaveLength(1);
    expect(tables[0]!.bands.map((b) => b.limit)).toEqual([13, 9, 5, null]);
  });
  // AFGC Hay Marketing Task Force RFV bands: Prime > 151, Grade 1 125–151, Grade 2 103–124, Grade 3 87–102.
  it('gives the AFGC RFV limits', () => {
    expect(afgcBandTable().slice(0, 4).map((b) => b.limit)).toEqual([151, 125, 103, 87]);
  });
});
