import Papa from 'papaparse';
import { ENTERED_FIELDS } from '../forage/analysis-fields';
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

describe('lab-values CSV and the analysis-field table', () => {
  const cellsOf = (csv: string) => Papa.parse<string[]>(csv, { skipEmptyLines: true }).data;

  it('round-trips every field the grower types: template → filled in → imported', () => {
    // A distinct value per field, within every field's range (0.25, 0.5, …).
    const filledValue = (i: number) => (i + 1) / 4;
    const filled = cellsOf(analysisCsvTemplate()).map((row) => {
      const i = ENTERED_FIELDS.findIndex((f) => f.csvColumn === row[0]);
      return i < 0 ? row : [row[0]!, String(filledValue(i)), row[2]!];
    });
    const result = readAnalysisCsv(Papa.unparse(filled));
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.values).toEqual({ basis: 'dm', ...Object.fromEntries(ENTERED_FIELDS.map((f, i) => [f.key, filledValue(i)])) });
    // The newer safety results are among them.
    for (const key of ['nitrateNo3PctDm', 'mouldCfuPerG', 'aflatoxinPpb', 'donPpm', 'fumonisinPpm', 'calciumPct', 'phosphorusPct']) expect(result.values[key]).toBeDefined();
  });

  it('puts every typed field of the table in the template, and a field added to the table appears too', () => {
    const columns = cellsOf(analysisCsvTemplate()).map((r) => r[0]);
    expect(columns).toEqual(['field', 'basis', ...ENTERED_FIELDS.map((f) => f.csvColumn)]);
    const added = { key: 'seleniumPpm', csvColumn: 'seleniumPpm', label: 'Selenium', unit: 'ppm', basis: 'none', required: false } as const;
    const grown = [...ENTERED_FIELDS, added];
    expect(cellsOf(analysisCsvTemplate(grown)).map((r) => r[0])).toContain('seleniumPpm');
    expect(readAnalysisCsv('field,value\ndryMatterPct,88\ncrudeProteinPct,12\nadfPct,35\nndfPct,60\nseleniumPpm,0.3\n', grown)).toMatchObject({ ok: true, values: { seleniumPpm: 0.3 } });
  });

  it('escapes quotes, commas and line breaks in the template (RFC 4180 §2 rules 6 and 7)', () => {
    const odd = [{ key: 'x', csvColumn: 'x', label: 'Label with "quotes", a comma\nand a line break', unit: '%', basis: 'none', required: false } as const];
    const csv = analysisCsvTemplate(odd);
    expect(csv).toContain('"Label with ""quotes"", a comma\nand a line break, % (optional)"');
    expect(cellsOf(csv)[2]![2]).toBe('Label with "quotes", a comma\nand a line break, % (optional)');
  });

  it('reads quoted cells with line breaks and doubled quotes (RFC 4180 §2 rules 6 and 7)', () => {
    // RFC 4180 §2 rule 6 example: "aaa","b CRLF bb","ccc"; rule 7: "aaa","b""bb","ccc".
    const csv = 'field,value,meaning\r\n"dryMatterPct","88","Dry\r\nmatter"\r\ncrudeProteinPct,12,"CP ""as printed"""\r\nadfPct,35,\r\nndfPct,60,\r\nfatPct,x,\r\n';
    // The bad value is named by the line it is on: line 7, after a cell that spanned lines 2 and 3.
    expect(readAnalysisCsv(csv)).toEqual({ ok: false, errors: ['Line 7: fatPct must be a number, not “x”.'] });
    expect(readAnalysisCsv(csv.replace('fatPct,x,', 'fatPct,2.5,'))).toEqual({ ok: true, values: { basis: 'dm', dryMatterPct: 88, crudeProteinPct: 12, adfPct: 35, ndfPct: 60, fatPct: 2.5 } });
  });

  it('detects `;` as the delimiter, with decimal commas (common practice in spreadsheets set to European locales)', () => {
    const csv = 'field;value;meaning\nbasis;asFed;"dm or asFed, the basis"\ndryMatterPct;88,5;\ncrudeProteinPct;17,2;"CP, %"\nadfPct;30;\nndfPct;41,3;\n';
    expect(readAnalysisCsv(csv)).toEqual({ ok: true, values: { basis: 'asFed', dryMatterPct: 88.5, crudeProteinPct: 17.2, adfPct: 30, ndfPct: 41.3 } });
  });

  it('names an unclosed quote instead of reading past it', () => {
    const result = readAnalysisCsv('field,value\ndryMatterPct,"88\n');
    expect(result.ok).toBe(false);
  });
});
