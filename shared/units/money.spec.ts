import fc from 'fast-check';
import {
  dollarsToCents,
  centsToDecimalText,
  formatCents,
  roundCents,
} from './money';

describe('roundCents', () => {
  it('rounds to whole cents half away from zero without float noise', () => {
    expect(roundCents(45454.545)).toBe(45455);
    expect(roundCents(0.285 * 100)).toBe(29);
    expect(roundCents(-0.5)).toBe(-1);
    expect(Object.is(roundCents(-0.4), 0)).toBe(true);
  });

  it('always returns an integer (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e9, max: 1e9, noNaN: true }), (c) => {
        expect(Number.isInteger(roundCents(c))).toBe(true);
      }),
    );
  });
});

describe('dollarsToCents', () => {
  it('converts dollars to whole cents', () => {
    expect(dollarsToCents(3.5)).toBe(350);
    expect(dollarsToCents(0.1 + 0.2)).toBe(30);
    expect(dollarsToCents(12.345)).toBe(1235);
  });
});

describe('formatCents', () => {
  it('formats as US dollars with thousands separators', () => {
    expect(formatCents(105000)).toBe('$1,050.00');
    expect(formatCents(4375)).toBe('$43.75');
    expect(formatCents(5)).toBe('$0.05');
    expect(formatCents(-550)).toBe('-$5.50');
    expect(formatCents(123456789)).toBe('$1,234,567.89');
  });

  it('can drop the cents, rounding to whole dollars', () => {
    expect(formatCents(105049, { showCents: false })).toBe('$1,050');
    expect(formatCents(105050, { showCents: false })).toBe('$1,051');
  });

  it('rounds fractional per-unit rates to whole cents half away from zero', () => {
    expect(formatCents(45454.5)).toBe('$454.55');
    expect(formatCents(0.1 + 0.2)).toBe('$0.00');
  });

  it('shows more places for small per-unit rates when asked', () => {
    expect(formatCents(8.5, { fractionDigits: 3 })).toBe('$0.085');
    expect(formatCents(105049, { fractionDigits: 0 })).toBe('$1,050');
    expect(() => formatCents(1, { fractionDigits: 5 })).toThrow(RangeError);
  });

  // CLDR number conventions (from memory): Canadian French groups with a narrow no-break space,
  // uses a decimal comma and puts the symbol after the amount; British English matches US grouping.
  it("follows the reader's locale when one is given", () => {
    expect(formatCents(105000, { locale: 'fr-CA' }).replace(/\s/g, ' ')).toBe('1 050,00 $ US');
    expect(formatCents(105000, { locale: 'en-GB' })).toBe('US$1,050.00');
  });
});

describe('centsToDecimalText', () => {
  it('writes plain dollars with two places, no symbol or grouping, for files other programs read', () => {
    expect(centsToDecimalText(123450)).toBe('1234.50');
    expect(centsToDecimalText(5)).toBe('0.05');
    expect(centsToDecimalText(-550)).toBe('-5.50');
  });
});
