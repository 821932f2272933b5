import type { AnalysisStep, LotStep, PriceStep, QuantityStep, SamplingStep } from '@shared/contracts/selling';
import { plusCalendarDays } from '@shared/time/days';
import { mulberry32 } from './demo-photos';
import { DEMO_LABS, FORAGE_PROFILES, type DemoLotPlan } from './demo-scenario';

/** One demo lot as its grower fills in the lot form, with the moments each part happened. */
export interface DemoLotFacts {
  /** When the grower started the draft (the lot's creation time). */
  startedAt: Date;
  /** When the rest of the form was filled in, the lot submitted and, for listed lots, approved. */
  listedAt: Date;
  lot: LotStep;
  quantity: QuantityStep;
  sampling: SamplingStep;
  analysis: AnalysisStep;
  price: PriceStep;
  /** Visitors who have looked at a listed lot. */
  viewCount: number;
}

const round1 = (x: number) => Math.round(x * 10) / 10;
const CUTTING_STARTS = ['2026-05-18', '2026-06-24', '2026-07-30', '2026-09-04'];

/**
 * The form's inputs for demo lot `index`, drawn from a PRNG seeded with the index so the demo is the same on
 * every machine. The draws happen in a fixed order; adding one shifts every later figure of the lot.
 */
export function planDemoLot(plan: DemoLotPlan, index: number): DemoLotFacts {
  const rand = mulberry32(1000 + index);
  const between = ([lo, hi]: [number, number]) => round1(lo + (hi - lo) * rand());
  const profile = FORAGE_PROFILES[plan.profile]!;
  const cuttingStart = CUTTING_STARTS[Math.min(plan.cutting, 4) - 1]!;
  const harvestStartedOn = plusCalendarDays(cuttingStart, Math.floor(rand() * 6));
  const harvestEndedOn = plusCalendarDays(harvestStartedOn, index % 9 === 4 ? 4 : 1); // a few lots took longer than 48 h
  const sampledOn = plusCalendarDays(harvestEndedOn, 24 + Math.floor(rand() * 10));
  const listedAt = new Date(`${plusCalendarDays(sampledOn, 10 + (index % 5))}T15:00:00Z`);

  // One maturity factor drives fibre up and protein down together, as in real hay (0 = early cut).
  const maturity = rand();
  const along = ([lo, hi]: [number, number], t: number) => round1(lo + (hi - lo) * Math.min(1, Math.max(0, t + (rand() - 0.5) * 0.2)));
  const adfPct = along(profile.adf, maturity);
  const ndfPct = Math.max(along(profile.ndf, maturity), adfPct + 8);
  const crudeProteinPct = along(profile.cp, 1 - maturity);
  const values = {
    basis: 'dm',
    dryMatterPct: between([86.5, 91.5]),
    crudeProteinPct,
    adfPct,
    ndfPct,
    ndfd48Pct: between([42, 60]),
    fatPct: between([1.8, 3.0]),
    ashPct: between([7.5, 11]),
    escPct: between([profile.wsc[0] * 0.55, profile.wsc[1] * 0.65]),
    wscPct: between(profile.wsc),
    starchPct: between([0.8, 3.2]),
    calciumPct: profile.forageClass === 'legume' ? between([1.2, 1.7]) : between([0.35, 0.7]),
    phosphorusPct: between([0.2, 0.35]),
  };

  const round = plan.baleType.startsWith('round');
  const coresTaken = index % 7 === 3 ? 12 : 20 + Math.floor(rand() * 6);
  const moistureAtBalingPct = round1(round ? 14 + rand() * 3 : 13 + rand() * 5);
  const listed = plan.status === 'listed';
  const viewCount = listed ? 20 + Math.floor(rand() * 200) : 0;
  const sold = listed ? Math.floor(plan.bales * (index % 4) * 0.08) : 0;
  const byTheBale = plan.baleWeightLb < 150;
  const reportNumber = `D-${26000 + index * 17}`;
  const kind = profile.forageType === 'alfalfa_grass_mix' ? 'Alfalfa–grass' : capitalise(profile.forageType.replace('_', ' '));

  return {
    startedAt: new Date(`${sampledOn}T12:00:00Z`),
    listedAt,
    lot: {
      title: `${kind}, ${ordinal(plan.cutting)} cutting — ${plan.field}`,
      fieldName: plan.field,
      cutting: plan.cutting,
      forageType: profile.forageType,
      mixDescription: profile.forageClass === 'mixed' ? 'about 60% alfalfa, 40% orchardgrass' : '',
      harvestStartedOn,
      harvestEndedOn,
      storage: index % 6 === 5 ? 'tarped' : 'barn',
      moistureAtBalingPct,
      droughtStressed: false,
      heavyNitrogen: false,
      description: 'Baled at the right moisture, stored off the ground. No rain damage.',
    },
    quantity: { baleType: plan.baleType, baleCount: plan.bales, avgBaleWeightLb: plan.baleWeightLb, totalTons: null, balesAvailable: plan.bales - sold },
    sampling: {
      sampledOn,
      coresTaken,
      balesSampled: coresTaken,
      probeDiameterIn: 0.5,
      probeLengthIn: 18,
      corePosition: round ? 'round-side' : 'butt-end-centre',
      sampledBy: index % 3 === 0 ? 'Grower' : 'County extension agent (demo)',
    },
    analysis: {
      labName: DEMO_LABS[index % DEMO_LABS.length]!,
      labCertified: index % 8 !== 6,
      reportNumber,
      reportDate: plusCalendarDays(sampledOn, 6),
      method: index % 3 === 1 ? 'wet_chemistry' : 'nirs',
      values,
    },
    price: {
      pricingUnit: byTheBale ? 'bale' : 'ton',
      priceCentsPerTon: plan.priceDollarsPerTon * 100,
      priceCentsPerBale: byTheBale ? Math.round((plan.priceDollarsPerTon * plan.baleWeightLb) / 20) : null,
      minOrderTons: byTheBale ? 1 : 5,
      deliveryTerms: byTheBale ? 'Delivered and stacked within the delivery radius; 1-ton minimum.' : 'Delivered by semi, 22–24 t a load; buyer unloads.',
      freightCentsPerLoadedMile: 325 + (index % 4) * 25,
      pickupAllowed: index % 5 !== 2,
    },
    viewCount,
  };
}

function capitalise(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}

function ordinal(n: number): string {
  return ['1st', '2nd', '3rd', '4th', '5th', '6th', '7th', '8th'][n - 1] ?? `${n}th`;
}
