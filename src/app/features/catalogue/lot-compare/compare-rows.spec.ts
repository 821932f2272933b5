import { registerLocaleData } from '@angular/common';
import localeFrCa from '@angular/common/locales/fr-CA';
import type { ComparedLot } from '@shared/contracts/compare';
import { compareSections } from './compare-rows';

describe('compareSections', () => {
  it('shows cost per lb of crude protein and marks the lowest of each cost row', () => {
    const sections = compareSections([lot(1, 8500, 110.5), lot(2, 9000, 95.25)]);
    const cost = sections.find((s) => s.title === 'Cost')!;
    const protein = cost.rows.find((r) => r.label === 'Cost per lb of crude protein')!;
    expect(protein.values).toEqual(['$1.11', '$0.95']);
    expect(protein.best).toBe(1);
    const freight = cost.rows.find((r) => r.label === 'Freight')!;
    expect(freight.values[0]).toBe('$1,050 (1 load × 300 mi × $3.50 per loaded mile)');
  });

  // Unicode CLDR: French (Canada) writes a decimal comma, groups with a no-break space and writes US dollars "$ US" after.
  it('writes its figures in the reader\'s locale', () => {
    registerLocaleData(localeFrCa, 'fr-CA');
    const sections = compareSections([lot(1, 8500, 110.5), lot(2, 9000, 95.25)], 'fr-CA');
    const protein = sections.find((s) => s.title === 'Cost')!.rows.find((r) => r.label === 'Cost per lb of crude protein')!;
    expect(protein.values[0]).toMatch(/^1,11[\u00a0\u202f]\$[\u00a0\u202f]US$/);
    const freight = sections.find((s) => s.title === 'Cost')!.rows.find((r) => r.label === 'Freight')!;
    expect(freight.values[0]).toMatch(/^1[\u00a0\u202f]050[\u00a0\u202f]\$[\u00a0\u202f]US \(1 load × 300 mi × 3,50[\u00a0\u202f]\$[\u00a0\u202f]US per loaded mile\)$/);
  });
});

function lot(id: number, priceCentsPerTon: number, perLbCp: number): ComparedLot {
  return {
    id,
    title: `Lot ${id}`,
    status: 'listed',
    farmName: 'Invented Farm',
    city: 'Town',
    state: 'KS',
    forageType: 'alfalfa',
    cutting: 1,
    baleType: 'small_square_2_string',
    avgBaleWeightLb: 60,
    balesAvailable: 800,
    tonsAvailable: 24,
    minOrderTons: 1,
    priceCentsPerTon,
    freightCentsPerLoadedMile: 350,
    distanceMi: 300,
    deliveryRadiusMi: 400,
    labCertified: true,
    analysisVerified: true,
    nutrients: { dryMatterPct: 88, crudeProteinPct: 18, adfPct: 30, ndfPct: 40, nscPct: 10, fatPct: 2, ashPct: 9, calciumPct: 1.2, phosphorusPct: 0.25, rfv: 150, rfq: 160, tdnPct: 60, deMcalPerKgDm: 2.3, deMethod: 'nrc-2007' },
    pricing: { basis: 'delivered', note: null, tons: 24, loads: 1, hayCents: priceCentsPerTon * 24, freightCents: 105000, totalCents: priceCentsPerTon * 24 + 105000, perTonCents: priceCentsPerTon + 4375, perDmTonCents: 10000, perLbCrudeProteinCents: perLbCp, perMcalDeCents: 6.5 },
  };
}
