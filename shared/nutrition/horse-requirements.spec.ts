import fc from 'fast-check';
import { ZodError } from 'zod';
import { HORSE_CLASSES, type MatureHorseClass } from './horse-class';
import { horseRequirements, RequirementsRequestSchema } from './horse-requirements';
import { ELEVATED_MAINTENANCE_DE_MCAL_PER_KG } from './nrc-2007-mature';
import { lbToKg } from '../units/mass';
import { roundTo } from '../units/rounding';

const at = (bodyWeightKg: number, horseClass: MatureHorseClass) => horseRequirements({ bodyWeightKg, class: horseClass });

describe('horseRequirements — mature horses', () => {
  it('500 kg maintenance: DE 16.7 Mcal, CP 630 g, Ca 20.0 g, P 14.0 g (NRC 2007 Table 16-3 avg maintenance; DE and CP verified via hoofrehab.com NRC quick glance and Merck; Ca/P from memory)', () => {
    const r = at(500, 'maintenance');
    expect(roundTo(r.deMcalPerDay, 1)).toBe(16.7);
    expect(r.crudeProteinGPerDay).toBeCloseTo(630, 6);
    expect(roundTo(r.calciumGPerDay, 1)).toBe(20.0);
    expect(roundTo(r.phosphorusGPerDay, 1)).toBe(14.0);
  });

  it('500 kg maintenance range 15.2–18.2 Mcal: the elevated level (0.0363·BW) tops it (verified, hoofrehab.com NRC quick glance)', () => {
    expect(roundTo(500 * ELEVATED_MAINTENANCE_DE_MCAL_PER_KG, 1)).toBe(18.2);
    expect(roundTo(500 * 0.0303, 1)).toBe(15.2);
  });

  it('500 kg work: DE 20.0 / 23.3 / 26.6 / 34.5 Mcal (multipliers ×1.2, ×1.4, ×1.6 and elevated ×1.9 verified via Merck Vet Manual citing NRC 2007; 500 kg totals per domain brief §6)', () => {
    expect(roundTo(at(500, 'light-work').deMcalPerDay, 1)).toBe(20.0);
    expect(roundTo(at(500, 'moderate-work').deMcalPerDay, 1)).toBe(23.3);
    expect(roundTo(at(500, 'heavy-work').deMcalPerDay, 1)).toBe(26.6);
    expect(roundTo(at(500, 'very-heavy-work').deMcalPerDay, 1)).toBe(34.5);
  });

  it('500 kg work CP: light 699 g (verified, hoofrehab.com), moderate 768, heavy 862, very heavy 1,004 g (NRC 2007 Table 16-3, from memory)', () => {
    expect(roundTo(at(500, 'light-work').crudeProteinGPerDay)).toBe(699);
    expect(roundTo(at(500, 'moderate-work').crudeProteinGPerDay)).toBe(768);
    expect(roundTo(at(500, 'heavy-work').crudeProteinGPerDay)).toBe(862);
    expect(roundTo(at(500, 'very-heavy-work').crudeProteinGPerDay)).toBe(1004);
  });

  it('500 kg work Ca/P: 30/18, 35/21, 40/29, 40/29 g (NRC 2007, from memory)', () => {
    const pairs = (['light-work', 'moderate-work', 'heavy-work', 'very-heavy-work'] as const).map((c) => {
      const r = at(500, c);
      return [roundTo(r.calciumGPerDay), roundTo(r.phosphorusGPerDay)];
    });
    expect(pairs).toEqual([
      [30, 18],
      [35, 21],
      [40, 29],
      [40, 29],
    ]);
  });

  it('1,100 lb (499.0 kg): DE 16.6 maintenance and 19.9 / 23.3 / 26.6 / 34.4 Mcal work; CP 628.7 g (domain brief §6 worked example)', () => {
    const kg = lbToKg(1100);
    expect(roundTo(at(kg, 'maintenance').deMcalPerDay, 1)).toBe(16.6);
    expect(roundTo(at(kg, 'light-work').deMcalPerDay, 1)).toBe(19.9);
    expect(roundTo(at(kg, 'moderate-work').deMcalPerDay, 1)).toBe(23.3);
    expect(roundTo(at(kg, 'heavy-work').deMcalPerDay, 1)).toBe(26.6);
    expect(roundTo(at(kg, 'very-heavy-work').deMcalPerDay, 1)).toBe(34.4);
    expect(roundTo(at(kg, 'maintenance').crudeProteinGPerDay, 1)).toBe(628.7);
    expect(roundTo(at(kg, 'light-work').crudeProteinGPerDay, 1)).toBe(697.5); // 699/500 g/kg; the brief's 698.5 g uses the rounded 1.40 g/kg
  });

  it('1,000 / 1,100 / 1,200 lb maintenance: Ca 18/20/22 g, P 13/14/15 g, DE ≈ 15/16.5/18 Mcal (verified, Sparrow Valley Ranch fact sheet from NRC 2007)', () => {
    const rows = [1000, 1100, 1200].map((lb) => {
      const r = at(lbToKg(lb), 'maintenance');
      return [roundTo(r.calciumGPerDay), roundTo(r.phosphorusGPerDay), roundTo(r.deMcalPerDay)];
    });
    expect(rows).toEqual([
      [18, 13, 15],
      [20, 14, 17], // fact sheet prints 16.5; 499 kg × 0.0333 = 16.6
      [22, 15, 18],
    ]);
  });

  it('500 kg mare, gestation month 11: DE 19.7 Mcal, CP 893 g; lactation month 1: DE 31.7 Mcal, CP 1,535 g (NRC 2007 Table 16-3, from memory)', () => {
    const gestation = at(500, 'late-gestation');
    expect(gestation.deMcalPerDay).toBeCloseTo(19.7, 6);
    expect(gestation.crudeProteinGPerDay).toBeCloseTo(893, 6);
    const lactation = at(500, 'lactation');
    expect(lactation.deMcalPerDay).toBeCloseTo(31.7, 6);
    expect(lactation.crudeProteinGPerDay).toBeCloseTo(1535, 6);
    expect(lactation.calciumGPerDay).toBeCloseTo(59.1, 6);
    expect(lactation.phosphorusGPerDay).toBeCloseTo(38.3, 6);
  });

  it('dry-matter intake is 1.5–2.5 % BW, typically 2 % (500 kg: 7.5–12.5 kg, 10.0 kg; domain brief §6, NRC from memory; eXtension same range)', () => {
    const r = at(500, 'maintenance');
    expect([r.dmiMinKgPerDay, r.dmiKgPerDay, r.dmiMaxKgPerDay].map((x) => roundTo(x, 1))).toEqual([7.5, 10.0, 12.5]);
  });

  it('lets a lactating mare eat more: up to 3 % BW (practice, 2–3 % BW)', () => {
    expect(at(500, 'lactation').dmiMaxKgPerDay).toBeCloseTo(15, 10);
  });

  it('names its source, marking memory values', () => {
    expect(at(500, 'maintenance').source).toMatch(/NRC \(2007\)/);
    expect(at(500, 'lactation').source).toMatch(/from memory/);
  });

  it('scales linearly with body weight for every mature class (property)', () => {
    const mature = HORSE_CLASSES.filter((c): c is MatureHorseClass => c !== 'growing');
    fc.assert(
      fc.property(fc.double({ min: 200, max: 450, noNaN: true }), fc.constantFrom(...mature), (w, c) => {
        const one = at(w, c);
        const two = at(2 * w, c);
        expect(two.deMcalPerDay).toBeCloseTo(2 * one.deMcalPerDay, 9);
        expect(two.crudeProteinGPerDay).toBeCloseTo(2 * one.crudeProteinGPerDay, 9);
      }),
    );
  });

  it('needs more energy and protein for each step up in work (property)', () => {
    const ladder = ['maintenance', 'light-work', 'moderate-work', 'heavy-work', 'very-heavy-work'] as const;
    fc.assert(
      fc.property(fc.double({ min: 200, max: 900, noNaN: true }), (w) => {
        const rs = ladder.map((c) => at(w, c));
        for (let i = 1; i < rs.length; i++) {
          expect(rs[i]!.deMcalPerDay).toBeGreaterThan(rs[i - 1]!.deMcalPerDay);
          expect(rs[i]!.crudeProteinGPerDay).toBeGreaterThan(rs[i - 1]!.crudeProteinGPerDay);
        }
      }),
    );
  });
});

describe('horseRequirements — growing horses', () => {
  it('6-month weanling, 216 kg (500 kg mature): DE 15.5 Mcal, CP 676 g, Ca 38.9 g, P 21.6 g (NRC 2007 Table 16-3, from memory; within 2 %)', () => {
    const r = horseRequirements({ bodyWeightKg: 216, class: 'growing', ageMonths: 6 });
    expect(r.deMcalPerDay).toBeCloseTo(15.5, 1);
    expect(Math.abs(r.crudeProteinGPerDay - 676) / 676).toBeLessThan(0.01);
    expect(Math.abs(r.calciumGPerDay - 38.9) / 38.9).toBeLessThan(0.02);
    expect(Math.abs(r.phosphorusGPerDay - 21.6) / 21.6).toBeLessThan(0.02);
    expect(r.growth?.matureBodyWeightKg).toBeCloseTo(500, 0);
    expect(r.growth?.averageDailyGainKg).toBeCloseTo(0.72, 2);
  });

  it('12-month yearling, 321 kg: DE ≈ 18.9 Mcal, CP ≈ 846 g, Ca ≈ 37.7 g, P ≈ 21.0 g (NRC 2007 Table 16-3, from memory; within 1 %)', () => {
    const r = horseRequirements({ bodyWeightKg: 321, class: 'growing', ageMonths: 12 });
    expect(Math.abs(r.deMcalPerDay - 18.9) / 18.9).toBeLessThan(0.01);
    expect(Math.abs(r.crudeProteinGPerDay - 846) / 846).toBeLessThan(0.01);
    expect(Math.abs(r.calciumGPerDay - 37.7) / 37.7).toBeLessThan(0.01);
    expect(Math.abs(r.phosphorusGPerDay - 21.0) / 21.0).toBeLessThan(0.01);
  });

  it('uses a 2–3 % BW dry-matter band for growing horses (practice)', () => {
    const r = horseRequirements({ bodyWeightKg: 200, class: 'growing', ageMonths: 6 });
    expect([r.dmiMinKgPerDay, r.dmiKgPerDay, r.dmiMaxKgPerDay]).toEqual([4, 5, 6]);
  });
});

describe('RequirementsRequestSchema', () => {
  const messages = (input: unknown): string[] => {
    const result = RequirementsRequestSchema.safeParse(input);
    return result.success ? [] : result.error.issues.map((i) => i.message);
  };

  it('rejects mature horses outside 200–900 kg with a clear message', () => {
    expect(messages({ bodyWeightKg: 150, class: 'maintenance' })).toEqual([
      'bodyWeightKg must be between 200 and 900 kg for a mature horse (NRC 2007 range); got 150',
    ]);
    expect(messages({ bodyWeightKg: 950, class: 'heavy-work' })[0]).toMatch(/between 200 and 900 kg/);
    expect(() => horseRequirements({ bodyWeightKg: 150, class: 'maintenance' })).toThrow(ZodError);
  });

  it('rejects non-numbers, zero, NaN and infinity', () => {
    expect(messages({ bodyWeightKg: '500', class: 'maintenance' })[0]).toMatch(/number of kilograms/);
    expect(messages({ bodyWeightKg: 0, class: 'maintenance' })[0]).toMatch(/more than 0 kg/);
    expect(messages({ bodyWeightKg: Number.NaN, class: 'maintenance' })).not.toEqual([]);
    expect(messages({ bodyWeightKg: Number.POSITIVE_INFINITY, class: 'maintenance' })).not.toEqual([]);
  });

  it('rejects an unknown class, listing the valid ones', () => {
    expect(messages({ bodyWeightKg: 500, class: 'racing' })[0]).toMatch(/^class must be one of: maintenance, light-work/);
  });

  it('is strict about unknown keys', () => {
    expect(RequirementsRequestSchema.safeParse({ bodyWeightKg: 500, class: 'maintenance', breed: 'Arabian' }).success).toBe(false);
  });

  it('allows ageMonths only with growing, and requires it there', () => {
    expect(messages({ bodyWeightKg: 500, class: 'maintenance', ageMonths: 12 })).toEqual(["ageMonths applies only to class 'growing'"]);
    expect(messages({ bodyWeightKg: 216, class: 'growing' })).toEqual(["ageMonths is required for class 'growing'"]);
    expect(messages({ bodyWeightKg: 216, class: 'growing', ageMonths: 2 })[0]).toMatch(/at least 4/);
    expect(messages({ bodyWeightKg: 216, class: 'growing', ageMonths: 30 })[0]).toMatch(/at most 24/);
  });

  it('rejects a growing horse whose weight and age imply an impossible adult', () => {
    expect(messages({ bodyWeightKg: 600, class: 'growing', ageMonths: 6 })[0]).toMatch(/implies a mature weight of about 1389 kg/);
    expect(messages({ bodyWeightKg: 60, class: 'growing', ageMonths: 12 })[0]).toMatch(/implies a mature weight/);
  });
});
