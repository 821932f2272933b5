import { ZodError } from 'zod';
import { planHerdNeeds } from './herd-needs';
import { type CandidateLot, leastCostPlan, LeastCostPlanRequestSchema, needsFromHerdPlan } from './least-cost-plan';

/** kg of dry matter per short ton as-fed at a DM %. */
// 1 short ton = 907.184 74 kg (NIST Handbook 44, Appendix C); the app's 2,000 lb ÷ 2.2046 differs by 0.001 %.
const dmPerTon = (dmPct: number) => 907.18474 * (dmPct / 100);

const lot = (overrides: Partial<CandidateLot> & Pick<CandidateLot, 'lotId'>): CandidateLot => ({
  pricePerTonCents: 20000,
  freightCentsPerLoadedMile: 0,
  distanceMi: 0,
  tonsAvailable: 100,
  minOrderTons: 0,
  dryMatterPct: 90,
  crudeProteinPctDm: 10,
  deMcalPerKgDm: 2.0,
  ...overrides,
});

describe('leastCostPlan', () => {
  it('mixes a cheap grass that lacks protein with alfalfa, at the hand-solved vertex where energy and protein both just bind', () => {
    const grass = lot({ lotId: 'grass', pricePerTonCents: 15000, crudeProteinPctDm: 6, deMcalPerKgDm: 1.9 });
    const alfalfa = lot({ lotId: 'alfalfa', pricePerTonCents: 25000, crudeProteinPctDm: 20, deMcalPerKgDm: 2.3 });
    const needs = { deMcal: 20000, crudeProteinKg: 900, maxDryMatterKg: 12000 };
    const plan = leastCostPlan({ needs, lots: [grass, alfalfa] });

    // By hand: g·dm·1.9 + a·dm·2.3 = 20000 and g·dm·0.06 + a·dm·0.20 = 900, dm = 816.47 kg DM/t.
    const dm = dmPerTon(90);
    const det = 1.9 * 0.2 - 2.3 * 0.06;
    const g = (20000 * 0.2 - 900 * 2.3) / (det * dm);
    const a = (1.9 * 900 - 0.06 * 20000) / (det * dm);

    expect(plan.feasible).toBe(true);
    expect(plan.lines.map((l) => l.lotId)).toEqual(['grass', 'alfalfa']);
    expect(plan.lines[0]!.tons).toBeCloseTo(g, 2);
    expect(plan.lines[1]!.tons).toBeCloseTo(a, 2);
    expect(Math.abs(plan.totalCostCents - (15000 * g + 25000 * a))).toBeLessThan(50); // ≈ $2,110.45, tons rounded up to 0.001 t
    expect(plan.supplied.deMcal).toBeGreaterThanOrEqual(20000);
    expect(plan.supplied.crudeProteinKg).toBeGreaterThanOrEqual(900);
    expect(plan.explanation.join(' ')).toMatch(/Lot grass is the cheapest energy .* so lot alfalfa is mixed in for protein\./);
    expect(plan.explanation).toContain('Energy and protein are both met exactly, so the plan buys no more than it must.');
  });

  it('buys the one cheapest lot when it covers everything, and says why the others are not bought', () => {
    const plan = leastCostPlan({
      needs: { deMcal: 10000, crudeProteinKg: 300, maxDryMatterKg: 100000 },
      lots: [lot({ lotId: 'A', pricePerTonCents: 18000 }), lot({ lotId: 'B', pricePerTonCents: 21000 })],
    });
    const tonsForEnergy = 10000 / (dmPerTon(90) * 2.0);
    expect(plan.lines).toHaveLength(1);
    expect(plan.lines[0]).toMatchObject({ lotId: 'A', loads: 1, freightCents: 0 });
    expect(plan.lines[0]!.tons).toBeCloseTo(tonsForEnergy, 2);
    expect(plan.explanation).toContain('Energy is the limiting need: the plan buys just enough hay for it, and protein comes out above the need.');
    expect(plan.explanation.some((s) => s.startsWith('Lot B is not bought'))).toBe(true);
  });

  it('charges freight per whole load, so a part load is topped up from a dearer local lot (hand-solved)', () => {
    // Same hay in both lots; the need is just under 30 t. Far: $190/t + $240 per 24 t load; Local: $205/t, no freight.
    // All far: 30 t, 2 loads = $6,180. All local: $6,150. Far 24 t (1 load) + local 6 t = $4,560 + $240 + $1,230 = $6,030.
    const perTonDe = dmPerTon(90) * 2.0;
    const request = {
      needs: { deMcal: 29.9999 * perTonDe, crudeProteinKg: 0, maxDryMatterKg: 1e6 },
      lots: [
        lot({ lotId: 'far', pricePerTonCents: 19000, freightCentsPerLoadedMile: 400, distanceMi: 60 }),
        lot({ lotId: 'local', pricePerTonCents: 20500 }),
      ],
    };
    const plan = leastCostPlan(request);
    expect(plan.freightModel).toBe('per-load');
    expect(plan.lines).toEqual([
      { lotId: 'far', tons: 24, loads: 1, hayCents: 456000, freightCents: 24000, costCents: 480000 },
      { lotId: 'local', tons: 6, loads: 1, hayCents: 123000, freightCents: 0, costCents: 123000 },
    ]);
    expect(plan.totalCostCents).toBe(603000);
    expect(plan.explanation).toContain(
      'From lot far, buy 24.00 t at $190.00/t ($4,560.00) plus $240.00 freight (1 load × 60 mi × $4.00 per loaded mile): $4,800.00 in all, $200.00/t delivered.',
    );

    // The linear approximation spreads $240 over 24 t ($10/t) and buys all 30 t far away — and says what whole loads would cost.
    const linear = leastCostPlan({ ...request, freightModel: 'per-ton' });
    expect(linear.lines.map((l) => [l.lotId, l.tons, l.freightCents])).toEqual([['far', 30, 30000]]);
    expect(linear.totalCostCents).toBe(600000);
    expect(linear.explanation.join(' ')).toMatch(/trucked in whole loads it would cost \$480\.00 rather than \$300\.00/);
  });

  it('treats a minimum order as buy-at-least-that-much-or-nothing', () => {
    // Need 10 t worth. Cheap lot C ($150/t) only sells 12 t or more: 12 × $150 = $1,800 beats 10 × $200 = $2,000.
    const need = { deMcal: 10 * dmPerTon(90) * 2.0 - 1, crudeProteinKg: 0, maxDryMatterKg: 1e6 };
    const lots = [lot({ lotId: 'C', pricePerTonCents: 15000, minOrderTons: 12 }), lot({ lotId: 'D', pricePerTonCents: 20000 })];
    const overBuy = leastCostPlan({ needs: need, lots });
    expect(overBuy.lines.map((l) => [l.lotId, l.tons])).toEqual([['C', 12]]);
    expect(overBuy.totalCostCents).toBe(180000);
    expect(overBuy.explanation.join(' ')).toMatch(/That is its minimum order\./);

    // With a 20 t minimum ($3,000) the dearer lot wins.
    const tooBig = leastCostPlan({ needs: need, lots: [{ ...lots[0]!, minOrderTons: 20 }, lots[1]!] });
    expect(tooBig.lines.map((l) => l.lotId)).toEqual(['D']);
    expect(tooBig.lines[0]!.tons).toBeCloseTo(10, 2);
  });

  it('respects stock: takes all of the cheap lot and makes up the rest elsewhere', () => {
    const plan = leastCostPlan({
      needs: { deMcal: 10 * dmPerTon(90) * 2.0, crudeProteinKg: 0, maxDryMatterKg: 1e6 },
      lots: [lot({ lotId: 'small', pricePerTonCents: 15000, tonsAvailable: 4 }), lot({ lotId: 'big', pricePerTonCents: 20000 })],
    });
    expect(plan.lines.map((l) => [l.lotId, l.tons])).toEqual([
      ['small', 4],
      ['big', 6],
    ]);
    expect(plan.explanation.join(' ')).toMatch(/it has only 4\.00 t for sale, so lot big makes up the rest/);
  });

  it('counts feeding waste: 10 % waste means buying a ninth more', () => {
    const needs = { deMcal: 9 * dmPerTon(90) * 2.0, crudeProteinKg: 0, maxDryMatterKg: 1e6 };
    const plan = leastCostPlan({ needs, lots: [lot({ lotId: 'A' })], wasteFraction: 0.1 });
    expect(plan.lines[0]!.tons).toBeCloseTo(10, 2);
    expect(plan.explanation[1]).toMatch(/^Eaten after 10 % feeding waste/);
  });

  it('is infeasible when stock is short, and says by how much', () => {
    const plan = leastCostPlan({
      needs: { deMcal: 20000, crudeProteinKg: 300, maxDryMatterKg: 1e6 },
      lots: [lot({ lotId: 'A', tonsAvailable: 5 })],
    });
    expect(plan).toMatchObject({ feasible: false, totalCostCents: 0, lines: [] });
    expect(plan.explanation).toEqual([
      'No combination of the offered lots meets the needs.',
      'Even buying every listed ton, the lots supply only 8,165 Mcal of the 20,000 Mcal of digestible energy needed.',
      'Consider adding lots, a richer hay or a concentrate to the ration; consult your veterinarian or an equine nutritionist.',
    ]);
  });

  it('is infeasible when the hay is too thin for what the horses can eat', () => {
    const plan = leastCostPlan({
      needs: { deMcal: 20000, crudeProteinKg: 100, maxDryMatterKg: 5000 },
      lots: [lot({ lotId: 'A', deMcalPerKgDm: 1.9 }), lot({ lotId: 'B', deMcalPerKgDm: 2.3 })],
    });
    expect(plan.feasible).toBe(false);
    expect(plan.explanation[1]).toBe(
      'The horses can eat at most 5,000 kg of dry matter; filled with the most energy-dense hay listed, that is only 11,500 Mcal of the 20,000 Mcal needed.',
    );
  });

  it('blames minimum orders when they force more hay than the horses can eat', () => {
    const plan = leastCostPlan({
      needs: { deMcal: 1000, crudeProteinKg: 0, maxDryMatterKg: 1000 },
      lots: [lot({ lotId: 'A', minOrderTons: 5 })],
    });
    expect(plan.feasible).toBe(false);
    expect(plan.explanation[1]).toMatch(/^The minimum orders are the obstacle/);
  });

  it('is infeasible with no lots, and trivially feasible with no needs', () => {
    expect(leastCostPlan({ needs: { deMcal: 1, crudeProteinKg: 0, maxDryMatterKg: 10 }, lots: [] }).explanation[0]).toBe(
      'No lots were offered, so nothing can meet the needs.',
    );
    expect(leastCostPlan({ needs: { deMcal: 0, crudeProteinKg: 0, maxDryMatterKg: 10 }, lots: [lot({ lotId: 'A' })] })).toMatchObject({
      feasible: true,
      totalCostCents: 0,
      lines: [],
    });
  });

  it('plans a year of hay for a herd from planHerdNeeds', () => {
    const herd = planHerdNeeds({
      groups: [{ count: 4, bodyWeight: 1100, weightUnit: 'lb', class: 'maintenance' }],
      days: 365,
      feedingMethod: 'round-bale-feeder',
      hayShareOfDiet: 1,
    });
    const { needs, wasteFraction } = needsFromHerdPlan(herd);
    expect(wasteFraction).toBe(0.1);
    const plan = leastCostPlan({
      needs,
      wasteFraction,
      lots: [
        lot({ lotId: 'grass', pricePerTonCents: 16000, crudeProteinPctDm: 9, deMcalPerKgDm: 1.9, freightCentsPerLoadedMile: 350, distanceMi: 120 }),
        lot({ lotId: 'alfalfa', pricePerTonCents: 26000, crudeProteinPctDm: 19, deMcalPerKgDm: 2.3, freightCentsPerLoadedMile: 350, distanceMi: 300 }),
      ],
    });
    expect(plan.feasible).toBe(true);
    expect(plan.supplied.deMcal).toBeGreaterThanOrEqual(needs.deMcal);
    expect(plan.supplied.crudeProteinKg).toBeGreaterThanOrEqual(needs.crudeProteinKg);
    expect(plan.supplied.dryMatterKg).toBeLessThanOrEqual(needs.maxDryMatterKg + 1);
    expect(plan.totalCostCents).toBe(plan.lines.reduce((s, l) => s + l.hayCents + l.freightCents, 0));
  });

  it('solves a realistic 15-lot comparison with minimum orders and whole loads in well under the time limit', () => {
    const lots = randomLots(15, 42);
    const started = Date.now();
    const plan = leastCostPlan({ needs: { deMcal: 150000, crudeProteinKg: 7000, maxDryMatterKg: 90000 }, lots });
    expect(Date.now() - started).toBeLessThan(4000);
    expect(plan.feasible).toBe(true);
    expect(plan.freightModel).toBe('per-load');
    expectValidPlan(plan, lots, { deMcal: 150000, crudeProteinKg: 7000 });
  });

  it('still returns a valid whole-load plan, flagged as possibly not the cheapest, when the search hits its time limit', () => {
    const lots = randomLots(40, 42);
    const needs = { deMcal: 150000, crudeProteinKg: 7000, maxDryMatterKg: 90000 };
    const plan = leastCostPlan({ needs, lots }, { timeoutMs: 1 });
    expect(plan.feasible).toBe(true);
    expect(plan.explanation).toContain(
      'The search for the cheapest plan reached its time limit; this is the best plan found, possibly not the cheapest.',
    );
    expectValidPlan(plan, lots, needs);
    for (const line of plan.lines) {
      const offered = lots.find((l) => l.lotId === line.lotId)!;
      expect(line.freightCents).toBe(line.loads * Math.round(offered.freightCentsPerLoadedMile * offered.distanceMi));
    }
  });
});

describe('leastCostPlan in whole bales: the stated cost is what the buyer pays for the bales it recommends', () => {
  // A lot of 1,300 lb round bales at 88 % DM and 2.0 Mcal/kg DM; the herd needs 10,000 Mcal. Tons for the energy alone:
  // 10,000 / (907.18 kg × 0.88 × 2.0) = 6.263 t, i.e. 6.263 × 2,000 / 1,300 = 9.64 bales, so the buyer must buy 10 bales
  // = 10 × 1,300 / 2,000 = 6.5 t (hand arithmetic; $/ton × tons, domain brief §11).
  const needs = { deMcal: 10000, crudeProteinKg: 0, maxDryMatterKg: 1e6 };
  const rounds = { dryMatterPct: 88, deMcalPerKgDm: 2.0, avgBaleWeightLb: 1300, tonsAvailable: 26 }; // 40 bales

  it('priced by the ton: 10 bales × 1,300 lb ÷ 2,000 × $180/t = $1,170.00, not the $1,127.52 of the 6.264 t the herd eats', () => {
    const plan = leastCostPlan({ needs, lots: [lot({ lotId: 'rounds', pricePerTonCents: 18000, ...rounds })] });
    expect(plan.lines).toEqual([{ lotId: 'rounds', bales: 10, tons: 6.5, loads: 1, hayCents: 117000, freightCents: 0, costCents: 117000 }]);
    expect(plan.totalCostCents).toBe(117000);
    expect(plan.explanation.join(' ')).toContain('buy 10 bales (6.50 t)');
  });

  it('priced by the bale: 10 bales × $90.00 = $900.00, as the grower counts them', () => {
    // $90 a 1,300 lb bale is $138.46/t ($90 × 2,000 / 1,300, domain brief §11), the ton price the search compares lots on.
    const plan = leastCostPlan({
      needs,
      lots: [lot({ lotId: 'rounds', pricePerTonCents: 13846, pricingUnit: 'bale', priceCentsPerBale: 9000, ...rounds })],
    });
    expect(plan.lines.map((l) => [l.bales, l.hayCents])).toEqual([[10, 90000]]);
    expect(plan.totalCostCents).toBe(90000);
  });

  it('never plans more bales than the lot has: 9 bales left (5.85 t) and the rest from a second lot', () => {
    // Need 10 t worth of energy; the cheap lot has 9 × 1,300 lb = 5.85 t; the rest, 4.15 t, in 60 lb small bales is
    // 4.15 × 2,000 / 60 = 138.3 → 139 bales = 4.17 t at $200/t = $834.00 (hand arithmetic).
    const plan = leastCostPlan({
      needs: { deMcal: 10 * dmPerTon(90) * 2.0, crudeProteinKg: 0, maxDryMatterKg: 1e6 },
      lots: [
        lot({ lotId: 'rounds', pricePerTonCents: 15000, avgBaleWeightLb: 1300, tonsAvailable: 5.85 }),
        lot({ lotId: 'smalls', pricePerTonCents: 20000, avgBaleWeightLb: 60 }),
      ],
    });
    expect(plan.lines.map((l) => [l.lotId, l.bales, l.tons, l.hayCents])).toEqual([
      ['rounds', 9, 5.85, 87750],
      ['smalls', 139, 4.17, 83400],
    ]);
  });
});

/** Deterministic pseudo-random lots (Park–Miller generator) resembling a regional market. */
function randomLots(count: number, seed: number): CandidateLot[] {
  let state = seed;
  const random = () => ((state = (state * 16807) % 2147483647) - 1) / 2147483646;
  return Array.from({ length: count }, (_, i) =>
    lot({
      lotId: `L${i}`,
      pricePerTonCents: 12000 + Math.round(random() * 15000),
      freightCentsPerLoadedMile: 300 + Math.round(random() * 150),
      distanceMi: Math.round(random() * 500),
      tonsAvailable: 5 + Math.round(random() * 60),
      minOrderTons: random() < 0.5 ? Math.round(random() * 10) : 0,
      dryMatterPct: 85 + random() * 8,
      crudeProteinPctDm: 6 + random() * 16,
      deMcalPerKgDm: 1.7 + random() * 0.7,
    }),
  );
}

function expectValidPlan(
  plan: ReturnType<typeof leastCostPlan>,
  lots: readonly CandidateLot[],
  needs: { deMcal: number; crudeProteinKg: number },
): void {
  expect(plan.supplied.deMcal).toBeGreaterThanOrEqual(needs.deMcal);
  expect(plan.supplied.crudeProteinKg).toBeGreaterThanOrEqual(needs.crudeProteinKg);
  expect(plan.totalCostCents).toBe(plan.lines.reduce((s, l) => s + l.costCents, 0));
  for (const line of plan.lines) {
    const offered = lots.find((l) => l.lotId === line.lotId)!;
    expect(line.tons).toBeLessThanOrEqual(offered.tonsAvailable);
    expect(line.tons).toBeGreaterThanOrEqual(offered.minOrderTons ?? 0);
    expect(line.loads).toBe(Math.ceil(line.tons / 24 - 1e-9));
    expect(line.costCents).toBe(line.hayCents + line.freightCents);
  }
}

describe('LeastCostPlanRequestSchema', () => {
  const base = { needs: { deMcal: 1, crudeProteinKg: 1, maxDryMatterKg: 1 }, lots: [lot({ lotId: 'A' })] };

  it('fills in defaults: 24 t loads, no waste, per-load freight, no minimum order', () => {
    const { minOrderTons: _drop, ...noMin } = lot({ lotId: 'A' });
    const parsed = LeastCostPlanRequestSchema.parse({ ...base, lots: [noMin] });
    expect(parsed).toMatchObject({ tonsPerLoad: 24, wasteFraction: 0, freightModel: 'per-load' });
    expect(parsed.lots[0]!.minOrderTons).toBe(0);
  });

  it('rejects duplicate lot ids, minimum orders above stock, fractional cents and unknown keys', () => {
    const messages = (input: unknown) => {
      const r = LeastCostPlanRequestSchema.safeParse(input);
      return r.success ? [] : r.error.issues.map((i) => i.message);
    };
    expect(messages({ ...base, lots: [lot({ lotId: 'A' }), lot({ lotId: 'A' })] })).toEqual(["duplicate lotId 'A'"]);
    expect(messages({ ...base, lots: [lot({ lotId: 'A', tonsAvailable: 5, minOrderTons: 6 })] })).toEqual(['minOrderTons cannot exceed tonsAvailable']);
    expect(messages({ ...base, lots: [lot({ lotId: 'A', pricePerTonCents: 100.5 })] })).toEqual(['pricePerTonCents must be whole cents']);
    expect(messages({ ...base, budgetCents: 1 })).not.toEqual([]);
    expect(() => leastCostPlan({ ...base, wasteFraction: 1 })).toThrow(ZodError);
  });
});

describe('leastCostPlan forage floor', () => {
  // The reported case: 4 horses of 500 kg at maintenance for 100 days. DE need 4 × 16.65 × 100 = 6,660 Mcal
  // (NRC 2007: 0.0333 Mcal/kg BW); a cheap dense hay (2.5 Mcal/kg DM) meets it with 2,664 kg DM = 1.33 % BW a day.
  // NRC 2007: at least about 1.5 % BW a day as forage DM → 4 × 500 × 0.015 × 100 = 3,000 kg DM over the period.
  const herd = planHerdNeeds({
    groups: [{ count: 4, bodyWeight: 500, weightUnit: 'kg', class: 'maintenance' }],
    days: 100,
    feedingMethod: 'stall-feeder',
    hayShareOfDiet: 1,
  });
  const { needs, wasteFraction, forage } = needsFromHerdPlan(herd);
  const lots = [
    lot({ lotId: 'dense', title: 'Second-cut alfalfa', pricePerTonCents: 15000, crudeProteinPctDm: 18, deMcalPerKgDm: 2.5 }),
    lot({ lotId: 'grass', title: 'Late-cut grass', pricePerTonCents: 24000, crudeProteinPctDm: 8, deMcalPerKgDm: 1.8 }),
  ];

  it('reproduces the underfeeding without a floor: energy alone buys 1.33 % of body weight a day', () => {
    const noFloor = leastCostPlan({ needs: { ...needs, minDryMatterKg: 0 }, wasteFraction, lots, freightModel: 'per-ton' });
    // 6,660 Mcal / 2.5 Mcal/kg = 2,664 kg DM = 2,664 / (2,000 kg × 100 d) = 1.332 % BW a day (hand arithmetic).
    expect(noFloor.supplied.dryMatterKg / (2000 * 100)).toBeCloseTo(0.01332, 4);
  });

  it('feeds at least 1.5 % of body weight a day as hay dry matter with the default floor (NRC 2007)', () => {
    expect(needs.minDryMatterKg).toBeCloseTo(3000, 6); // 2,000 kg herd × 1.5 % × 100 days, by hand
    const plan = leastCostPlan({ needs, wasteFraction, lots, forage, freightModel: 'per-ton' });
    expect(plan.feasible).toBe(true);
    expect(plan.supplied.dryMatterKg / (2000 * 100)).toBeGreaterThanOrEqual(0.015);
    expect(plan.explanation).toContain(
      'The forage floor binds: the plan buys more hay than energy and protein alone would need, so the horses get enough forage.',
    );
    expect(plan.explanation.join(' ')).toMatch(/at least the forage floor of 30\.0 kg a day/);
    // The single-lot planner feeds the typical 2 % BW: 2,000 kg × 2 % = 40 kg DM a day (NRC 2007 typical intake, from memory).
    expect(plan.explanation.join(' ')).toMatch(/The single-lot planner feeds the same herd 40\.0 kg a day \(2\.00 % of body weight\)/);
  });

  it('keeps the hay between the floor and the most the horses can eat, as the single-lot planner does', () => {
    const plan = leastCostPlan({ needs, wasteFraction, lots, forage });
    // 2.5 % BW maximum intake (NRC 2007, from memory): 2,000 kg × 2.5 % × 100 d = 5,000 kg.
    expect(plan.supplied.dryMatterKg).toBeLessThanOrEqual(5000 + 1);
    expect(plan.supplied.dryMatterKg).toBeGreaterThanOrEqual(3000);
    expect(herd.totals.period.hayDmKg).toBeCloseTo(4000, 6); // the single-lot planner's 2 % BW
  });

  it('accepts a floor from 1 % to 2 % of body weight and cautions below 1.5 % (Vet Times 2018: not below 1 %, only supervised)', () => {
    const low = planHerdNeeds({ ...herdRequest(), forageFloorPctBw: 1.2 });
    expect(low.totals.period.hayDmFloorKg).toBeCloseTo(2400, 6); // 2,000 kg × 1.2 % × 100 d
    const lowNeeds = needsFromHerdPlan(low);
    const plan = leastCostPlan({ needs: lowNeeds.needs, forage: lowNeeds.forage, lots, freightModel: 'per-ton' });
    expect(plan.explanation.join(' ')).toMatch(/below 1\.5 % of body weight should be fed only under veterinary supervision/);
    expect(() => planHerdNeeds({ ...herdRequest(), forageFloorPctBw: 0.9 })).toThrow(/at least 1 %/);
    expect(() => planHerdNeeds({ ...herdRequest(), forageFloorPctBw: 2.1 })).toThrow(/at most 2 %/);
  });

  it('says when stock cannot reach the floor', () => {
    const plan = leastCostPlan({ needs, lots: [lot({ lotId: 'small', tonsAvailable: 3, deMcalPerKgDm: 3 })] });
    expect(plan.feasible).toBe(false);
    // 3 t × 907.18 kg × 90 % DM = 2,449 kg DM (hand arithmetic) against the 3,000 kg floor.
    expect(plan.explanation).toContain('Even buying every listed ton, the lots supply only 2,449 kg of the 3,000 kg of hay dry matter the forage floor needs.');
  });
});

function herdRequest() {
  return {
    groups: [{ count: 4, bodyWeight: 500, weightUnit: 'kg' as const, class: 'maintenance' as const }],
    days: 100,
    feedingMethod: 'stall-feeder' as const,
    hayShareOfDiet: 1,
  };
}
