import { startTestApi, type TestApi } from '../../../tests/support/test-api';

describe('POST /api/forage/evaluate', () => {
  let t: TestApi;
  beforeAll(async () => {
    t = await startTestApi();
  });
  afterAll(() => t.close());

  it('gives RFV ≈ 100 for the full-bloom alfalfa reference (ADF 41, NDF 53, DM basis)', async () => {
    // Source: Rohweder, Barnes & Jorgensen (1978) via Undersander, UW–Madison Ext., Relative Forage Quality —
    // the 1.29 divisor makes full-bloom alfalfa (ADF 41, NDF 53) score 100.
    const res = await t.agent().post('/forage/evaluate', { forageClass: 'legume', basis: 'dm', dryMatterPct: 90, crudeProteinPct: 17, adfPct: 41, ndfPct: 53 });
    expect(res.status).toBe(200);
    expect(res.body.rfv).toBeCloseTo(100, 0);
    expect(res.body.rfq).toBeNull();
    expect(res.body).toEqual(
      expect.objectContaining({
        dm: expect.any(Object),
        asFed: expect.any(Object),
        ddmPct: expect.any(Number),
        dmiPctBw: expect.any(Number),
        tdnPct: expect.any(Number),
        tdnMethod: expect.any(String),
        horseDe: expect.objectContaining({ mcalPerKgDm: expect.any(Number), mcalPerLbAsFed: expect.any(Number), method: expect.any(String) }),
        grades: expect.objectContaining({ usda: expect.objectContaining({ name: expect.any(String), basis: expect.any(String) }) }),
        findings: expect.any(Array),
      }),
    );
  });

  it('converts an as-fed entry to dry matter (12% moisture example, domain brief §1: 15.8% CP as-fed ↔ 18.0% DM)', async () => {
    const res = await t.agent().post('/forage/evaluate', { forageClass: 'legume', basis: 'asFed', dryMatterPct: 88, crudeProteinPct: 15.84, adfPct: 26.4, ndfPct: 35.2 });
    expect(res.status).toBe(200);
    expect(res.body.dm.crudeProteinPct).toBeCloseTo(18, 6);
    expect(res.body.asFed.crudeProteinPct).toBeCloseTo(15.84, 6);
  });

  it('rejects invalid input with 400 and the field paths', async () => {
    const res = await t.agent().post('/forage/evaluate', { forageClass: 'moss', basis: 'dm', dryMatterPct: 120, crudeProteinPct: -1, adfPct: 30 });
    expect(res.status).toBe(400);
    const paths = res.body.error.details.map((d: { path: string }) => d.path);
    expect(paths).toEqual(expect.arrayContaining(['forageClass', 'dryMatterPct', 'crudeProteinPct', 'ndfPct']));
  });
});
