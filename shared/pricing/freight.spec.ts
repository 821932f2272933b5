import { freightCents, freightPerLoadCents, loadsForTons } from './freight';

describe('loadsForTons', () => {
  it('defaults to 24 t per load (practice) and rounds loads up', () => {
    expect(loadsForTons(0)).toBe(0);
    expect(loadsForTons(1)).toBe(1);
    expect(loadsForTons(24)).toBe(1);
    expect(loadsForTons(24.01)).toBe(2);
    expect(loadsForTons(37.3)).toBe(2);
    expect(loadsForTons(50, 22)).toBe(3);
  });

  it('does not add a load for floating-point dust', () => {
    expect(loadsForTons(0.1 * 3 * 80)).toBe(1); // 24.000000000000004
  });

  it('rejects negative tons and a non-positive load size', () => {
    expect(() => loadsForTons(-1)).toThrow(RangeError);
    expect(() => loadsForTons(10, 0)).toThrow(RangeError);
  });
});

describe('freightCents', () => {
  it('is rate × miles × loads: $3.50 × 300 mi = $1,050.00 per load (domain brief §11)', () => {
    expect(freightPerLoadCents(350, 300)).toBe(105000);
    expect(freightCents({ ratePerLoadedMileCents: 350, miles: 300, loads: 2 })).toBe(210000);
  });

  it('rounds a fractional-mile load to whole cents before multiplying by loads', () => {
    expect(freightPerLoadCents(325, 12.345)).toBe(4012);
    expect(freightCents({ ratePerLoadedMileCents: 325, miles: 12.345, loads: 3 })).toBe(12036);
  });

  it('rejects fractional or negative loads', () => {
    expect(() => freightCents({ ratePerLoadedMileCents: 350, miles: 300, loads: 1.5 })).toThrow(RangeError);
    expect(() => freightCents({ ratePerLoadedMileCents: 350, miles: -1, loads: 1 })).toThrow(RangeError);
  });
});
