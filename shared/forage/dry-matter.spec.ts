import fc from 'fast-check';
import { convertNutrients, dryMatterFromMoisture, dryMatterWeight, toAsFed, toDryMatter } from './dry-matter';
import type { Nutrients } from './forage-contract';
import { roundTo } from '../units/rounding';

describe('dry-matter', () => {
  // Source: domain brief §1 worked example (12.0% moisture hay) — arithmetic on the definitions DM% = 100 − moisture%.
  it('turns 12% moisture into 88% dry matter', () => {
    expect(dryMatterFromMoisture(12)).toBe(88);
  });

  // Source: domain brief §1 — CP 18.0% DM × 0.88 = 15.8% as fed.
  it('converts 18% crude protein on DM to 15.8% as fed at 88% dry matter', () => {
    expect(round1(toAsFed(18, 88))).toBe(15.8);
    expect(toAsFed(18, 88)).toBeCloseTo(15.84, 10);
  });

  it('converts 15.84% as fed back to 18% on DM at 88% dry matter', () => {
    expect(toDryMatter(15.84, 88)).toBeCloseTo(18, 10);
  });

  // Source: domain brief §1 — 1,000 lb as fed at 88% DM = 880.0 lb DM.
  it('finds 880 lb of dry matter in 1,000 lb of hay at 88% dry matter', () => {
    expect(dryMatterWeight(1000, 88)).toBeCloseTo(880, 10);
  });

  it('leaves absent nutrients null when changing basis', () => {
    const dm: Nutrients = {
      crudeProteinPct: 18,
      adfPct: 30,
      ndfPct: 40,
      fatPct: null,
      ashPct: 10,
      escPct: null,
      wscPct: null,
      starchPct: null,
      calciumPct: null,
      phosphorusPct: null,
      nscPct: null,
    };
    const asFed = convertNutrients(dm, 88, toAsFed);
    expect(asFed.fatPct).toBeNull();
    expect(asFed.ashPct).toBeCloseTo(8.8, 10);
    expect(asFed.ndfPct).toBeCloseTo(35.2, 10);
  });

  // A lab prints values to two decimals (common practice); whatever float error a basis change carries, a
  // printed value must come back as the same printed value — exactly, not within a tolerance.
  it('brings any two-decimal DM value back to the same two-decimal value after as-fed and back', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 10_000 }), fc.integer({ min: 1, max: 10_000 }), (hundredths, dmHundredths) => {
        const valueDm = hundredths / 100;
        const dryMatterPct = dmHundredths / 100;
        const back = toDryMatter(toAsFed(valueDm, dryMatterPct), dryMatterPct);
        expect(roundTo(back, 2).toFixed(2)).toBe(valueDm.toFixed(2));
      }),
    );
  });

  // The reported case: 16.56 as fed at 92% DM is 18 on DM by hand (16.56 / 0.92 = 18 exactly), though the
  // float quotient is 17.999999999999996.
  it('reads CP 16.56% as fed at 92% dry matter as 18.00% on DM at report precision', () => {
    expect(roundTo(toDryMatter(16.56, 92), 2).toFixed(2)).toBe('18.00');
  });

  it('never makes an as-fed value larger than its DM value', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 100, noNaN: true }), fc.double({ min: 0.01, max: 100, noNaN: true }), (v, dm) => {
        expect(toAsFed(v, dm)).toBeLessThanOrEqual(v);
      }),
    );
  });
});

function round1(x: number): number {
  return Math.round(x * 10) / 10;
}
