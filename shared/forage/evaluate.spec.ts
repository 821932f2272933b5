import fc from 'fast-check';
import { evaluateForage } from './evaluate';
import { BASIS_DEPENDENT_FIELDS } from './analysis-fields';
import {
  ForageEvaluationRequestSchema,
  ForageEvaluationSchema,
  type ForageEvaluation,
  type ForageEvaluationRequest,
} from './forage-contract';

// Worked legume of domain brief §3 with ADF 30 (§2/§4 examples), the §8 sugars and the brief's 88% DM hay.
const alfalfa: ForageEvaluationRequest = {
  forageClass: 'legume',
  basis: 'dm',
  dryMatterPct: 88,
  crudeProteinPct: 20,
  adfPct: 30,
  ndfPct: 40,
  ndfd48Pct: 45,
  fatPct: 2.5,
  ashPct: 10,
  wscPct: 9.5,
  escPct: 6.8,
  starchPct: 1.8,
  calciumPct: 1.4,
  phosphorusPct: 0.3,
  moisturePct: 12,
  reportedRfv: 152,
};

// Worked grass of domain brief §3 / §7.
const grass: ForageEvaluationRequest = {
  forageClass: 'grass',
  basis: 'dm',
  dryMatterPct: 90,
  crudeProteinPct: 12,
  adfPct: 35,
  ndfPct: 60,
  ndfd48Pct: 60,
  fatPct: 2.5,
  ashPct: 8,
};

describe('evaluateForage', () => {
  describe('worked alfalfa (DM basis)', () => {
    const result = evaluateForage(alfalfa);

    // USDA AMS 2003 alfalfa guidelines (S7) print ADF 29–32 and NDF 36–40 beside RFV 150–170 for Good hay:
    // ADF 30 / NDF 40 must land in that printed RFV band (an outside check, not the equation restated).
    it('puts ADF 30 / NDF 40 inside the RFV band USDA prints for the same Good row (150–170)', () => {
      expect(result.rfv).toBeGreaterThanOrEqual(150);
      expect(result.rfv).toBeLessThanOrEqual(170);
    });

    // Source: domain brief §3 worked legume (Undersander & Moore 2002; UGA glossary S3).
    it('computes RFQ 149.5 from summative legume TDN 61.3', () => {
      expect(round1(result.rfq!)).toBe(149.5);
      expect(round1(result.tdnPct)).toBe(61.3);
      expect(result.tdnMethod).toBe('summative-nrc2001-legume');
    });

    // Source: domain brief §7 (NRC 2007 after Pagan, from memory; inputs per KER S15).
    it('computes horse DE 2.5 Mcal/kg DM by the NRC 2007 equation, on every basis and unit', () => {
      expect(result.horseDe.method).toBe('nrc-2007-pagan');
      expect(round1(result.horseDe.mcalPerKgDm)).toBe(2.5);
      // 2.5 Mcal/kg × 0.453 592 37 kg/lb (NIST Handbook 44) ≈ 1.13 Mcal/lb; as fed at 88 % DM ≈ 2.2 Mcal/kg and 1.0 Mcal/lb.
      expect(result.horseDe.mcalPerLbDm).toBeCloseTo(1.13, 1);
      expect(result.horseDe.mcalPerKgAsFed).toBeCloseTo(2.2, 1);
      expect(result.horseDe.mcalPerLbAsFed).toBeCloseTo(1.0, 1);
    });

    // Source: domain brief §8 worked NSC (WSC 9.5 + starch 1.8 = 11.3, fails the strict 10% limit).
    it('computes NSC 11.3% DM by WSC + starch and flags it above the strict limit', () => {
      expect(round1(result.nscPct!)).toBe(11.3);
      expect(result.nscMethod).toBe('wsc-plus-starch');
      expect(result.nscFlag).toBe('above-strict-limit');
      expect(result.findings.map((f) => f.code)).toEqual(['nsc-above-strict-limit']);
    });

    // Source: domain brief §1 — CP 18% DM is 15.8% AF at 88% DM; here CP 20% DM → 17.6% AF.
    it('reports every nutrient on the as-fed basis too', () => {
      expect(result.asFed.crudeProteinPct).toBeCloseTo(17.6, 10);
      expect(result.asFed.ndfPct).toBeCloseTo(35.2, 10);
      expect(result.asFed.calciumPct).toBeCloseTo(1.232, 10);
      expect(result.asFed.nscPct).toBeCloseTo(9.944, 10); // 11.3 % of DM at 88 % DM, by hand
      expect(result.dm.crudeProteinPct).toBe(20);
    });

    // Source: USDA AMS 2003 alfalfa guidelines (S7): ADF 30, NDF 40, RFV 152.4, TDN 59.8 are Good; CP 20 is Premium.
    // AFGC (S9): RFV 152.4 > 151 is Prime.
    it('grades Good on the USDA alfalfa table, set by ADF, and Prime on the AFGC bands', () => {
      expect(result.grades.usda).toMatchObject({ name: 'Good', basis: 'adf', table: 'usda-ams-2003-alfalfa' });
      expect(result.grades.afgc).toEqual({ name: 'Prime', basis: 'rfv' });
    });

    it('matches the response schema', () => {
      expect(() => ForageEvaluationSchema.parse(result)).not.toThrow();
    });
  });

  it('gives the same DM results when the alfalfa is entered as fed at 88% dry matter', () => {
    const asFedRequest = toAsFedRequest(alfalfa);
    const fromAsFed = evaluateForage(asFedRequest);
    const fromDm = evaluateForage(alfalfa);
    expect(fromAsFed.dm.crudeProteinPct).toBeCloseTo(20, 10);
    expectNumbersClose(fromAsFed, fromDm);
  });

  describe('worked grass', () => {
    const result = evaluateForage(grass);

    // RFQ 131.9 and TDN 59.9 by hand from the UGA-printed summative grass equations (S3; domain brief §3 arithmetic).
    // UW–Madison (Undersander, S1): RFV under-ranks grass, which RFQ corrects — so RFQ must sit well above RFV here.
    it('computes RFQ 131.9 from summative grass TDN 59.9, well above the RFV that under-ranks grass (S1)', () => {
      expect(round1(result.rfq!)).toBe(131.9);
      expect(round1(result.tdnPct)).toBe(59.9);
      expect(result.tdnMethod).toBe('summative-nrc2001-grass');
      expect(result.rfq! - result.rfv).toBeGreaterThan(20);
    });

    // Source: domain brief §7 — grass DE 2.1 Mcal/kg DM.
    it('computes horse DE 2.1 Mcal/kg DM', () => {
      expect(round1(result.horseDe.mcalPerKgDm)).toBe(2.1);
    });

    // Source: USDA AMS grass guidelines (S7, S8) — CP 12 is Good; AFGC bands are for legumes.
    it('grades Good on crude protein, with no AFGC grade, and notes that RFV under-ranks grass', () => {
      expect(result.grades.usda).toMatchObject({ name: 'Good', basis: 'crudeProtein', table: 'usda-ams-2003-grass' });
      expect(result.grades.afgc).toBeNull();
      expect(result.findings.map((f) => f.code)).toContain('rfv-under-ranks-grass');
    });
  });

  // Source: Undersander, UW–Madison Ext. (S1) and Progressive Forage (S2) — full-bloom alfalfa ADF 41 / NDF 53 scores 100.
  it('scores the full-bloom alfalfa reference at RFV 100 and falls back to ADF-based methods without fat, ash or NDFD', () => {
    const result = evaluateForage({ forageClass: 'legume', basis: 'dm', dryMatterPct: 88, crudeProteinPct: 17, adfPct: 41, ndfPct: 53 });
    expect(round1(result.rfv)).toBe(100);
    expect(result.rfq).toBeNull();
    expect(result.tdnMethod).toBe('adf-western');
    // USDA AMS alfalfa guidelines print TDN beside ADF (100 % DM): ADF 35 → TDN 56 (Utility), so full bloom is below it.
    expect(result.tdnPct).toBeLessThan(56);
    expect(result.horseDe.method).toBe('tdn-approximation');
    // NRC (1989, 2001): 1 kg of TDN holds 4.409 Mcal of DE, i.e. 0.0441 Mcal/kg per TDN percentage point.
    expect(result.horseDe.mcalPerKgDm / result.tdnPct).toBeCloseTo(0.0441, 3);
    expect(result.nscPct).toBeNull();
    expect(result.nscMethod).toBeNull();
    expect(result.nscFlag).toBeNull();
    expect(result.dm.fatPct).toBeNull();
    expect(result.asFed.fatPct).toBeNull();
    expect(result.findings.map((f) => f.code)).toEqual(['rfq-inputs-missing', 'horse-de-from-tdn']);
  });

  // Source: domain brief §8 — 11.3% DM looks like 10.2% on a 90%-DM as-fed basis; the flag must judge DM.
  it('judges NSC on DM even when the sugars are entered as fed', () => {
    const result = evaluateForage({ ...alfalfa, basis: 'asFed', dryMatterPct: 90, moisturePct: 10, ...scaled(alfalfa, 0.9), wscPct: 9.5 * 0.9, starchPct: 1.8 * 0.9 });
    expect(round1(result.asFed.nscPct!)).toBe(10.2);
    expect(round1(result.nscPct!)).toBe(11.3);
    expect(result.nscFlag).toBe('above-strict-limit');
  });

  // Source: domain brief §8 — ESC + starch = 8.6%, which passes.
  it('uses ESC + starch when WSC is not reported', () => {
    const { wscPct: _wsc, ...withoutWsc } = alfalfa;
    const result = evaluateForage(withoutWsc);
    expect(result.nscMethod).toBe('esc-plus-starch');
    expect(round1(result.nscPct!)).toBe(8.6);
    expect(result.nscFlag).toBe('within-advised-limit');
  });

  it('treats mixed hay with the legume equations and the alfalfa table, and says so', () => {
    const result = evaluateForage({ ...alfalfa, forageClass: 'mixed' });
    expect(result.tdnMethod).toBe('summative-nrc2001-legume');
    expect(result.rfq).toBeCloseTo(evaluateForage(alfalfa).rfq!, 12);
    expect(result.grades.usda.table).toBe('usda-ams-2003-alfalfa');
    expect(result.findings.map((f) => f.code)).toContain('mixed-graded-as-alfalfa');
  });

  it('reports an impossible analysis as errors and still returns finite numbers', () => {
    const result = evaluateForage({ ...alfalfa, crudeProteinPct: 30, ndfPct: 70, adfPct: 72 });
    const codes = result.findings.filter((f) => f.severity === 'error').map((f) => f.code);
    expect(codes).toEqual(expect.arrayContaining(['ndf-below-adf', 'cp-ndf-fat-ash-over-100', 'nfc-negative']));
    expect(result.rfq).toBeNull();
    expect(result.tdnMethod).toBe('adf-western');
    expect(result.horseDe.method).toBe('tdn-approximation');
    expectAllFinite(result);
  });

  it('warns when the reported RFV disagrees with ADF and NDF', () => {
    const result = evaluateForage({ ...alfalfa, reportedRfv: 170 });
    expect(result.findings.find((f) => f.code === 'reported-rfv-mismatch')?.severity).toBe('warning');
  });

  describe('properties', () => {
    it('accepts every generated valid request and never throws or yields NaN/Infinity', () => {
      fc.assert(
        fc.property(validRequest, (candidate) => {
          const parsed = ForageEvaluationRequestSchema.safeParse(candidate);
          expect(parsed.error?.issues ?? []).toEqual([]);
          const result = evaluateForage(parsed.data!);
          expectAllFinite(result);
          expect(ForageEvaluationSchema.safeParse(result).success).toBe(true);
        }),
        { numRuns: 500 },
      );
    });

    it('rejects a valid request with any one field made invalid', () => {
      fc.assert(
        fc.property(validRequest, corruption, (request, corrupt) => {
          expect(ForageEvaluationRequestSchema.safeParse(corrupt(request)).success).toBe(false);
        }),
        { numRuns: 500 },
      );
    });

    it('gives the same DM results whichever basis the analysis is entered on', () => {
      fc.assert(
        fc.property(validRequest, (request) => {
          fc.pre(request.basis === 'dm' && request.dryMatterPct >= 1);
          const fromAsFed = evaluateForage(toAsFedRequest(request));
          const fromDm = evaluateForage(request);
          if (fromAsFed.tdnMethod !== fromDm.tdnMethod || fromAsFed.horseDe.method !== fromDm.horseDe.method) {
            // Rounding may tip an analysis sitting exactly on NFC = 0 or CP + NDF + fat + ash = 100 across the line.
            expect(distanceToMethodBoundary(request)).toBeLessThan(1e-9);
            return;
          }
          expectNumbersClose(fromAsFed, fromDm);
        }),
        { numRuns: 300, examples: [[knifeEdge]] },
      );
    });

    it('lowers RFV as ADF or NDF rises, all else equal', () => {
      fc.assert(
        fc.property(validRequest, fc.double({ min: 0.5, max: 20, noNaN: true }), (request, step) => {
          fc.pre(request.basis === 'dm' && request.adfPct + step <= 100 && request.ndfPct + step <= 100);
          const base = evaluateForage(request).rfv;
          expect(evaluateForage({ ...request, adfPct: request.adfPct + step }).rfv).toBeLessThan(base);
          expect(evaluateForage({ ...request, ndfPct: request.ndfPct + step }).rfv).toBeLessThan(base);
        }),
        { numRuns: 300 },
      );
    });
  });
});

function round1(x: number): number {
  return Math.round(x * 10) / 10;
}

function scaled(request: ForageEvaluationRequest, factor: number): Partial<ForageEvaluationRequest> {
  const out: Partial<Record<(typeof BASIS_DEPENDENT_FIELDS)[number], number>> = {};
  for (const field of BASIS_DEPENDENT_FIELDS) {
    const value = request[field];
    if (value !== undefined) out[field] = value * factor;
  }
  return out;
}

function toAsFedRequest(request: ForageEvaluationRequest): ForageEvaluationRequest {
  const asFed = { ...request, basis: 'asFed' as const, ...scaled(request, request.dryMatterPct / 100) };
  // Rounding can push a value a hair past dryMatterPct; keep the request valid.
  for (const field of BASIS_DEPENDENT_FIELDS) {
    const value = asFed[field];
    if (value !== undefined) asFed[field] = Math.min(value, request.dryMatterPct);
  }
  return asFed;
}

/** Found by fast-check (seed -212366857): CP + NDF + fat + ash is 100 less one ulp. */
const knifeEdge: ForageEvaluationRequest = {
  forageClass: 'legume',
  basis: 'dm',
  dryMatterPct: 1.2085617834292854,
  crudeProteinPct: 0,
  adfPct: 0,
  ndfPct: 99.99999999999999,
  fatPct: 4.94e-322,
  ashPct: 0,
};

function distanceToMethodBoundary(r: ForageEvaluationRequest): number {
  if (r.fatPct === undefined || r.ashPct === undefined) return Number.POSITIVE_INFINITY;
  const sum = r.crudeProteinPct + r.ndfPct + r.fatPct + r.ashPct;
  const nfc = 100 - (0.93 * r.ndfPct + r.crudeProteinPct + r.fatPct + r.ashPct);
  return Math.min(Math.abs(100 - sum), r.ndfd48Pct === undefined ? Number.POSITIVE_INFINITY : Math.abs(nfc));
}

function numbersOf(value: unknown, path = ''): Array<[string, number]> {
  if (typeof value === 'number') return [[path, value]];
  if (value === null || typeof value !== 'object') return [];
  return Object.entries(value).flatMap(([key, child]) => numbersOf(child, `${path}.${key}`));
}

function expectAllFinite(result: ForageEvaluation): void {
  for (const [path, n] of numbersOf(result)) {
    if (!Number.isFinite(n)) throw new Error(`${path} is ${n}`);
  }
}

function expectNumbersClose(actual: ForageEvaluation, expected: ForageEvaluation): void {
  const want = new Map(numbersOf(expected));
  for (const [path, n] of numbersOf({ dm: actual.dm, rfv: actual.rfv, rfq: actual.rfq, tdnPct: actual.tdnPct, horseDe: actual.horseDe, nscPct: actual.nscPct })) {
    const target = want.get(path);
    if (target === undefined) throw new Error(`${path} missing`);
    expect(Math.abs(n - target)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(target)));
  }
  expect(actual.grades.usda.table).toBe(expected.grades.usda.table);
  expect(actual.tdnMethod).toBe(expected.tdnMethod);
  expect(actual.nscFlag).toBe(expected.nscFlag);
}

const fraction = fc.double({ min: 0, max: 1, noNaN: true });
const optionalFraction = fc.option(fraction, { nil: undefined });

/** Requests valid by construction: as-fed nutrients never exceed dry matter; NDF ≥ 1. */
const validRequest: fc.Arbitrary<ForageEvaluationRequest> = fc
  .record({
    forageClass: fc.constantFrom('legume' as const, 'grass' as const, 'mixed' as const),
    basis: fc.constantFrom('dm' as const, 'asFed' as const),
    dryMatterPct: fc.oneof(fc.double({ min: 1e-6, max: 100, noNaN: true }), fc.constantFrom(88, 100, 1)),
    cp: fraction,
    adf: fraction,
    ndf: fraction,
    ndfd48: optionalFraction,
    fat: optionalFraction,
    ash: optionalFraction,
    esc: optionalFraction,
    wsc: optionalFraction,
    starch: optionalFraction,
    calcium: optionalFraction,
    phosphorus: optionalFraction,
    moisture: fc.option(fc.double({ min: 0, max: 99.999, noNaN: true }), { nil: undefined }),
    reportedRfv: fc.option(fc.double({ min: 1, max: 1000, noNaN: true }), { nil: undefined }),
  })
  .map((g) => {
    const dryMatterPct = g.basis === 'asFed' ? Math.max(g.dryMatterPct, 1) : g.dryMatterPct;
    const cap = g.basis === 'asFed' ? dryMatterPct : 100;
    const share = (f: number) => Math.min(cap, f * cap);
    const optional = (f: number | undefined) => (f === undefined ? undefined : share(f));
    const request: ForageEvaluationRequest = {
      forageClass: g.forageClass,
      basis: g.basis,
      dryMatterPct,
      crudeProteinPct: share(g.cp),
      adfPct: share(g.adf),
      ndfPct: Math.min(cap, 1 + g.ndf * (cap - 1)),
    };
    const optionals = {
      ndfd48Pct: g.ndfd48 === undefined ? undefined : g.ndfd48 * 100,
      fatPct: optional(g.fat),
      ashPct: optional(g.ash),
      escPct: optional(g.esc),
      wscPct: optional(g.wsc),
      starchPct: optional(g.starch),
      calciumPct: optional(g.calcium),
      phosphorusPct: optional(g.phosphorus),
      moisturePct: g.moisture,
      reportedRfv: g.reportedRfv,
    };
    for (const [key, value] of Object.entries(optionals)) {
      if (value !== undefined) Object.assign(request, { [key]: value });
    }
    return request;
  });

type Corrupt = (request: ForageEvaluationRequest) => unknown;

const percentField = fc.constantFrom(...BASIS_DEPENDENT_FIELDS, 'ndfd48Pct' as const);
const badPercent = fc.oneof(
  fc.double({ min: 100.000001, max: 1e6, noNaN: true }),
  fc.double({ min: -1e6, max: -0.000001, noNaN: true }),
  fc.constantFrom(Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY),
);

/** One way of breaking an otherwise valid request. */
const corruption: fc.Arbitrary<Corrupt> = fc.oneof(
  fc.tuple(percentField, badPercent).map(([field, value]): Corrupt => (r) => ({ ...r, [field]: value })),
  fc.double({ min: -1e6, max: 0, noNaN: true }).map((value): Corrupt => (r) => ({ ...r, dryMatterPct: value })),
  fc.double({ min: 100.000001, max: 1e6, noNaN: true }).map((value): Corrupt => (r) => ({ ...r, dryMatterPct: value })),
  fc.double({ min: -1e6, max: 0.999999, noNaN: true }).map((value): Corrupt => (r) => ({ ...r, ndfPct: value })),
  fc.string().map((value): Corrupt => (r) => ({ ...r, crudeProteinPct: value })),
  fc.constantFrom('forageClass', 'basis', 'dryMatterPct', 'crudeProteinPct', 'adfPct', 'ndfPct').map(
    (field): Corrupt =>
      (r) => {
        const copy: Record<string, unknown> = { ...r };
        delete copy[field];
        return copy;
      },
  ),
  fc.constantFrom('hay', 'alfalfa', '', 'Legume').map((value): Corrupt => (r) => ({ ...r, forageClass: value })),
  fc.constantFrom('unknownField', 'rfq', 'nscPct').map((key): Corrupt => (r) => ({ ...r, [key]: 1 })),
  fc.double({ min: 100, max: 1e6, noNaN: true }).map((value): Corrupt => (r) => ({ ...r, moisturePct: value })),
  fc.double({ min: -1e6, max: 0, noNaN: true }).map((value): Corrupt => (r) => ({ ...r, reportedRfv: value })),
  fc.constant<Corrupt>((r) => ({ ...r, basis: 'asFed', dryMatterPct: 10, crudeProteinPct: 10.5, ndfPct: 5 })),
);
