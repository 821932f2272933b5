import { defaultLotTitle, deriveQuantity, PriceStepSchema, QuantityStepSchema } from './selling';

describe('deriveQuantity', () => {
  it('derives tons from bales and weight (tons = bales × lb ÷ 2000, trade convention)', () => {
    expect(deriveQuantity({ baleCount: 600, avgBaleWeightLb: 60, totalTons: null })).toEqual({ baleCount: 600, avgBaleWeightLb: 60, totalTons: 18 });
  });
  it('derives the bale count from tons and weight, and the weight from tons and bales', () => {
    expect(deriveQuantity({ baleCount: null, avgBaleWeightLb: 1000, totalTons: 40 })?.baleCount).toBe(80);
    expect(deriveQuantity({ baleCount: 80, avgBaleWeightLb: null, totalTons: 40 })?.avgBaleWeightLb).toBe(1000);
    expect(deriveQuantity({ baleCount: 80, avgBaleWeightLb: null, totalTons: null })).toBeNull();
  });
  it('rejects three figures that disagree and derived weights no bale has', () => {
    expect(QuantityStepSchema.safeParse({ baleType: 'round_5x5', baleCount: 10, avgBaleWeightLb: 1300, totalTons: 6.5 }).success).toBe(true);
    expect(QuantityStepSchema.safeParse({ baleType: 'round_5x5', baleCount: 10, avgBaleWeightLb: 1300, totalTons: 9 }).success).toBe(false);
    expect(QuantityStepSchema.safeParse({ baleType: 'round_5x5', baleCount: 10, totalTons: 100 }).success).toBe(false);
  });
});

describe('price step', () => {
  it('needs pickup or delivery', () => {
    expect(PriceStepSchema.safeParse({ pricingUnit: 'ton', priceCentsPerTon: 20000, pickupAllowed: false }).success).toBe(false);
  });
});

it('titles a lot the way the trade names it', () => {
  expect(defaultLotTitle({ forageType: 'timothy', cutting: 1, fieldName: 'East 40' })).toBe('Timothy, 1st cutting — East 40');
});
