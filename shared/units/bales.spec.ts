import { balesForTons, balesToTons, balesWithinTons } from './bales';

describe('bales and tons', () => {
  it('turns 16.9 t of 60 lb small squares into 564 bales (domain brief §11 worked example: 563.5 → 564)', () => {
    expect(balesForTons(16.905, 60)).toBe(564);
  });

  it('turns 17.8 t of 1,000 lb rounds into 36 bales (domain brief §11: 35.7 → 36)', () => {
    expect(balesForTons(17.85, 1000)).toBe(36);
  });

  it('weighs 40 bales of 60 lb at 1.2 t (2,000 lb short ton, domain brief §11)', () => {
    expect(balesToTons(40, 60)).toBeCloseTo(1.2, 12);
  });

  it('does not round an exact whole number of bales up from float noise (common practice)', () => {
    expect(balesForTons(balesToTons(7, 0.3 * 3 * 1000), 900)).toBe(7);
  });

  it('fits whole bales within a weight: 10 t holds 15 bales of 1,300 lb (15.4 by hand), 5.85 t exactly 9 (domain brief §11)', () => {
    expect(balesWithinTons(10, 1300)).toBe(15);
    expect(balesWithinTons(5.85, 1300)).toBe(9);
  });

  it('refuses fractions of a bale and weightless bales', () => {
    expect(() => balesToTons(1.5, 60)).toThrow(RangeError);
    expect(() => balesForTons(1, 0)).toThrow(RangeError);
  });
});
