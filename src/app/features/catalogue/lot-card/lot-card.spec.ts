import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { LotSummary } from '@shared/contracts/lots';
import { LotCard } from './lot-card';

describe('LotCard', () => {
  it('shows the measured figures and both prices of a lot', async () => {
    TestBed.configureTestingModule({ providers: [provideRouter([])] });
    const fixture = TestBed.createComponent(LotCard);
    fixture.componentRef.setInput('lot', sampleLot());
    await fixture.whenStable();
    const text = (fixture.nativeElement as HTMLElement).textContent!.replace(/\s+/g, ' ');
    expect(text).toContain('Alfalfa, 2nd cutting');
    expect(text).toMatch(/RFV\s*152/);
    expect(text).toMatch(/CP\s*20.0%/);
    expect(text).toContain('$300/ton as-fed');
    expect(text).toContain('$341/ton DM');
    expect(text).toContain('Sampled to protocol');
  });
});

function sampleLot(): LotSummary {
  return {
    id: 1,
    title: 'Alfalfa, 2nd cutting',
    farmName: 'Invented Farm',
    city: 'Town',
    state: 'KS',
    forageType: 'alfalfa',
    forageClass: 'legume',
    cutting: 2,
    baleType: 'small_square_2_string',
    avgBaleWeightLb: 60,
    balesAvailable: 100,
    tonsAvailable: 3,
    priceCentsPerTon: 30000,
    priceCentsPerDmTon: 34091,
    harvestYear: 2026,
    dryMatterPct: 88,
    rfv: 152.4,
    rfq: null,
    crudeProteinPct: 20,
    adfPct: 30,
    ndfPct: 40,
    nscPct: 11.3,
    usdaGrade: 'Good',
    samplingCompliant: true,
    labCertified: true,
    analysisVerified: true,
    distanceMi: null,
    mapPoint: { lat: 39.2, lon: -96.6 },
    cover: null,
    publishedAt: null,
  };
}
