import { listedPricePerTonCents, pricePerTonFromBaleCents } from './price-per-ton';

describe('pricePerTonFromBaleCents', () => {
  it('gives $400.00/t for $12 per 60 lb bale (domain brief §11 worked example)', () => {
    expect(pricePerTonFromBaleCents(1200, 60)).toBe(40000);
  });

  it('rounds to whole cents: $65 for a 1,200 lb round bale is $108.33/t (2000 ÷ 1200 × 65, by hand)', () => {
    expect(pricePerTonFromBaleCents(6500, 1200)).toBe(10833);
  });

  it('rejects a bale weight that is not positive', () => {
    expect(() => pricePerTonFromBaleCents(1200, 0)).toThrow(RangeError);
    expect(() => pricePerTonFromBaleCents(1200, Number.NaN)).toThrow(RangeError);
  });
});

describe('listedPricePerTonCents', () => {
  it('takes the ton price of a lot priced by the ton', () => {
    expect(listedPricePerTonCents({ pricingUnit: 'ton', priceCentsPerTon: 25000, priceCentsPerBale: null }, 60)).toBe(25000);
  });

  it('converts the bale price of a lot priced by the bale at its bale weight (domain brief §11)', () => {
    expect(listedPricePerTonCents({ pricingUnit: 'bale', priceCentsPerTon: 1, priceCentsPerBale: 1200 }, 60)).toBe(40000);
  });
});
