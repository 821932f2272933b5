import { balesPerLoad, growerOrderTotal, feeRateLabel, goodsCents, loadsFor, minimumBales, orderProblem, orderTotal, scaleTicketRefundCents, type LotTerms } from './order-total';

// $12 for a 60 lb bale = $400.0/t (domain brief §11).
/** 3 % in basis points: the platform's default fee (our own policy; an admin setting). */
const FEE_3_PCT = 300;

const smallSquares: LotTerms = {
  pricingUnit: 'ton',
  priceCentsPerTon: 40_000,
  priceCentsPerBale: null,
  avgBaleWeightLb: 60,
  minOrderTons: 1,
  balesAvailable: 1000,
  freightCentsPerLoadedMile: 350,
};

describe('order total', () => {
  it('prices 800 bales of 60 lb (24 t) at $400/t as $9,600 of hay (domain brief §11: $/t = $/bale × 2000 / lb)', () => {
    expect(goodsCents(smallSquares, 800)).toBe(960_000);
    // The same hay sold at $12 a bale costs the same.
    expect(goodsCents({ ...smallSquares, pricingUnit: 'bale', priceCentsPerBale: 1200 }, 800)).toBe(960_000);
  });

  it('charges $3.50 × 300 loaded miles = $1,050 for one 24 t load (domain brief §11 freight example)', () => {
    const total = orderTotal(smallSquares, { bales: 800, method: 'delivery', distanceMi: 300 }, FEE_3_PCT);
    expect(total.tons).toBe(24);
    expect(total.loads).toBe(1);
    expect(total.freightCents).toBe(105_000);
  });

  it('bills whole loads: one bale over a 24 t load is a second load (practice: freight per load)', () => {
    const total = orderTotal({ ...smallSquares, balesAvailable: 2000 }, { bales: 801, method: 'delivery', distanceMi: 300 }, FEE_3_PCT);
    expect(total.loads).toBe(2);
    expect(total.freightCents).toBe(210_000);
  });

  it('fills a load by bale count when the trailer holds fewer bales than its weight allows (domain brief §11: light bales fill by volume)', () => {
    expect(loadsFor(600, 18, { tonsPerLoad: 24, balesPerLoad: 500 })).toBe(2);
    expect(loadsFor(600, 18, { tonsPerLoad: 24, balesPerLoad: null })).toBe(1);
  });

  it('counts a full load in bales: 24 t of 60 lb bales is 800 bales (domain brief §11: bales = tons × 2000 / lb), fewer when the trailer fills by count', () => {
    expect(balesPerLoad({ tonsPerLoad: 24, balesPerLoad: null }, 60)).toBe(800);
    expect(balesPerLoad({ tonsPerLoad: 24, balesPerLoad: 500 }, 60)).toBe(500);
    // 1,200 lb rounds: 24 t holds 40 of them.
    expect(balesPerLoad({ tonsPerLoad: 24, balesPerLoad: null }, 1200)).toBe(40);
  });

  it('adds the 3 % platform fee on the hay only, and the total is the sum in whole cents (our fee policy)', () => {
    const total = orderTotal(smallSquares, { bales: 800, method: 'delivery', distanceMi: 300 }, FEE_3_PCT);
    expect(total.platformFeeCents).toBe(28_800); // 3 % of $9,600
    expect(total.totalCents).toBe(960_000 + 105_000 + 28_800);
  });

  it('charges the fee rate it is given: 2.5 % of $9,600 is $240, and 0 % charges nothing', () => {
    expect(orderTotal(smallSquares, { bales: 800, method: 'pickup', distanceMi: null }, 250).platformFeeCents).toBe(24_000);
    expect(orderTotal(smallSquares, { bales: 800, method: 'pickup', distanceMi: null }, 0).totalCents).toBe(960_000);
  });

  it('charges no freight for pickup at the farm', () => {
    const total = orderTotal(smallSquares, { bales: 100, method: 'pickup', distanceMi: null }, FEE_3_PCT);
    expect(total.freightCents).toBe(0);
    // By hand: 100 × 60 lb / 2,000 = 3 t × $400 = $1,200 of hay + 3 % fee $36 = $1,236.
    expect(total.totalCents).toBe(123_600);
  });

  it('keeps every amount a whole number of cents for awkward weights (conventions: integer cents)', () => {
    for (const bales of [1, 7, 33, 333]) {
      const t = orderTotal({ ...smallSquares, avgBaleWeightLb: 61.7, priceCentsPerTon: 23_317 }, { bales, method: 'delivery', distanceMi: 17.3 }, FEE_3_PCT);
      for (const v of [t.goodsCents, t.freightCents, t.platformFeeCents, t.totalCents]) expect(Number.isInteger(v)).toBe(true);
    }
  });
});

describe('fee rate in words', () => {
  it('reads basis points as a percentage (1 % = 100 basis points)', () => {
    expect(feeRateLabel(300)).toBe('3 %');
    expect(feeRateLabel(250)).toBe('2.5 %');
    expect(feeRateLabel(0)).toBe('0 %');
  });
});

describe('order problems', () => {
  it('asks for the minimum order in whole bales: 1 t of 60 lb bales is 34 bales (2000/60 = 33.3 → 34)', () => {
    expect(minimumBales(smallSquares)).toBe(34);
    expect(orderProblem(smallSquares, { bales: 33, method: 'pickup', distanceMi: null })).toMatchObject({ code: 'below_minimum', minBales: 34 });
    expect(orderProblem(smallSquares, { bales: 34, method: 'pickup', distanceMi: null })).toBeNull();
  });

  it('lets a buyer take the last bales of a lot even below the minimum (common practice: clearing a lot)', () => {
    expect(orderProblem({ ...smallSquares, balesAvailable: 10 }, { bales: 10, method: 'pickup', distanceMi: null })).toBeNull();
  });

  it('refuses more bales than are left, saying how many are', () => {
    expect(orderProblem({ ...smallSquares, balesAvailable: 50 }, { bales: 51, method: 'pickup', distanceMi: null })).toMatchObject({ code: 'not_enough_bales', message: 'Only 50 bales are left in this lot.' });
  });

  it('refuses delivery when the grower gives no freight rate, or without a distance', () => {
    expect(orderProblem({ ...smallSquares, freightCentsPerLoadedMile: null }, { bales: 100, method: 'delivery', distanceMi: 20 })?.code).toBe('no_delivery');
    expect(orderProblem(smallSquares, { bales: 100, method: 'delivery', distanceMi: null })?.code).toBe('no_distance');
  });
});

describe('one grower, several lots: one order', () => {
  // Domain brief §11: freight = rate per loaded mile × miles × whole loads; one truck carries the grower's lots together.
  const bigSquares: LotTerms = { ...smallSquares, priceCentsPerTon: 30_000, avgBaleWeightLb: 1000 };

  it('hauls 12 t + 10 t in one 24 t load: $3.50 × 300 mi once, not twice as two orders would (domain brief §11)', () => {
    const both = growerOrderTotal([{ terms: smallSquares, bales: 400 }, { terms: bigSquares, bales: 20 }], { method: 'delivery', distanceMi: 300 }, FEE_3_PCT);
    expect(both.tons).toBe(22);
    expect(both.loads).toBe(1);
    expect(both.freightCents).toBe(105_000);
    const apart = [orderTotal(smallSquares, { bales: 400, method: 'delivery', distanceMi: 300 }, FEE_3_PCT), orderTotal(bigSquares, { bales: 20, method: 'delivery', distanceMi: 300 }, FEE_3_PCT)];
    expect(apart.reduce((s, t) => s + t.freightCents, 0)).toBe(210_000);
  });

  it('adds the hay per line (12 t × $400 + 10 t × $300 = $7,800) and charges 3 % on that total ($234)', () => {
    const both = growerOrderTotal([{ terms: smallSquares, bales: 400 }, { terms: bigSquares, bales: 20 }], { method: 'pickup', distanceMi: null }, FEE_3_PCT);
    expect(both.lines.map((l) => l.goodsCents)).toEqual([480_000, 300_000]);
    expect(both.goodsCents).toBe(780_000);
    expect(both.platformFeeCents).toBe(23_400);
    expect(both.freightCents).toBe(0);
    expect(both.totalCents).toBe(780_000 + 23_400);
  });

  it('a one-line order costs what the single-lot total says (the $9,600 load of §11)', () => {
    const one = growerOrderTotal([{ terms: smallSquares, bales: 800 }], { method: 'delivery', distanceMi: 300 }, FEE_3_PCT);
    expect(one.goodsCents).toBe(960_000);
    expect(one.freightCents).toBe(105_000);
  });

  it('refuses an empty order', () => {
    expect(() => growerOrderTotal([], { method: 'pickup', distanceMi: null }, FEE_3_PCT)).toThrow(RangeError);
  });
});

describe('scale ticket settlement', () => {
  // 24 t paid at $400/t = $9,600 + $288 fee; the ticket shows 23.5 t.
  const line = { pricingUnit: 'ton' as const, priceCentsPerTon: 40_000, paidGoodsCents: 960_000 };
  const paid = { paidFeeCents: 28_800, feeBps: FEE_3_PCT };

  it('refunds the hay and fee on the missing half ton: $200 + $6 (price × tons short)', () => {
    expect(scaleTicketRefundCents({ ...paid, lines: [{ ...line, weighedTons: 23.5 }] })).toBe(20_000 + 600);
  });

  it('never charges more when the ticket shows more tons than paid for (issue 10: never charged more than agreed)', () => {
    expect(scaleTicketRefundCents({ ...paid, lines: [{ ...line, weighedTons: 25 }] })).toBe(0);
    expect(scaleTicketRefundCents({ ...paid, lines: [{ ...line, weighedTons: 24 }] })).toBe(0);
  });

  it('refunds the fee at the rate the order was sold at: at 5 %, half a ton short gives $200 + $10', () => {
    expect(scaleTicketRefundCents({ paidFeeCents: 48_000, feeBps: 500, lines: [{ ...line, weighedTons: 23.5 }] })).toBe(20_000 + 1_000);
  });

  it('does not settle bale-priced orders on weight: they were counted', () => {
    expect(scaleTicketRefundCents({ ...paid, lines: [{ ...line, pricingUnit: 'bale', weighedTons: 20 }] })).toBe(0);
  });

  it('settles each line on its own: one line half a ton short, the other over, refunds only the short half ton ($200 + $6)', () => {
    // Two 12 t lines at $400/t: $4,800 each, fee 3 % of $9,600 = $288.
    const half = { ...line, paidGoodsCents: 480_000 };
    expect(scaleTicketRefundCents({ ...paid, lines: [{ ...half, weighedTons: 11.5 }, { ...half, weighedTons: 12.8 }] })).toBe(20_000 + 600);
    // An unweighed line counts as delivered in full.
    expect(scaleTicketRefundCents({ ...paid, lines: [{ ...half, weighedTons: 11.5 }, { ...half, weighedTons: null }] })).toBe(20_000 + 600);
  });
});
