import { roundTo } from '../units/rounding';
import { hayPurchase } from './hay-purchase';

// Domain brief §11 worked example: 4 horses × 1,100 lb at 2 % BW (as-fed, practice) for a year.
const EATEN_LB = 4 * 1100 * 0.02 * 365;

describe('hayPurchase', () => {
  it('4 × 1,100 lb horses at 2 % BW eat 88.0 lb/day, 32,120 lb = 16.1 t a year (brief §11, 32,120 / 2,000 by hand)', () => {
    expect(roundTo(hayPurchase({ eatenLbAsFed: EATEN_LB, wasteFraction: 0, baleWeightLb: 1000 }).eatenTons, 1)).toBe(16.1);
  });

  it('round-bale feeder, 10 % waste: 17.8 t ≈ 35.7 → 36 bales of 1,000 lb (brief §11)', () => {
    const p = hayPurchase({ eatenLbAsFed: EATEN_LB, wasteFraction: 0.1, baleWeightLb: 1000 });
    expect(roundTo(p.purchaseTons, 1)).toBe(17.8);
    expect(roundTo(p.purchaseLb / 1000, 1)).toBe(35.7);
    expect(p.bales).toBe(36);
  });

  it('no feeder, 57 % waste: 37.3 t ≈ 75 bales of 1,000 lb (brief §11)', () => {
    const p = hayPurchase({ eatenLbAsFed: EATEN_LB, wasteFraction: 0.57, baleWeightLb: 1000 });
    expect(roundTo(p.purchaseTons, 1)).toBe(37.3);
    expect(p.bales).toBe(75);
  });

  it('small squares in a feeder, 5 % waste: 16.9 t ≈ 563.5 → 564 bales of 60 lb (brief §11)', () => {
    const p = hayPurchase({ eatenLbAsFed: EATEN_LB, wasteFraction: 0.05, baleWeightLb: 60 });
    expect(roundTo(p.purchaseTons, 1)).toBe(16.9);
    expect(roundTo(p.purchaseLb / 60, 1)).toBe(563.5);
    expect(p.bales).toBe(564);
  });

  it('does not buy an extra bale for floating-point dust on an exact count', () => {
    expect(hayPurchase({ eatenLbAsFed: 0.9 * 36000, wasteFraction: 0.1, baleWeightLb: 1000 }).bales).toBe(36);
  });

  it('rejects waste of 100 % or more, negative hay and empty bales', () => {
    expect(() => hayPurchase({ eatenLbAsFed: 1, wasteFraction: 1, baleWeightLb: 60 })).toThrow(RangeError);
    expect(() => hayPurchase({ eatenLbAsFed: -1, wasteFraction: 0, baleWeightLb: 60 })).toThrow(RangeError);
    expect(() => hayPurchase({ eatenLbAsFed: 1, wasteFraction: 0, baleWeightLb: 0 })).toThrow(RangeError);
  });
});
