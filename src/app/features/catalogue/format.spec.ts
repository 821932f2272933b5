import { cuttingLabel, distanceLabel } from './format';

describe('distanceLabel', () => {
  // common practice: a distance that rounds to zero is said as "under 1 mi" rather than "0 mi".
  it('says "under 1 mi" for a lot in the same town', () => {
    expect(distanceLabel(0)).toBe('under 1 mi');
    expect(distanceLabel(0.4)).toBe('under 1 mi');
  });
  it('rounds other distances to whole miles', () => {
    expect(distanceLabel(1.2)).toBe('1 mi');
    expect(distanceLabel(148.6)).toBe('149 mi');
  });
  it('says nothing when no distance is known', () => {
    expect(distanceLabel(null)).toBe('');
  });
});

describe('cuttingLabel', () => {
  // English ordinals (common practice): 1st, 2nd, 3rd, 4th, 11th, 12th, 13th, 21st.
  it('names cuttings with English ordinals', () => {
    expect([1, 2, 3, 4, 11, 12, 13, 21].map(cuttingLabel)).toEqual([
      '1st cutting', '2nd cutting', '3rd cutting', '4th cutting', '11th cutting', '12th cutting', '13th cutting', '21st cutting',
    ]);
  });
});
