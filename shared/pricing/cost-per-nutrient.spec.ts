import { costPerLbCrudeProteinCents, costPerMcalDeCents, costPerTonDryMatterCents } from './cost-per-nutrient';

describe('cost per nutrient', () => {
  it('per ton of dry matter: $400/t as-fed at 88 % DM is $454.5/t DM (domain brief §11)', () => {
    expect(costPerTonDryMatterCents(40000, 88)).toBeCloseTo(45454.545, 3);
  });

  it('per ton of dry matter leaves the price unchanged at 100 % DM and rejects DM outside (0, 100]', () => {
    expect(costPerTonDryMatterCents(40000, 100)).toBe(40000);
    expect(() => costPerTonDryMatterCents(40000, 0)).toThrow(RangeError);
    expect(() => costPerTonDryMatterCents(40000, 101)).toThrow(RangeError);
  });

  it('per lb of crude protein: $200/t, 88 % DM, 18 % CP → 316.8 lb CP per ton → 63.1 ¢/lb', () => {
    expect(costPerLbCrudeProteinCents(20000, 88, 18)).toBeCloseTo(20000 / 316.8, 9);
  });

  it('per Mcal of DE: $200/t, 88 % DM, 2.0 Mcal/kg DM → ≈1,596.7 Mcal per ton → ≈12.5 ¢/Mcal', () => {
    expect(costPerMcalDeCents(20000, 88, 2.0)).toBeCloseTo(12.526, 3);
  });

  it('ranks a cheaper, poorer hay against a dearer, richer one on protein', () => {
    const grass = costPerLbCrudeProteinCents(15000, 90, 8);
    const alfalfa = costPerLbCrudeProteinCents(25000, 88, 20);
    expect(alfalfa).toBeLessThan(grass);
  });

  it('rejects impossible analyses', () => {
    expect(() => costPerTonDryMatterCents(40000, 0)).toThrow(RangeError);
    expect(() => costPerLbCrudeProteinCents(40000, 88, 0)).toThrow(RangeError);
    expect(() => costPerMcalDeCents(40000, 88, -1)).toThrow(RangeError);
    expect(() => costPerMcalDeCents(-1, 88, 2)).toThrow(RangeError);
  });
});
