import { calciumPhosphorusFindings, consistencyFindings, methodFindings, type ConsistencyInput, type MethodNotesInput } from './analysis-findings';
import type { Finding, Nutrients } from './forage-contract';

const dm: Nutrients = {
  crudeProteinPct: 20,
  adfPct: 30,
  ndfPct: 40,
  fatPct: 2.5,
  ashPct: 10,
  escPct: null,
  wscPct: null,
  starchPct: null,
  calciumPct: 1.4,
  phosphorusPct: 0.3,
  nscPct: null,
};
const clean: ConsistencyInput = {
  dryMatterPct: 88,
  moisturePct: 12,
  dm,
  ndfd48Pct: 45,
  reportedRfv: 152,
  computedRfv: 152.4,
  nfcPct: 30.3,
};
const notes: MethodNotesInput = {
  forageClass: 'legume',
  dm,
  ndfd48Pct: 45,
  rfqComputed: true,
  nfcNegative: false,
  horseDeMethod: 'nrc-2007-pagan',
  nscMethod: null,
  nscFlag: null,
};

describe('analysis-findings', () => {
  describe('consistencyFindings', () => {
    it('finds nothing wrong with a plausible, self-consistent alfalfa analysis', () => {
      expect(consistencyFindings(clean)).toEqual([]);
    });

    it('reports an error when NDF does not exceed ADF', () => {
      expect(find(consistencyFindings({ ...clean, dm: { ...dm, adfPct: 40 } }), 'ndf-below-adf')?.severity).toBe('error');
      expect(find(consistencyFindings({ ...clean, dm: { ...dm, adfPct: 41 } }), 'ndf-below-adf')?.severity).toBe('error');
    });

    // Source: domain brief §7 — reject analyses where CP + NDF + EE + ash > 100.
    it('reports an error when CP + NDF + fat + ash exceeds 100', () => {
      const findings = consistencyFindings({ ...clean, dm: { ...dm, crudeProteinPct: 30, ndfPct: 60 } });
      expect(find(findings, 'cp-ndf-fat-ash-over-100')?.severity).toBe('error');
    });

    it('checks CP + NDF alone when fat and ash are not reported', () => {
      const findings = consistencyFindings({ ...clean, nfcPct: null, dm: { ...dm, fatPct: null, ashPct: null, crudeProteinPct: 35, ndfPct: 70 } });
      expect(find(findings, 'cp-ndf-fat-ash-over-100')).toBeDefined();
    });

    // Source: domain brief §3 — NFC must come out ≥ 0 (common practice).
    it('reports an error when NFC is negative', () => {
      expect(find(consistencyFindings({ ...clean, nfcPct: -0.5 }), 'nfc-negative')?.severity).toBe('error');
    });

    // Source: domain brief §1 — DM% = 100 − moisture%; tolerance 0.5 points (common practice, rounding on lab reports).
    it('reports an error when dry matter and moisture do not sum to 100 within 0.5 points', () => {
      expect(find(consistencyFindings({ ...clean, moisturePct: 12.5 }), 'dm-moisture-mismatch')).toBeUndefined();
      expect(find(consistencyFindings({ ...clean, moisturePct: 12.6 }), 'dm-moisture-mismatch')?.severity).toBe('error');
      expect(find(consistencyFindings({ ...clean, moisturePct: null }), 'dm-moisture-mismatch')).toBeUndefined();
    });

    // Decision (common practice): ±3 RFV points tolerance.
    it('warns when the reported RFV is more than 3 points from the computed RFV', () => {
      expect(find(consistencyFindings({ ...clean, reportedRfv: 155.4 }), 'reported-rfv-mismatch')).toBeUndefined();
      expect(find(consistencyFindings({ ...clean, reportedRfv: 149.4 }), 'reported-rfv-mismatch')).toBeUndefined();
      expect(find(consistencyFindings({ ...clean, reportedRfv: 156 }), 'reported-rfv-mismatch')?.severity).toBe('warning');
      expect(find(consistencyFindings({ ...clean, reportedRfv: 149 }), 'reported-rfv-mismatch')?.severity).toBe('warning');
    });

    it.each([
      ['crudeProteinPct', 2.9, 'crude-protein-outside-hay-range'],
      ['crudeProteinPct', 35.1, 'crude-protein-outside-hay-range'],
      ['adfPct', 14, 'adf-outside-hay-range'],
      ['ndfPct', 81, 'ndf-outside-hay-range'],
      ['fatPct', 9, 'fat-outside-hay-range'],
      ['ashPct', 2, 'ash-outside-hay-range'],
      ['calciumPct', 3, 'calcium-outside-hay-range'],
      ['starchPct', 12, 'starch-outside-hay-range'],
    ] as const)('warns when %s of %s is outside the plausible hay range', (field, value, code) => {
      const findings = consistencyFindings({ ...clean, reportedRfv: null, dm: { ...dm, [field]: value } });
      expect(find(findings, code)?.severity).toBe('warning');
    });

    it('warns when 48-h NDFD is outside 20–85% of NDF (common practice)', () => {
      expect(find(consistencyFindings({ ...clean, ndfd48Pct: 90 }), 'ndfd48-outside-hay-range')?.severity).toBe('warning');
    });

    // Source: domain brief §1/§10 — above ~20% moisture storage is unsafe; Illinois Dept. Agric. (S34) 7–20% typical.
    it('warns when moisture is above the 20% safe-storage level', () => {
      expect(find(consistencyFindings({ ...clean, dryMatterPct: 79, moisturePct: 21 }), 'moisture-above-safe-storage')?.severity).toBe('warning');
      expect(find(consistencyFindings({ ...clean, dryMatterPct: 80, moisturePct: 20 }), 'moisture-above-safe-storage')).toBeUndefined();
    });

    it('warns when dry matter is above the usual marketed range', () => {
      expect(find(consistencyFindings({ ...clean, dryMatterPct: 98, moisturePct: 2 }), 'dry-matter-outside-hay-range')?.severity).toBe('warning');
    });

    // Source: domain brief §8 — ESC is a subset of WSC.
    it('warns when ESC exceeds WSC', () => {
      expect(find(consistencyFindings({ ...clean, dm: { ...dm, escPct: 8, wscPct: 7 } }), 'esc-above-wsc')?.severity).toBe('warning');
    });

    // Source: Shewmaker, Univ. Idaho (S27) — test hay with CP > 25% for nitrate.
    it('suggests a nitrate test above 25% crude protein', () => {
      expect(find(consistencyFindings({ ...clean, dm: { ...dm, crudeProteinPct: 26 }, reportedRfv: null }), 'high-protein-test-nitrate')?.severity).toBe('info');
    });

    it('uses kebab-case codes and plain-English messages', () => {
      const findings = consistencyFindings({ ...clean, moisturePct: 20, reportedRfv: 100, dm: { ...dm, adfPct: 45, ndfPct: 44, fatPct: 12 } });
      expect(findings.length).toBeGreaterThan(3);
      for (const f of findings) {
        expect(f.code).toMatch(/^[a-z0-9]+(-[a-z0-9]+)*$/);
        expect(f.message).toMatch(/^[A-Z].*[.;]$/);
      }
    });
  });

  describe('methodFindings', () => {
    it('says nothing for a legume with every input present', () => {
      expect(methodFindings(notes)).toEqual([]);
    });

    it('lists what RFQ is missing', () => {
      const finding = find(methodFindings({ ...notes, rfqComputed: false, ndfd48Pct: null, dm: { ...dm, ashPct: null } }), 'rfq-inputs-missing');
      expect(finding?.message).toContain('missing: 48-h NDFD, ash');
    });

    it('does not repeat the RFQ note when NFC is negative (already an error)', () => {
      expect(find(methodFindings({ ...notes, rfqComputed: false, nfcNegative: true }), 'rfq-inputs-missing')).toBeUndefined();
    });

    // Source: Undersander, UW–Madison Ext. (S1) — RFV under-ranks grasses.
    it('notes that RFV under-ranks grass', () => {
      expect(find(methodFindings({ ...notes, forageClass: 'grass' }), 'rfv-under-ranks-grass')).toBeDefined();
    });

    it('notes how mixed hay was treated', () => {
      expect(find(methodFindings({ ...notes, forageClass: 'mixed' }), 'mixed-graded-as-alfalfa')).toBeDefined();
    });

    // Source: domain brief §7 — the TDN route flatters mature grass, so label the method.
    it('notes when horse DE came from TDN', () => {
      expect(find(methodFindings({ ...notes, horseDeMethod: 'tdn-approximation' }), 'horse-de-from-tdn')).toBeDefined();
    });

    // Source: Kentucky Equine Research (S15) — equation unreliable for high-fat feeds.
    it('notes high fat under the NRC horse equation', () => {
      expect(find(methodFindings({ ...notes, dm: { ...dm, fatPct: 6 } }), 'horse-de-high-fat')).toBeDefined();
    });

    it('asks for starch when only sugars are reported', () => {
      expect(find(methodFindings({ ...notes, dm: { ...dm, wscPct: 9 } }), 'nsc-needs-starch')).toBeDefined();
    });

    // Source: domain brief §8/§10 — every health-related claim ends with "consult your veterinarian or an equine nutritionist".
    it('warns above the NSC limits and refers the owner to a veterinarian', () => {
      const strict = find(methodFindings({ ...notes, nscMethod: 'wsc-plus-starch', nscFlag: 'above-strict-limit' }), 'nsc-above-strict-limit');
      const upper = find(methodFindings({ ...notes, nscMethod: 'esc-plus-starch', nscFlag: 'above-upper-limit' }), 'nsc-above-upper-limit');
      expect(strict?.severity).toBe('warning');
      expect(strict?.message).toContain('WSC + starch');
      expect(upper?.message).toContain('ESC + starch');
      expect(upper?.message).toMatch(/Consult your veterinarian or an equine nutritionist\.$/);
      expect(find(methodFindings({ ...notes, nscMethod: 'wsc-plus-starch', nscFlag: 'within-advised-limit' }), 'nsc-above-strict-limit')).toBeUndefined();
    });
  });
});

function find(findings: Finding[], code: string): Finding | undefined {
  return findings.find((f) => f.code === code);
}

describe('calciumPhosphorusFindings', () => {
  // Ca:P for horses: never below 1:1; 1.5–3:1 for growing horses; mature horses tolerate up to about 8:1
  // (experts123 equine-nutrition FAQ; common practice). Hand-worked ratios below.
  it('flags inverted hay: Ca 0.25 % / P 0.30 % = 0.8:1', () => {
    expect(calciumPhosphorusFindings(0.25, 0.3).map((f) => [f.code, f.severity])).toEqual([['ca-p-inverted', 'warning']]);
  });

  it('says nothing in the usual range: grass hay Ca 0.4 % / P 0.15 % = 2.7:1', () => {
    expect(calciumPhosphorusFindings(0.4, 0.15)).toEqual([]);
  });

  it('leaves alfalfa-like ratios alone, which mature horses tolerate: Ca 1.4 % / P 0.25 % = 5.6:1', () => {
    expect(calciumPhosphorusFindings(1.4, 0.25)).toEqual([]);
  });

  it('warns far above the mature range: Ca 1.8 % / P 0.2 % = 9.0:1, and defers to a professional', () => {
    const [f] = calciumPhosphorusFindings(1.8, 0.2);
    expect(f).toMatchObject({ code: 'ca-p-far-above-range', severity: 'warning' });
    expect(f!.message).toMatch(/veterinarian or an equine nutritionist/);
  });

  it('needs both minerals', () => {
    expect(calciumPhosphorusFindings(null, 0.2)).toEqual([]);
    expect(calciumPhosphorusFindings(1, null)).toEqual([]);
  });
});
