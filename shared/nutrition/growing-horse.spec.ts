import {
  averageDailyGainKg,
  fractionOfMatureWeight,
  growingRequirements,
  impliedMatureWeightKg,
  proteinEfficiencyForGain,
} from './growing-horse';

describe('growth curve', () => {
  it('reproduces the NRC 2007 500 kg growing rows: ≈168, 216, 321, 432 kg at 4, 6, 12, 24 months (Table 16-3, from memory; 6 and 12 months are the fitted points)', () => {
    const kg = [4, 6, 12, 24].map((m) => 500 * fractionOfMatureWeight(m));
    expect(kg[0]).toBeCloseTo(168, -1);
    expect(kg[1]).toBeCloseTo(216, 1);
    expect(kg[2]).toBeCloseTo(321, 1);
    expect(Math.abs(kg[3]! - 432) / 432).toBeLessThan(0.01);
  });

  it('gives table daily gains ≈ 0.84, 0.72 kg/d at 4 and 6 months (NRC 2007, from memory)', () => {
    expect(averageDailyGainKg(500, 4)).toBeCloseTo(0.84, 2);
    expect(averageDailyGainKg(500, 6)).toBeCloseTo(0.72, 2);
  });

  it('inverts: a weight on the curve implies its mature weight', () => {
    expect(impliedMatureWeightKg(500 * fractionOfMatureWeight(9), 9)).toBeCloseTo(500, 9);
  });

  it('slows growth as the horse matures', () => {
    expect(averageDailyGainKg(500, 18)).toBeLessThan(averageDailyGainKg(500, 12));
  });
});

describe('proteinEfficiencyForGain', () => {
  it('steps down 50 → 45 → 40 → 35 → 30 % with age (NRC 2007, from memory)', () => {
    expect([4, 6.9, 7, 8.5, 9, 10, 11, 12, 24].map(proteinEfficiencyForGain)).toEqual([0.5, 0.5, 0.45, 0.45, 0.4, 0.4, 0.35, 0.3, 0.3]);
  });
});

describe('growingRequirements', () => {
  // NRC 2007 Table 16-3 (500 kg mature), weanling at 6 months, 216 kg gaining 0.72 kg/d: CP 676 g/day (from memory).
  it('gives the NRC 2007 weanling row: 216 kg at 6 months needs about 676 g of crude protein a day', () => {
    const r = growingRequirements(216, 6);
    expect(Math.abs(r.crudeProteinGPerDay - 676) / 676).toBeLessThan(0.01);
  });
});
