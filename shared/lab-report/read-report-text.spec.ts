import { readReportText, textLinesAsItems } from './read-report-text';
import { compareWithReading, prefillFromReading } from './compare-reading';

// Layouts below are invented in the ways forage labs commonly print results (common practice):
// one value a line with the basis in a heading or on the line, and an as-fed / dry-matter table.
const read = (lines: string[]) => readReportText(textLinesAsItems(lines));

describe('readReportText', () => {
  it('reads one value a line under a dry-matter heading', () => {
    const r = read([
      'FORAGE ANALYSIS REPORT',
      'Results on a dry matter basis',
      'Dry matter  88.4 %',
      'Crude protein (CP)  18.2 %',
      'Acid detergent fiber (ADF)  31.5 %',
      'Neutral detergent fiber (aNDF)  40.1 %',
      'NDFD 48 h, % of NDF  46.0',
      'Crude fat (EE)  2.4 %',
      'Ash  9.8 %',
      'Water-soluble carbohydrates (WSC)  9.1 %',
      'Ethanol-soluble carbohydrates (ESC)  6.3 %',
      'Starch  1.9 %',
      'Calcium (Ca)  1.42 %',
      'Phosphorus (P)  0.28 %',
      'Potassium (K)  2.31 %',
      'Magnesium (Mg)  0.31 %',
      'Relative feed value (RFV)  150',
    ]);
    expect(r.status).toBe('read');
    if (r.status !== 'read') return;
    expect(r.basisStated).toBe(true);
    expect(r.values.dryMatterPct).toMatchObject({ asFed: 88.4 });
    expect(r.values.crudeProteinPct).toMatchObject({ dm: 18.2, asFed: null, decimals: 1 });
    expect(r.values.adfPct?.dm).toBe(31.5);
    expect(r.values.ndfPct?.dm).toBe(40.1);
    expect(r.values.ndfd48Pct?.dm).toBe(46); // not the "48" of the incubation time
    expect(r.values.fatPct?.dm).toBe(2.4);
    expect(r.values.ashPct?.dm).toBe(9.8);
    expect(r.values.wscPct?.dm).toBe(9.1); // "water-soluble" is not moisture
    expect(r.values.escPct?.dm).toBe(6.3);
    expect(r.values.starchPct?.dm).toBe(1.9);
    expect(r.values.calciumPct).toMatchObject({ dm: 1.42, decimals: 2 });
    expect(r.values.phosphorusPct?.dm).toBe(0.28);
    expect(r.values.potassiumPct?.dm).toBe(2.31);
    expect(r.values.magnesiumPct?.dm).toBe(0.31);
    expect(r.values.reportedRfv?.dm).toBe(150);
  });

  it('takes the basis written on the line, and dry matter from moisture when only moisture is given', () => {
    const r = read(['Moisture 11.5 %', 'CP  16.0 % as fed', 'CP  18.1 % DM', 'ADF, % of DM  33.0', 'NDF (as received) 38.0 %']);
    if (r.status !== 'read') throw new Error(r.status);
    expect(r.values.dryMatterPct?.asFed).toBe(88.5);
    expect(r.values.crudeProteinPct).toMatchObject({ asFed: 16, dm: 18.1 });
    expect(r.values.adfPct).toMatchObject({ dm: 33, asFed: null });
    expect(r.values.ndfPct).toMatchObject({ asFed: 38, dm: null });
  });

  it('splits a two-column table by the column headings above the numbers', () => {
    const r = read([
      'Component                      As fed     Dry matter',
      'Dry matter, %                  88.0       100.0',
      'Crude protein, %               15.8       18.0',
      'ADF, %                         27.3       31.0',
      'Crude fat, %                              2.5',
    ]);
    if (r.status !== 'read') throw new Error(r.status);
    expect(r.values.dryMatterPct?.asFed).toBe(88);
    expect(r.values.crudeProteinPct).toMatchObject({ asFed: 15.8, dm: 18 });
    expect(r.values.adfPct).toMatchObject({ asFed: 27.3, dm: 31 });
    expect(r.values.fatPct).toMatchObject({ asFed: null, dm: 2.5 });
  });

  it('ignores lookalike lines: soluble protein, NSC, TDN, net energy', () => {
    const r = read(['Dry matter basis', 'Soluble protein, % of CP  32', 'NSC  12.0 %', 'TDN  58 %', 'NEL, Mcal/lb  0.58', 'Crude protein  17.0 %']);
    if (r.status !== 'read') throw new Error(r.status);
    expect(Object.keys(r.values)).toEqual(['crudeProteinPct']);
    expect(r.values.crudeProteinPct?.dm).toBe(17);
  });

  it('reads nitrate, mould count and mycotoxins in the units labs print them', () => {
    const r = read([
      'Results on a dry matter basis',
      'Crude protein  12.0 %',
      'Nitrate (NO3-N), ppm  1200',
      'Mold count, CFU/g  45,000',
      'Aflatoxin B1, ppb  12',
      'DON (vomitoxin), ppb  800',
      'Fumonisin, ppm  0.4',
    ]);
    if (r.status !== 'read') throw new Error(r.status);
    // ppm NO3-N × 62.004/14.007 ÷ 10,000 = % NO3 (IUPAC atomic weights N 14.007, O 15.999).
    expect(r.values.nitrateNo3PctDm?.dm).toBeCloseTo(0.5312, 4);
    expect(r.values.mouldCfuPerG?.dm).toBe(45_000);
    expect(r.values.aflatoxinPpb?.dm).toBe(12);
    expect(r.values.donPpm?.dm).toBe(0.8); // 1 ppm = 1,000 ppb (SI: mg/kg vs µg/kg)
    expect(r.values.fumonisinPpm?.dm).toBe(0.4);
    expect(prefillFromReading(r)).toMatchObject({ nitrateNo3PctDm: 0.5312, mouldCfuPerG: 45_000, aflatoxinPpb: 12, donPpm: 0.8, fumonisinPpm: 0.4 });
  });

  it('reads counts written out or in powers of ten, nitrate as % NO3, and skips results below detection', () => {
    const r = read(['Dry matter basis', 'Nitrate, % NO3  0.45', 'Mould count  1.2 x 10^5 CFU/g', 'Aflatoxin, ppb  < 5', 'Crude protein 10.0 %']);
    if (r.status !== 'read') throw new Error(r.status);
    expect(r.values.nitrateNo3PctDm?.dm).toBe(0.45);
    expect(r.values.mouldCfuPerG?.dm).toBe(120_000);
    expect(r.values.aflatoxinPpb).toBeUndefined();
    expect(read(['Mould count 250000 CFU/g'])).toMatchObject({ status: 'read', values: { mouldCfuPerG: { dm: 250_000 } } });
    expect(read(['Yeast and mold count  250000'])).toEqual({ status: 'no_values' }); // yeasts are not the mould count
  });

  it('says plainly when there is no text, or no values in the text', () => {
    expect(readReportText([])).toEqual({ status: 'no_text' });
    expect(read(['Thank you for your order', 'Invoice 2026-0042'])).toEqual({ status: 'no_values' });
  });

  it('assumes dry matter, and says so, when the report never states the basis', () => {
    const r = read(['Crude protein 19.0 %']);
    expect(r).toMatchObject({ status: 'read', basisStated: false, values: { crudeProteinPct: { dm: 19 } } });
  });
});

describe('compareWithReading', () => {
  const reading = read(['Results on a dry matter basis', 'Dry matter 88.0 %', 'Crude protein (CP) 18.2 %', 'ADF 31.0 %', 'NDF 40.0 %', 'Calcium 1.42 %']);

  it('matches values typed as printed and flags one that differs (tolerance: one printed unit, common practice)', () => {
    const rows = compareWithReading({ dryMatterPct: 88, crudeProteinPct: 18.2, adfPct: 29, ndfPct: 40.05, calciumPct: 1.42, starchPct: 2 }, reading);
    const by = Object.fromEntries(rows.map((r) => [r.field, r]));
    expect(by['crudeProteinPct']).toMatchObject({ status: 'match', read: 18.2, unit: '% of DM' });
    expect(by['adfPct']).toMatchObject({ status: 'mismatch', entered: 29, read: 31 });
    expect(by['ndfPct']!.status).toBe('match');
    expect(by['calciumPct']!.status).toBe('match');
    expect(by['starchPct']!.status).toBe('not_on_report');
    expect(by['dryMatterPct']!.status).toBe('match');
  });

  it('converts an as-fed figure to dry matter before comparing (DM = as fed ÷ DM share, domain brief §1)', () => {
    const asFed = read(['As fed basis', 'Dry matter 90.0 %', 'Crude protein 18.0 %']);
    const [, cp] = compareWithReading({ dryMatterPct: 90, crudeProteinPct: 20 }, asFed);
    expect(cp).toMatchObject({ field: 'crudeProteinPct', read: 20, status: 'match' });
    const [, wrong] = compareWithReading({ dryMatterPct: 90, crudeProteinPct: 18 }, asFed);
    expect(wrong!.status).toBe('mismatch');
  });

  it('prefills the form on the basis the report gives most fully', () => {
    expect(prefillFromReading(reading)).toEqual({ basis: 'dm', dryMatterPct: 88, crudeProteinPct: 18.2, adfPct: 31, ndfPct: 40, calciumPct: 1.42 });
    expect(prefillFromReading({ status: 'no_text' })).toBeNull();
  });
});
