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
  // NIST Handbook 44, Appendix C: 1 lb = 0.453 592 37 kg exactly, so 1 kg = 2.204 622 6 lb and 1,100 lb = 498.95 kg.
  it('converts pounds and kilograms within 0.002 % of the NIST definition (1,100 lb → 499.0 kg; 500 kg → 1,102.3 lb)', () => {
    expect(Math.abs(LB_PER_KG - 1 / 0.45359237) / (1 / 0.45359237)).toBeLessThan(0.00002);
    expect(roundTo(lbToKg(1100), 1)).toBe(roundTo(1100 * 0.45359237, 1));
    expect(Math.abs(kgToLb(500) - 500 / 0.45359237)).toBeLessThan(0.02);
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
    // NIST: 3 short tons = 6,000 × 0.453 592 37 = 2,721.554 kg.
    expect(Math.abs(kgToShortTons(2721.55422) - 3) / 3).toBeLessThan(0.00002);
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
