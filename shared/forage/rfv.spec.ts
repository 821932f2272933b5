import fc from 'fast-check';
import { digestibleDryMatter, relativeFeedValue, rfvDryMatterIntake } from './rfv';

describe('rfv', () => {
  // Source: Undersander, UW–Madison Ext., Relative Forage Quality (S1) — divisor 1.29 makes full-bloom
  // alfalfa score 100; reference hay ADF 41 / NDF 53 from Progressive Forage, "A quality acronym: RFQ" (S2).
  it('scores the full-bloom alfalfa reference (ADF 41, NDF 53) at RFV 100', () => {
    expect(digestibleDryMatter(41)).toBeCloseTo(56.961, 10);
    expect(rfvDryMatterIntake(53)).toBeCloseTo(2.2642, 4);
    expect(round1(relativeFeedValue(41, 53))).toBe(100);
  });

  // Independent check: the USDA AMS alfalfa guidelines (2003; Cash & Dixon, Montana State Ext., S7) print ADF, NDF and
  // RFV limits side by side for each grade. The ADF/NDF pair at each edge — 27/34, 29/36, 32/40, 35/44 — must land on
  // that row's printed RFV edge, 185/170/150/130, within the table's own rounding (±2 RFV).
  it.each([
    [27, 34, 185],
    [29, 36, 170],
    [32, 40, 150],
    [35, 44, 130],
  ])('puts the USDA grade edge ADF %s / NDF %s at the printed RFV edge %s (S7)', (adf, ndf, rfv) => {
    expect(Math.abs(relativeFeedValue(adf, ndf) - rfv)).toBeLessThanOrEqual(2);
  });

  it('falls as ADF rises at any NDF', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 100, noNaN: true }),
        fc.double({ min: 0, max: 100, noNaN: true }),
        fc.double({ min: 1, max: 100, noNaN: true }),
        (a, b, ndf) => {
          fc.pre(Math.abs(a - b) > 1e-6);
          const [low, high] = a < b ? [a, b] : [b, a];
          expect(relativeFeedValue(high, ndf)).toBeLessThan(relativeFeedValue(low, ndf));
        },
      ),
    );
  });

  it('falls as NDF rises at any ADF', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 100, noNaN: true }),
        fc.double({ min: 1, max: 100, noNaN: true }),
        fc.double({ min: 1, max: 100, noNaN: true }),
        (adf, a, b) => {
          fc.pre(Math.abs(a - b) > 1e-6);
          const [low, high] = a < b ? [a, b] : [b, a];
          expect(relativeFeedValue(adf, high)).toBeLessThan(relativeFeedValue(adf, low));
        },
      ),
    );
  });
});

function round1(x: number): number {
  return Math.round(x * 10) / 10;
}
