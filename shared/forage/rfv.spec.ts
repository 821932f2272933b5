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

  // Source: domain brief §2 worked example (formulas per S1, S4): DDM 65.5, DMI 3.0, RFV 152.4.
  it('scores ADF 30 / NDF 40 at RFV 152.4', () => {
    expect(round1(digestibleDryMatter(30))).toBe(65.5);
    expect(rfvDryMatterIntake(40)).toBe(3);
    expect(round1(relativeFeedValue(30, 40))).toBe(152.4);
  });

  // Source: domain brief §3 — RFV of the worked grass hay (ADF 35, NDF 60) is only 95.6.
  it('scores the worked grass hay (ADF 35, NDF 60) at RFV 95.6', () => {
    expect(round1(relativeFeedValue(35, 60))).toBe(95.6);
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
