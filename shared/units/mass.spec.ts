import fc from 'fast-check';
import {
  KG_PER_SHORT_TON,
  LB_PER_KG,
  kgToLb,
  kgToShortTons,
  lbToKg,
  lbToShortTons,
  shortTonsToKg,
  shortTonsToLb,
} from './mass';
import { roundTo } from './rounding';

describe('mass conversions', () => {
  it('uses 2.2046 lb per kg, so 1,100 lb is 499.0 kg (domain brief §6 worked example)', () => {
    expect(LB_PER_KG).toBe(2.2046);
    expect(roundTo(lbToKg(1100), 1)).toBe(499.0);
    expect(kgToLb(500)).toBeCloseTo(1102.3, 10);
  });

  it('uses the 2,000 lb short ton (domain brief §11: 32,120 lb ≈ 16.1 t)', () => {
    expect(lbToShortTons(32120)).toBeCloseTo(16.06, 10);
    expect(shortTonsToLb(24)).toBe(48000);
  });

  it('converts kilograms and short tons through the same factor (1 t ≈ 907.2 kg)', () => {
    expect(roundTo(KG_PER_SHORT_TON, 1)).toBe(907.2);
    // Domain brief §6 convention, lb ÷ 2.2046: 2,000 / 2.2046 = 907.19405 kg by hand. (The exact definition,
    // 2,000 × 0.45359237 = 907.18474 kg (NIST Handbook 44), differs by 0.001 %.)
    expect(shortTonsToKg(1)).toBeCloseTo(907.19405, 4);
    expect(Math.abs(shortTonsToKg(1) - 907.18474) / 907.18474).toBeLessThan(0.00002);
    expect(kgToShortTons(2721.58215)).toBeCloseTo(3, 6);
  });

  it('round-trips any weight (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1e7, noNaN: true }), (x) => {
        expect(kgToLb(lbToKg(x))).toBeCloseTo(x, 6);
        expect(shortTonsToKg(kgToShortTons(x))).toBeCloseTo(x, 6);
      }),
    );
  });

  it('rejects non-finite input instead of propagating NaN', () => {
    expect(() => lbToKg(Number.NaN)).toThrow(RangeError);
    expect(() => shortTonsToLb(Number.POSITIVE_INFINITY)).toThrow(RangeError);
  });
});
