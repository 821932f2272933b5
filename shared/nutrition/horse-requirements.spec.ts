import fc from 'fast-check';
import { ZodError } from 'zod';
import { HORSE_CLASSES, type MatureHorseClass } from './horse-class';
import { horseRequirements, RequirementsRequestSchema } from './horse-requirements';
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

  it('dry-matter intake is 1.5–2.5 % BW, typically 2 % (500 kg: 7.5–12.5 kg, 10.0 kg; domain brief §6, NRC from memory; eXtension same range)', () => {
    const r = at(500, 'maintenance');
    expect([r.dmiMinKgPerDay, r.dmiKgPerDay, r.dmiMaxKgPerDay].map((x) => roundTo(x, 1))).toEqual([7.5, 10.0, 12.5]);
  });

  it('lets a lactating mare eat more: up to 3 % BW (practice, 2–3 % BW)', () => {
    expect(at(500, 'lactation').dmiMaxKgPerDay).toBeCloseTo(15, 10);
  });

  it('names its source, marking memory values', () => {
    expect(at(500, 'maintenance').source).toMatch(/NRC \(2007\)/);
    expect(at(500, 'lactation').source).toMatch(/DE 31\.7 Mcal \(memory\), CP 1535 g \(table\)/);
  });

  it('scales linearly with body weight for every mature class (property)', () => {
    const mature = HORSE_CLASSES.filter((c): c is MatureHorseClass => c !== 'growing' && c !== 'gestation');
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

describe('horseRequirements — the three NRC 2007 maintenance levels', () => {
  // 500 kg: 15.2 / 16.7 / 18.2 Mcal DE (hoofrehab.com "NRC plus Kellon quick glance": 15.2 to 18.2 Mcal, average to elevated;
  // domain brief S11). Minimum-maintenance CP, Ca, P: Kellon's open 400 kg mare, 432 g CP, 16 g Ca, 11.2 g P.
  it('500 kg minimum maintenance: DE 15.2 Mcal a day (NRC 2007 via hoofrehab.com)', () => {
    expect(roundTo(at(500, 'minimum-maintenance').deMcalPerDay, 1)).toBe(15.2);
  });

  it('500 kg elevated maintenance: DE 18.2 Mcal a day (NRC 2007 via hoofrehab.com)', () => {
    expect(roundTo(at(500, 'elevated-maintenance').deMcalPerDay, 1)).toBe(18.2);
  });

  it('400 kg minimum maintenance: CP 432 g, Ca 16 g, P 11.2 g (Kellon 2008, NRC 2007 open mare)', () => {
    const r = at(400, 'minimum-maintenance');
    expect([roundTo(r.crudeProteinGPerDay), roundTo(r.calciumGPerDay, 1), roundTo(r.phosphorusGPerDay, 1)]).toEqual([432, 16, 11.2]);
  });

  it('orders minimum < average < elevated at any mature weight (NRC 2007 maintenance levels)', () => {
    for (const kg of [200, 350, 500, 650, 900]) {
      const [lo, mid, hi] = (['minimum-maintenance', 'maintenance', 'elevated-maintenance'] as const).map((c) => at(kg, c).deMcalPerDay);
      expect(lo).toBeLessThan(mid!);
      expect(mid).toBeLessThan(hi!);
    }
  });
});

describe('horseRequirements — broodmares by month', () => {
  const mare = (bodyWeightKg: number, horseClass: 'gestation' | 'lactation', month: number) => horseRequirements({ bodyWeightKg, class: horseClass, month });

  // Thunes, Summit Equine Nutrition, "Feeding the 3rd trimester mare", Table 1 (500 kg, NRC 2007):
  // < 5 months 16.7; 5: 17.1; 6: 17.4; 7: 17.9; 8: 18.5; 9: 19.2; 10: 20.2; 11: 21.4 Mcal DE a day.
  it.each([
    [3, 16.7],
    [5, 17.1],
    [6, 17.4],
    [7, 17.9],
    [8, 18.5],
    [9, 19.2],
    [10, 20.2],
    [11, 21.4],
  ])('500 kg mare at gestation month %i needs %s Mcal DE a day (Thunes, from NRC 2007)', (month, de) => {
    expect(roundTo(mare(500, 'gestation', month).deMcalPerDay, 1)).toBe(de);
  });

  // Forum quote of the NRC 2007 1,100 lb rows: < 5 months 630 g, 5: 685, 6: 704, 7: 729, 8: 759, 9: 797, 10: 841, 11: 893 g CP;
  // lactation month 1 1,535 g, month 6 1,265 g.
  it('500 kg mare: CP by month of gestation and lactation months 1 and 6 as the NRC 2007 rows quoted', () => {
    const gestation = [3, 5, 6, 7, 8, 9, 10, 11].map((m) => roundTo(mare(500, 'gestation', m).crudeProteinGPerDay));
    expect(gestation).toEqual([630, 685, 704, 729, 759, 797, 841, 893]);
    expect(roundTo(mare(500, 'lactation', 1).crudeProteinGPerDay)).toBe(1535);
    expect(roundTo(mare(500, 'lactation', 6).crudeProteinGPerDay)).toBe(1265);
  });

  // Independent check at another weight: Kellon (2008) for a 400 kg mare — month 7: CP 583 g, Ca 22.4 g, P 16 g;
  // month 11: CP 714 g, Ca 28.8 g, P 21 g; lactation: CP 1,228 g, P 30.6 g.
  it('400 kg mare at gestation months 7 and 11 and in lactation matches Kellon’s NRC 2007 figures (within 1 g)', () => {
    const m7 = mare(400, 'gestation', 7);
    const m11 = mare(400, 'gestation', 11);
    const l1 = mare(400, 'lactation', 1);
    expect(Math.abs(m7.crudeProteinGPerDay - 583)).toBeLessThan(1);
    expect(Math.abs(m7.calciumGPerDay - 22.4)).toBeLessThan(0.1);
    expect(Math.abs(m7.phosphorusGPerDay - 16)).toBeLessThan(0.1);
    expect(Math.abs(m11.crudeProteinGPerDay - 714)).toBeLessThan(1);
    expect(Math.abs(m11.calciumGPerDay - 28.8)).toBeLessThan(0.1);
    expect(Math.abs(m11.phosphorusGPerDay - 21)).toBeLessThan(0.1);
    expect(Math.abs(l1.crudeProteinGPerDay - 1228)).toBeLessThan(1);
    expect(Math.abs(l1.phosphorusGPerDay - 30.6)).toBeLessThan(0.1);
  });

  it('at 600 kg a mare at gestation month 9 needs 600/500 of the 500 kg row: 23.0 Mcal, 956 g CP (Thunes; forum quote)', () => {
    const r = mare(600, 'gestation', 9);
    expect(roundTo(r.deMcalPerDay, 1)).toBe(23.0); // 19.2 × 1.2
    expect(roundTo(r.crudeProteinGPerDay)).toBe(956); // 797 × 1.2
  });

  it('treats late-gestation as month 11 and lactation without a month as month 1', () => {
    expect(at(500, 'late-gestation').deMcalPerDay).toBeCloseTo(mare(500, 'gestation', 11).deMcalPerDay, 10);
    expect(at(500, 'lactation').crudeProteinGPerDay).toBeCloseTo(mare(500, 'lactation', 1).crudeProteinGPerDay, 10);
  });

  it('needs less energy and protein each month of lactation after the second (milk yield falls; NRC 2007)', () => {
    const rows = [2, 3, 4, 5, 6].map((m) => mare(500, 'lactation', m));
    for (let i = 1; i < rows.length; i++) {
      expect(rows[i]!.deMcalPerDay).toBeLessThan(rows[i - 1]!.deMcalPerDay);
      expect(rows[i]!.crudeProteinGPerDay).toBeLessThan(rows[i - 1]!.crudeProteinGPerDay);
    }
  });

  it('says per value whether it is from the table, from memory or our estimate', () => {
    expect(mare(500, 'gestation', 7).source).toMatch(/DE 17\.9 Mcal \(table\), CP 729 g \(table\), Ca 28 g \(table\), P 20 g \(table\)/);
    expect(mare(500, 'lactation', 4).source).toMatch(/Ca 53\.5 g \(estimate\)/);
  });

  it('asks for a month for gestation, caps gestation at 11 and lactation at 6, and refuses a month elsewhere', () => {
    const messages = (input: unknown) => {
      const r = RequirementsRequestSchema.safeParse(input);
      return r.success ? [] : r.error.issues.map((i) => i.message);
    };
    expect(messages({ bodyWeightKg: 500, class: 'gestation' })).toEqual(["month (of gestation, 1–11) is required for class 'gestation'"]);
    expect(messages({ bodyWeightKg: 500, class: 'gestation', month: 12 })).toEqual(['month of gestation must be at most 11']);
    expect(messages({ bodyWeightKg: 500, class: 'lactation', month: 7 })[0]).toMatch(/at most 6/);
    expect(messages({ bodyWeightKg: 500, class: 'maintenance', month: 3 })).toEqual(["month applies only to classes 'gestation' and 'lactation'"]);
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
    expect(messages({ bodyWeightKg: 500, class: 'racing' })[0]).toMatch(/^class must be one of: minimum-maintenance, maintenance, elevated-maintenance, light-work/);
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
