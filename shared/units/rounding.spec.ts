import fc from 'fast-check';
import { ceilTo, formatNumber, groupThousands, roundTo } from './rounding';

describe('roundTo', () => {
  it('rounds half away from zero, including values that binary floating point stores just below the half', () => {
    expect(roundTo(1.005, 2)).toBe(1.01);
    expect(roundTo(2.675, 2)).toBe(2.68);
    expect(roundTo(0.5)).toBe(1);
    expect(roundTo(-0.5)).toBe(-1);
    expect(roundTo(-1.005, 2)).toBe(-1.01);
  });

  it('never returns negative zero', () => {
    expect(Object.is(roundTo(-0.004, 2), 0)).toBe(true);
  });

  it('reproduces the domain brief figures at one decimal (brief §11: 32,120 lb = 16.1 t)', () => {
    expect(roundTo(32120 / 2000, 1)).toBe(16.1);
    expect(roundTo(16.06 / 0.9, 1)).toBe(17.8);
  });

  it('rejects non-finite values and silly decimal counts', () => {
    expect(() => roundTo(Number.NaN)).toThrow(RangeError);
    expect(() => roundTo(1, -1)).toThrow(RangeError);
    expect(() => roundTo(1, 1.5)).toThrow(RangeError);
  });

  it('is never further than half a unit in the last place from the input (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.integer({ min: 0, max: 6 }), (value, decimals) => {
        expect(Math.abs(roundTo(value, decimals) - value)).toBeLessThanOrEqual(0.5 / 10 ** decimals + 1e-9);
      }),
    );
  });
});

describe('ceilTo', () => {
  it('rounds up but ignores floating-point noise', () => {
    expect(ceilTo(35.689, 0)).toBe(36);
    expect(ceilTo(0.1 + 0.2, 1)).toBe(0.3);
    expect(ceilTo(13.3333333, 3)).toBe(13.334);
    expect(ceilTo(-1.25, 1)).toBe(-1.2);
  });
});

describe('formatNumber', () => {
  it('groups thousands and fixes the decimals', () => {
    expect(formatNumber(32120)).toBe('32,120');
    expect(formatNumber(1234567.891, 2)).toBe('1,234,567.89');
    expect(formatNumber(-1234.5, 0)).toBe('-1,235');
    expect(formatNumber(-0.04, 1)).toBe('0.0');
    expect(formatNumber(0.5, 2)).toBe('0.50');
  });

  it('groupThousands leaves short runs alone', () => {
    expect(groupThousands('999')).toBe('999');
    expect(groupThousands('1000')).toBe('1,000');
  });
});
