import { evaluateSampling } from './sampling-findings';
import type { Finding, SamplingRecord } from './forage-contract';

const good: SamplingRecord = {
  sampledOn: '2024-07-15',
  coresTaken: 20,
  balesSampled: 20,
  probeDiameterIn: 0.5,
  probeLengthIn: 18,
  corePosition: 'butt-end-centre',
  baleShape: 'small-square',
  harvestStartedOn: '2024-06-10',
  harvestEndedOn: '2024-06-11',
  lotTons: 120,
  sampledBy: 'Dana Reyes',
};
const listing = { listedOn: '2024-08-01' };

describe('sampling-findings', () => {
  it('finds a 20-core, one-per-bale, butt-end sample of a 2-day, 120 t lot compliant with no findings', () => {
    expect(evaluateSampling(good, listing)).toEqual({ compliant: true, findings: [] });
  });

  // Source: Teutsch, Univ. Kentucky 2020 (S21) — at least 20 cores from 20 bales, one core per bale.
  it('fails fewer than 20 cores', () => {
    const result = evaluateSampling({ ...good, coresTaken: 19, balesSampled: 19 }, listing);
    expect(result.compliant).toBe(false);
    expect(codes(result.findings)).toEqual(['too-few-cores']);
  });

  it('fails more cores than bales sampled (one core per bale)', () => {
    const result = evaluateSampling({ ...good, coresTaken: 24, balesSampled: 12 }, listing);
    expect(result.compliant).toBe(false);
    expect(codes(result.findings)).toEqual(['multiple-cores-per-bale']);
  });

  it('warns when more bales than cores are recorded', () => {
    const result = evaluateSampling({ ...good, balesSampled: 22 }, listing);
    expect(result.compliant).toBe(true);
    expect(severity(result.findings, 'bales-exceed-cores')).toBe('warning');
  });

  // Source: NDSU Ext. / forage sampling fact sheet (S20) — lot harvested within 48 h. Dates alone are whole days.
  it('warns when the harvest window exceeds 48 hours', () => {
    expect(codes(evaluateSampling({ ...good, harvestEndedOn: '2024-06-12' }, listing).findings)).toEqual(['harvest-window-over-48h']);
    expect(evaluateSampling({ ...good, harvestEndedOn: '2024-06-12' }, listing).compliant).toBe(true);
  });

  it('accepts exactly 48 hours between date-times and flags 48 h and a minute', () => {
    const start = '2024-06-10T08:00:00Z';
    expect(evaluateSampling({ ...good, harvestStartedOn: start, harvestEndedOn: '2024-06-12T08:00:00Z' }, listing).findings).toEqual([]);
    expect(codes(evaluateSampling({ ...good, harvestStartedOn: start, harvestEndedOn: '2024-06-12T08:01:00Z' }, listing).findings)).toEqual([
      'harvest-window-over-48h',
    ]);
  });

  it('fails a harvest that ends before it starts', () => {
    const result = evaluateSampling({ ...good, harvestStartedOn: '2024-06-12', harvestEndedOn: '2024-06-11' }, listing);
    expect(result.compliant).toBe(false);
    expect(codes(result.findings)).toContain('harvest-dates-reversed');
  });

  // Source: Putnam & Orloff, NFTA sampling principles (S19) "generally < 200 t"; Teutsch 2020 (S21) "≤ 200 t". Split larger lots.
  it('fails a lot over 200 tons and accepts exactly 200', () => {
    expect(evaluateSampling({ ...good, lotTons: 200 }, listing).compliant).toBe(true);
    const result = evaluateSampling({ ...good, lotTons: 200.5 }, listing);
    expect(result.compliant).toBe(false);
    expect(codes(result.findings)).toEqual(['lot-too-large']);
  });

  // Decision: default maximum sample age 180 days at listing (parameter).
  it('fails a sample older than 180 days at listing by default and accepts exactly 180', () => {
    expect(evaluateSampling(good, { listedOn: '2025-01-11' }).compliant).toBe(true); // 180 days after 2024-07-15
    const result = evaluateSampling(good, { listedOn: '2025-01-12' });
    expect(result.compliant).toBe(false);
    expect(codes(result.findings)).toEqual(['sample-too-old']);
    expect(result.findings[0]!.message).toContain('181 days');
  });

  it('honours a custom maximum sample age', () => {
    expect(evaluateSampling(good, { listedOn: '2024-08-01', maxSampleAgeDays: 10 }).compliant).toBe(false);
  });

  it('fails a sample dated after the listing', () => {
    expect(codes(evaluateSampling(good, { listedOn: '2024-07-14' }).findings)).toEqual(['sampled-after-listing']);
  });

  it('fails a sample dated before the harvest ended', () => {
    const result = evaluateSampling({ ...good, sampledOn: '2024-06-10' }, listing);
    expect(result.compliant).toBe(false);
    expect(codes(result.findings)).toContain('sampled-before-harvest-ended');
  });

  // Source: Teutsch 2020 (S21) — wait 3–4 weeks after baling; Putnam & Orloff (S19) — DM shifts while hay sweats.
  it('notes a sample taken within 3 weeks of baling', () => {
    const result = evaluateSampling({ ...good, sampledOn: '2024-06-20' }, listing);
    expect(result.compliant).toBe(true);
    expect(severity(result.findings, 'sampled-during-sweat')).toBe('info');
  });

  // Source: NFTA / Putnam & Orloff (S19), NDSU (S20) — small bales: centre of the butt end; rounds: curved side, never flat ends; no grab samples.
  describe('core position', () => {
    it.each([
      ['small-square', 'butt-end-centre', []],
      ['large-square', 'butt-end-centre', []], // common practice: core large squares from the end too
      ['round', 'round-side', []],
      ['round', 'round-flat-end', ['core-position-round-flat-end']],
      ['small-square', 'bale-side', ['core-position-square-side']],
      ['small-square', 'round-side', ['core-position-mismatch']],
      ['round', 'butt-end-centre', ['core-position-mismatch']],
      ['round', 'grab', ['grab-sample']],
      ['small-square', 'grab', ['grab-sample']],
    ] as const)('for a %s bale cored at %s finds %j', (baleShape, corePosition, expected) => {
      const result = evaluateSampling({ ...good, baleShape, corePosition }, listing);
      expect(codes(result.findings)).toEqual(expected);
      expect(result.findings.every((f) => f.severity === 'warning')).toBe(true);
      expect(result.compliant).toBe(true);
    });
  });

  // Source: Teutsch 2020 (S21) — internal diameter ≥ 3/8 in, length ≥ 14 in (15–18 ideal); S19/S20 — core 12–18 in deep.
  describe('probe', () => {
    it('fails an internal diameter under 3/8 in and accepts exactly 3/8 in', () => {
      expect(evaluateSampling({ ...good, probeDiameterIn: 0.375 }, listing).compliant).toBe(true);
      const result = evaluateSampling({ ...good, probeDiameterIn: 0.25 }, listing);
      expect(result.compliant).toBe(false);
      expect(codes(result.findings)).toEqual(['probe-diameter-too-small']);
    });

    it('notes a diameter above the usual 3/4 in (from memory, NFTA)', () => {
      expect(severity(evaluateSampling({ ...good, probeDiameterIn: 1 }, listing).findings, 'probe-diameter-above-usual')).toBe('info');
    });

    it('fails a probe shorter than 12 in', () => {
      const result = evaluateSampling({ ...good, probeLengthIn: 11.9 }, listing);
      expect(result.compliant).toBe(false);
      expect(codes(result.findings)).toEqual(['probe-too-short']);
    });

    it('warns on a probe of 12 to under 14 in and accepts 14 in', () => {
      expect(severity(evaluateSampling({ ...good, probeLengthIn: 12 }, listing).findings, 'probe-shorter-than-ideal')).toBe('warning');
      expect(evaluateSampling({ ...good, probeLengthIn: 14 }, listing).findings).toEqual([]);
    });

    it('warns when the probe is not recorded, except for a grab sample', () => {
      const { probeDiameterIn: _d, probeLengthIn: _l, ...noProbe } = good;
      expect(codes(evaluateSampling(noProbe, listing).findings)).toEqual(['probe-not-recorded']);
      expect(codes(evaluateSampling({ ...noProbe, corePosition: 'grab' }, listing).findings)).toEqual(['grab-sample']);
    });
  });

  it('throws for a listing date that is not an ISO date', () => {
    expect(() => evaluateSampling(good, { listedOn: 'next Tuesday' })).toThrow(RangeError);
  });

  it('is non-compliant when any finding is an error and compliant with warnings only', () => {
    const warningsOnly = evaluateSampling({ ...good, corePosition: 'grab', harvestEndedOn: '2024-06-14' }, listing);
    expect(warningsOnly.findings.length).toBe(2);
    expect(warningsOnly.compliant).toBe(true);
    const withError = evaluateSampling({ ...good, corePosition: 'grab', coresTaken: 5, balesSampled: 5 }, listing);
    expect(withError.compliant).toBe(false);
  });
});

function codes(findings: Finding[]): string[] {
  return findings.map((f) => f.code);
}

function severity(findings: Finding[], code: string): Finding['severity'] | undefined {
  return findings.find((f) => f.code === code)?.severity;
}
