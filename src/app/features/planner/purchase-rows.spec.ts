import type { PurchasePlanResponse } from '@shared/contracts/planner';
import { supplyRows } from './purchase-rows';

/** Only the parts of a purchase-plan answer the supply table reads. */
function answer(supplied: { deMcal: number; crudeProteinKg: number; dryMatterKg: number }): PurchasePlanResponse {
  const period = { days: 100, deFromHayMcal: 3330, crudeProteinFromHayKg: 126, hayDmFloorKg: 1500, hayDmMaxKg: 2500 };
  return { herd: { totals: { period } }, plan: { supplied } } as unknown as PurchasePlanResponse;
}

// Conversions: NIST Handbook 44, Appendix C (1 kg = 2.204 62 lb; 1 short ton = 907.184 74 kg).
describe('supplyRows', () => {
  it('states protein in lb and dry matter in US tons for a herd entered in lb, the metric figures beside', () => {
    const [energy, protein, dm] = supplyRows(answer({ deMcal: 3400, crudeProteinKg: 140, dryMatterKg: 1900 }), 'lb');
    expect(energy).toMatchObject({ what: 'energy', met: true, need: { value: 3330, unit: 'Mcal' } });
    // 126 kg of crude protein = 277.8 lb.
    expect(protein!.need.unit).toBe('lb');
    expect(protein!.need.value / 277.78).toBeCloseTo(1, 3);
    expect(protein!.need.other).toBe(126);
    // 1,500 kg of dry matter = 1.653 US tons (1.5 tonnes); 2,500 kg = 2.756 US tons.
    expect(dm!.need.unit).toBe('US tons');
    expect(dm!.need.value / 1.6535).toBeCloseTo(1, 3);
    expect(dm!.most!.value / 2.7558).toBeCloseTo(1, 3);
    expect(dm!.need.other).toBeCloseTo(1.5, 3);
    expect(dm!.met).toBe(true);
  });

  it('states dry matter in tonnes for a herd entered in kg', () => {
    const dm = supplyRows(answer({ deMcal: 3400, crudeProteinKg: 140, dryMatterKg: 1900 }), 'kg')[2]!;
    expect(dm.need).toMatchObject({ unit: 'tonnes', otherUnit: 'US tons' });
    expect(dm.need.value).toBeCloseTo(1.5, 3);
    expect(dm.supplied.value).toBeCloseTo(1.9, 3);
  });

  it('says a need is not met when the mix falls short, or feeds more dry matter than the horses can eat', () => {
    const short = supplyRows(answer({ deMcal: 3000, crudeProteinKg: 100, dryMatterKg: 1400 }), 'kg');
    expect(short.map((r) => r.met)).toEqual([false, false, false]);
    expect(supplyRows(answer({ deMcal: 3400, crudeProteinKg: 140, dryMatterKg: 2600 }), 'kg')[2]!.met).toBe(false);
  });
});
