import { analysisCsvTemplate, readAnalysisCsv } from './analysis-csv';

describe('lab-values CSV', () => {
  it('reads back a filled-in template', () => {
    const filled = analysisCsvTemplate()
      .replace('dryMatterPct,', 'dryMatterPct,88.5')
      .replace('crudeProteinPct,', 'crudeProteinPct,19.2')
      .replace('adfPct,', 'adfPct,31')
      .replace('ndfPct,', 'ndfPct,42.4')
      .replace('basis,dm', 'basis,asFed');
    expect(readAnalysisCsv(filled)).toEqual({ ok: true, values: { basis: 'asFed', dryMatterPct: 88.5, crudeProteinPct: 19.2, adfPct: 31, ndfPct: 42.4 } });
  });
  it('reads a header row with one row of values', () => {
    expect(readAnalysisCsv('dryMatterPct,crudeProteinPct,adfPct,ndfPct\n90,12,35,60\n')).toEqual({ ok: true, values: { basis: 'dm', dryMatterPct: 90, crudeProteinPct: 12, adfPct: 35, ndfPct: 60 } });
  });
  it('names the line of every problem instead of guessing', () => {
    const result = readAnalysisCsv('field,value\ncrudeProteinPct,twelve\nsugarPct,4\nbasis,wet\n');
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.errors).toEqual(expect.arrayContaining(['Line 2: crudeProteinPct must be a number, not “twelve”.', 'Line 3: “sugarPct” is not a field of the template.', 'Line 4: basis must be dm or asFed, not “wet”.', 'dryMatterPct is missing.']));
    expect(readAnalysisCsv('hello,world\n1,2').ok).toBe(false);
  });
});
