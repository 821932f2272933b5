import { nitrateFindings, nitrateNPpm, nitratePctNo3, nitrateTestAdvised } from './nitrate';

describe('nitrate', () => {
  // ECIR group reading of an equine lab report: 226 ppm nitrate-N = 0.1 % nitrate = 1,001 ppm nitrate ion;
  // and a report printing 0.73 % nitrate beside 1,658 ppm nitrate-N.
  it('converts lab units as the reports print them', () => {
    expect(nitratePctNo3(226, 'ppm-no3-n')).toBeCloseTo(0.1, 3);
    expect(nitratePctNo3(1658, 'ppm-no3-n')).toBeCloseTo(0.73, 2);
    expect(nitratePctNo3(1001, 'ppm-no3')).toBeCloseTo(0.1001, 6);
    expect(nitratePctNo3(0.73, 'pct-no3')).toBe(0.73);
  });

  // Dairy One (quoted on the ECIR group): 1.5 % nitrate ≈ 3,450 ppm nitrate-N; by molar mass 1.5 % × 10,000 / 4.427 = 3,388,
  // so the lab's round figure is within 2 %.
  it('puts the 1.5 % horse limit at about 3,450 ppm nitrate-N (within the lab’s 2 % rounding)', () => {
    expect(Math.abs(nitrateNPpm(1.5) - 3450) / 3450).toBeLessThan(0.02);
  });

  // Clemson: under 1,000 ppm NO3-N safe under all conditions. OSU 2024: horses tolerate 1–1.5 % nitrate.
  it('grades results against the livestock table and the horse limit, deferring to a veterinarian', () => {
    expect(nitrateFindings(null)).toEqual([]);
    expect(nitrateFindings(nitratePctNo3(900, 'ppm-no3-n'))[0]!.code).toBe('nitrate-low');
    const middling = nitrateFindings(0.73)[0]!;
    expect(middling.code).toBe('nitrate-above-livestock-safe');
    expect(middling.message).toMatch(/veterinarian/);
    expect(nitrateFindings(1.6)[0]).toMatchObject({ code: 'nitrate-above-horse-limit', severity: 'warning' });
  });

  // Oklahoma State 2024: sorghums, sudan, johnsongrass and small grains such as oat and wheat hay; drought. NC State: heavy N.
  it('prompts a test for small-grain hay, drought and heavy nitrogen, not for timothy grown normally', () => {
    expect(nitrateTestAdvised({ forageType: 'oat' })).toBe(true);
    expect(nitrateTestAdvised({ forageType: 'timothy' })).toBe(false);
    expect(nitrateTestAdvised({ forageType: 'timothy', drought: true })).toBe(true);
    expect(nitrateTestAdvised({ forageType: 'bermudagrass', heavyNitrogen: true })).toBe(true);
  });
});
