import { deliveredPrice } from './delivered-price';

describe('deliveredPrice', () => {
  it('adds $1,050 freight for one 24 t load over 300 mi at $3.50 — $43.75/t (domain brief §11: $43.8/t)', () => {
    const p = deliveredPrice({ pricePerTonCents: 18000, tons: 24, freightCentsPerLoadedMile: 350, distanceMi: 300 });
    expect(p).toEqual({
      hayCents: 432000,
      loads: 1,
      freightCents: 105000,
      totalCents: 537000,
      freightPerTonCents: 4375,
      deliveredPerTonCents: 22375,
    });
  });

  it('charges a whole extra load for a part load', () => {
    const p = deliveredPrice({ pricePerTonCents: 18000, tons: 30, freightCentsPerLoadedMile: 350, distanceMi: 300 });
    expect(p.loads).toBe(2);
    expect(p.freightCents).toBe(210000);
    expect(p.freightPerTonCents).toBe(7000);
  });

  it('honours a custom load size', () => {
    expect(deliveredPrice({ pricePerTonCents: 0, tons: 30, freightCentsPerLoadedMile: 100, distanceMi: 10, tonsPerLoad: 30 }).loads).toBe(1);
  });

  it('is zero for zero tons, with per-ton figures reported as 0 rather than NaN', () => {
    expect(deliveredPrice({ pricePerTonCents: 18000, tons: 0, freightCentsPerLoadedMile: 350, distanceMi: 300 })).toEqual({
      hayCents: 0,
      loads: 0,
      freightCents: 0,
      totalCents: 0,
      freightPerTonCents: 0,
      deliveredPerTonCents: 0,
    });
  });
});
