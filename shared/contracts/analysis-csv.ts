/**
 * The lab-values CSV: a template growers fill from their lab report, and its reader. The template is
 * one `field,value` pair a line (easy to fill in a spreadsheet); a header row with one row of values
 * is read too. Values are percent on the basis named in `basis` (`dm` or `asFed`).
 */

export const ANALYSIS_CSV_FIELDS = [
  ['basis', 'dm or asFed: the basis the numbers below are on'],
  ['dryMatterPct', 'Dry matter, % as fed'],
  ['crudeProteinPct', 'Crude protein (CP), %'],
  ['adfPct', 'Acid detergent fibre (ADF), %'],
  ['ndfPct', 'Neutral detergent fibre (NDF), %'],
  ['ndfd48Pct', '48-h NDF digestibility, % of NDF (optional)'],
  ['fatPct', 'Crude fat / ether extract, % (optional)'],
  ['ashPct', 'Ash, % (optional)'],
  ['escPct', 'Ethanol-soluble carbohydrate, % (optional)'],
  ['wscPct', 'Water-soluble carbohydrate, % (optional)'],
  ['starchPct', 'Starch, % (optional)'],
  ['calciumPct', 'Calcium, % (optional)'],
  ['phosphorusPct', 'Phosphorus, % (optional)'],
  ['moisturePct', 'Moisture, % as fed (optional, checks dry matter)'],
  ['reportedRfv', 'RFV printed on the report (optional)'],
] as const;

export type AnalysisCsvField = (typeof ANALYSIS_CSV_FIELDS)[number][0];
const KNOWN = new Set<string>(ANALYSIS_CSV_FIELDS.map(([f]) => f));

export function analysisCsvTemplate(): string {
  const lines = ['field,value,meaning', ...ANALYSIS_CSV_FIELDS.map(([field, meaning]) => `${field},${field === 'basis' ? 'dm' : ''},"${meaning}"`)];
  return lines.join('\r\n') + '\r\n';
}

export type AnalysisCsvResult = { ok: true; values: Record<string, number | string> } | { ok: false; errors: string[] };

/** Reads a filled template. Unknown field names and non-numbers are reported by line, never guessed. */
export function readAnalysisCsv(content: string): AnalysisCsvResult {
  const rows = content
    .replace(/^\uFEFF/, '')
    .split(/\r?\n/)
    .map((line) => splitCsvLine(line))
    .filter((cells) => cells.some((c) => c.trim() !== ''));
  if (rows.length === 0) return { ok: false, errors: ['The file is empty.'] };

  const pairs: [string, string, number][] = [];
  const first = rows[0]!.map((c) => c.trim());
  if (first[0]?.toLowerCase() === 'field') {
    rows.slice(1).forEach((r, i) => pairs.push([(r[0] ?? '').trim(), (r[1] ?? '').trim(), i + 2]));
  } else if (first.some((c) => KNOWN.has(c)) && rows.length >= 2) {
    first.forEach((name, col) => pairs.push([name, (rows[1]![col] ?? '').trim(), 2]));
  } else {
    return { ok: false, errors: ['This does not look like the lab-values template: download the template and fill in the value column.'] };
  }

  const values: Record<string, number | string> = {};
  const errors: string[] = [];
  for (const [field, raw, line] of pairs) {
    if (!field) continue;
    if (!KNOWN.has(field)) {
      errors.push(`Line ${line}: “${field}” is not a field of the template.`);
      continue;
    }
    if (raw === '') continue;
    if (field === 'basis') {
      const basis = raw.toLowerCase() === 'asfed' || raw.toLowerCase() === 'as-fed' ? 'asFed' : raw.toLowerCase() === 'dm' ? 'dm' : null;
      if (!basis) errors.push(`Line ${line}: basis must be dm or asFed, not “${raw}”.`);
      else values['basis'] = basis;
      continue;
    }
    const n = Number(raw.replace('%', '').replace(',', '.'));
    if (!Number.isFinite(n)) errors.push(`Line ${line}: ${field} must be a number, not “${raw}”.`);
    else values[field] = n;
  }
  for (const need of ['dryMatterPct', 'crudeProteinPct', 'adfPct', 'ndfPct']) {
    if (values[need] === undefined && !errors.some((e) => e.includes(need))) errors.push(`${need} is missing.`);
  }
  return errors.length > 0 ? { ok: false, errors } : { ok: true, values: { basis: 'dm', ...values } };
}

function splitCsvLine(line: string): string[] {
  const cells: string[] = [];
  let cell = '';
  let quoted = false;
  for (let i = 0; i < line.length; i++) {
    const ch = line[i]!;
    if (quoted) {
      if (ch === '"' && line[i + 1] === '"') {
        cell += '"';
        i++;
      } else if (ch === '"') quoted = false;
      else cell += ch;
    } else if (ch === '"') quoted = true;
    else if (ch === ',' || ch === ';') {
      cells.push(cell);
      cell = '';
    } else cell += ch;
  }
  cells.push(cell);
  return cells;
}
