import { ZodError } from 'zod';
import { roundTo } from '../units/rounding';
import { HerdNeedsRequestSchema, type HerdNeedsRequest, planHerdNeeds } from './herd-needs';

const fourGeldings: HerdNeedsRequest = {
  groups: [{ count: 4, bodyWeight: 1100, weightUnit: 'lb', class: 'maintenance' }],
  days: 365,
  feedingMethod: 'round-bale-feeder',
  hayShareOfDiet: 1,
};

describe('planHerdNeeds', () => {
  it('totals energy, protein and intake for the herd (4 × 1,100 lb maintenance: 66.5 Mcal, 2,515 g CP, 39.9 kg DM/day at 2 % BW)', () => {
    const plan = planHerdNeeds(fourGeldings);
    expect(plan.groups).toHaveLength(1);
    expect(roundTo(plan.groups[0]!.bodyWeightKg, 1)).toBe(499.0);
    expect(roundTo(plan.totals.deMcalPerDay, 1)).toBe(66.5);
    expect(roundTo(plan.totals.crudeProteinGPerDay)).toBe(2515);
    expect(roundTo(plan.totals.dmiKgPerDay, 1)).toBe(39.9);
    expect(roundTo(plan.totals.dmiMinKgPerDay, 1)).toBe(29.9);
    expect(roundTo(plan.totals.dmiMaxKgPerDay, 1)).toBe(49.9);
    expect(plan.totals.hayDmKgPerDay).toBeCloseTo(plan.totals.dmiKgPerDay, 12);
    // Over a year, by hand from the figures above: 66.5 Mcal × 365 = 24,272 Mcal; 2,515 g × 365 = 918 kg.
    expect(plan.totals.period.deMcal).toBeCloseTo(24272, -2);
    expect(plan.totals.period.crudeProteinKg).toBeCloseTo(918, -1);
    expect(plan.waste.wasteFraction).toBe(0.1);
    expect(plan.lot).toBeUndefined();
  });

  it('reproduces brief §11 (16.1 t eaten, 17.8 t ≈ 36 round bales) when 2 % BW is read as-fed, i.e. with 100 % DM hay', () => {
    const plan = planHerdNeeds({ ...fourGeldings, lot: { dryMatterPct: 100, crudeProteinPctDm: 10, deMcalPerKgDm: 2, baleWeightLb: 1000 } });
    expect(roundTo(plan.lot!.asFedHayLbPerDay, 1)).toBe(88.0);
    expect(roundTo(plan.lot!.eatenTons, 1)).toBe(16.1);
    expect(roundTo(plan.lot!.purchaseTons, 1)).toBe(17.8);
    expect(plan.lot!.bales).toBe(36);
  });

  it('buys more as-fed hay for real hay: 2 % BW of dry matter at 88 % DM is 100 lb/day, 18.25 t eaten, 20.3 t ≈ 41 bales', () => {
    const plan = planHerdNeeds({ ...fourGeldings, lot: { dryMatterPct: 88, crudeProteinPctDm: 10, deMcalPerKgDm: 2, baleWeightLb: 1000 } });
    expect(roundTo(plan.lot!.asFedHayLbPerDay, 1)).toBe(100.0);
    expect(roundTo(plan.lot!.eatenTons, 2)).toBe(18.25);
    expect(roundTo(plan.lot!.purchaseTons, 1)).toBe(20.3);
    expect(plan.lot!.bales).toBe(41);
  });

  it('applies the feeding method: small squares in a feeder (5 %) at 100 % DM give 16.9 t ≈ 564 bales of 60 lb (brief §11)', () => {
    const plan = planHerdNeeds({
      ...fourGeldings,
      feedingMethod: 'small-square-feeder',
      lot: { dryMatterPct: 100, crudeProteinPctDm: 10, deMcalPerKgDm: 2, baleWeightLb: 60 },
    });
    expect(roundTo(plan.lot!.purchaseTons, 1)).toBe(16.9);
    expect(plan.lot!.bales).toBe(564);
  });

  it('says a decent grass hay alone covers maintenance energy and protein', () => {
    const lot = planHerdNeeds({ ...fourGeldings, lot: { dryMatterPct: 88, crudeProteinPctDm: 10, deMcalPerKgDm: 2, baleWeightLb: 1000 } }).lot!;
    expect(lot.coversEnergy).toBe(true);
    expect(lot.coversProtein).toBe(true);
    expect(lot.deShortfallMcalPerDay).toBe(0);
    expect(lot.crudeProteinShortfallGPerDay).toBe(0);
    expect(roundTo(lot.deFromHayMcalPerDay, 1)).toBe(79.8);
    expect(roundTo(lot.crudeProteinFromHayGPerDay)).toBe(3992);
  });

  it('reports shortfalls for a poor hay, and whether eating more could close the energy gap', () => {
    const lot = planHerdNeeds({ ...fourGeldings, lot: { dryMatterPct: 88, crudeProteinPctDm: 5, deMcalPerKgDm: 1.5, baleWeightLb: 1000 } }).lot!;
    expect(lot.coversEnergy).toBe(false);
    expect(lot.coversProtein).toBe(false);
    expect(roundTo(lot.deShortfallMcalPerDay, 1)).toBe(6.6); // 66.46 needed − 59.88 supplied
    expect(roundTo(lot.crudeProteinShortfallGPerDay)).toBe(519); // 2,515 − 1,996
    expect(roundTo(lot.hayDmForEnergyKgPerDay, 1)).toBe(44.3);
    expect(lot.energyReachableWithinIntake).toBe(true); // 44.3 ≤ 49.9 kg DM max
    const worse = planHerdNeeds({ ...fourGeldings, lot: { dryMatterPct: 88, crudeProteinPctDm: 5, deMcalPerKgDm: 1.2, baleWeightLb: 1000 } }).lot!;
    expect(worse.energyReachableWithinIntake).toBe(false); // 55.4 kg DM > 49.9
  });

  it('applies the hay share to the hay fed and to what the hay must cover', () => {
    const half = planHerdNeeds({ ...fourGeldings, hayShareOfDiet: 0.5, lot: { dryMatterPct: 88, crudeProteinPctDm: 10, deMcalPerKgDm: 2, baleWeightLb: 1000 } });
    const full = planHerdNeeds({ ...fourGeldings, lot: { dryMatterPct: 88, crudeProteinPctDm: 10, deMcalPerKgDm: 2, baleWeightLb: 1000 } });
    expect(half.totals.hayDmKgPerDay).toBeCloseTo(full.totals.hayDmKgPerDay / 2, 12);
    expect(half.lot!.deNeededFromHayMcalPerDay).toBeCloseTo(full.lot!.deNeededFromHayMcalPerDay / 2, 12);
    expect(half.totals.deMcalPerDay).toBeCloseTo(full.totals.deMcalPerDay, 12);
    expect(half.totals.period.deFromHayMcal).toBeCloseTo(full.totals.period.deFromHayMcal / 2, 9);
    expect(half.totals.period.hayDmMaxKg).toBeCloseTo(full.totals.period.hayDmMaxKg / 2, 9);
  });

  it('mixes classes and units: 2 × 500 kg idle horses and a 1,102.3 lb mare in early lactation need 16.65 × 2 + 31.7 Mcal', () => {
    const plan = planHerdNeeds({
      groups: [
        { count: 2, bodyWeight: 500, weightUnit: 'kg', class: 'maintenance' },
        { count: 1, bodyWeight: 1102.3, weightUnit: 'lb', class: 'lactation' },
      ],
      days: 30,
      feedingMethod: 'stall-feeder',
      hayShareOfDiet: 1,
    });
    // NRC 2007 Table 16-3, 500 kg: maintenance 16.7 Mcal, mare in her first month of lactation 31.7 Mcal.
    expect(plan.totals.deMcalPerDay).toBeCloseTo(2 * 16.7 + 31.7, 0);
    expect(plan.groups[1]!.dmiMaxKgPerDay).toBeCloseTo(15, 6);
  });

  it('handles growing horses given their age', () => {
    const plan = planHerdNeeds({ ...fourGeldings, groups: [{ count: 2, bodyWeight: 216, weightUnit: 'kg', class: 'growing', ageMonths: 6 }] });
    expect(plan.totals.deMcalPerDay).toBeCloseTo(2 * 15.5, 0);
  });
});

describe('HerdNeedsRequestSchema', () => {
  const issues = (input: unknown) => {
    const result = HerdNeedsRequestSchema.safeParse(input);
    return result.success ? [] : result.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));
  };

  it('checks each group against the NRC weight range, naming the group and the unit entered', () => {
    expect(issues({ ...fourGeldings, groups: [{ count: 1, bodyWeight: 300, weightUnit: 'lb', class: 'maintenance' }] })).toEqual([
      {
        path: 'groups.0.bodyWeight',
        message: expect.stringMatching(/^bodyWeightKg must be between 200 and 900 kg for a mature horse .*\(entered 300 lb\)$/),
      },
    ]);
  });

  it('requires an age for growing horses', () => {
    expect(issues({ ...fourGeldings, groups: [{ count: 1, bodyWeight: 216, weightUnit: 'kg', class: 'growing' }] })).toEqual([
      { path: 'groups.0.ageMonths', message: "ageMonths is required for class 'growing'" },
    ]);
  });

  it('rejects bad shares, periods, methods, counts and unknown keys', () => {
    expect(issues({ ...fourGeldings, hayShareOfDiet: 1.2 })[0]?.message).toBe('hayShareOfDiet must be between 0 and 1');
    expect(issues({ ...fourGeldings, days: 0 })[0]?.message).toBe('days must be at least 1');
    expect(issues({ ...fourGeldings, feedingMethod: 'pitchfork' })[0]?.message).toMatch(/^feedingMethod must be one of/);
    expect(issues({ ...fourGeldings, groups: [] })[0]?.message).toBe('add at least one group of horses');
    expect(issues({ ...fourGeldings, groups: [{ count: 1.5, bodyWeight: 1100, weightUnit: 'lb', class: 'maintenance' }] })[0]?.message).toBe(
      'count must be a whole number of horses',
    );
    expect(issues({ ...fourGeldings, budget: 100 })).not.toEqual([]);
    expect(issues({ ...fourGeldings, lot: { dryMatterPct: 45, crudeProteinPctDm: 10, deMcalPerKgDm: 2, baleWeightLb: 60 } })[0]?.message).toMatch(
      /haylage/,
    );
  });

  it('makes planHerdNeeds throw a ZodError on bad input', () => {
    expect(() => planHerdNeeds({ ...fourGeldings, days: -5 })).toThrow(ZodError);
  });
});
