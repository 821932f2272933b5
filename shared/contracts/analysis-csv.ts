import Papa from 'papaparse';
import { type AnalysisField, ENTERED_FIELDS } from '../forage/analysis-fields';

/**
 * The lab-values CSV: a template growers fill from their lab report, and its reader, both from the one
 * analysis-field table and both through papaparse (RFC 4180 quoting; `,` or `;` as delimiter, detected).
 * The template is one `field,value` pair a line (easy to fill in a spreadsheet); a header row with one
 * row of values is read too. Values are on the basis named in `basis` (`dm` or `asFed`).
 */

type CsvField = Pick<AnalysisField, 'csvColumn' | 'key' | 'label' | 'unit' | 'basis' | 'required'>;

const BASIS_MEANING = 'dm or asFed: the basis the numbers below are on';

/** What a field means, in the template's third column. */
function meaning(f: CsvField): string {
  const unit = f.basis === 'entered' ? '% on the basis above' : f.unit;
  return `${f.label}, ${unit}${f.required ? '' : ' (optional)'}`;
}

/** The template: every field the grower types, in table order (pass `fields` to see a changed table). */
export function analysisCsvTemplate(fields: readonly CsvField[] = ENTERED_FIELDS): string {
  const data = [['basis', 'dm', BASIS_MEANING], ...fields.map((f) => [f.csvColumn, '', meaning(f)])];
  return Papa.unparse({ fields: ['field', 'value', 'meaning'], data }, { newline: '\r\n' }) + '\r\n';
}

export type AnalysisCsvResult = { ok: true; values: Record<string, number | string> } | { ok: false; errors: string[] };

/** Reads a filled template. Unknown field names and non-numbers are reported by line, never guessed. */
export function readAnalysisCsv(content: string, fields: readonly CsvField[] = ENTERED_FIELDS): AnalysisCsvResult {
  const byColumn = new Map<string, CsvField>(fields.map((f) => [f.csvColumn, f]));
  const known = (name: string) => name === 'basis' || byColumn.has(name);
  const parsed = parseRows(content.replace(/^\uFEFF/, ''));
  if (parsed.errors.length > 0) return { ok: false, errors: parsed.errors };
  const rows = parsed.rows;
  if (rows.length === 0) return { ok: false, errors: ['The file is empty.'] };

  const pairs: [string, string, number][] = [];
  const first = rows[0]!.cells.map((c) => c.trim());
  if (first[0]?.toLowerCase() === 'field') {
    rows.slice(1).forEach((r) => pairs.push([(r.cells[0] ?? '').trim(), (r.cells[1] ?? '').trim(), r.line]));
  } else if (first.some(known) && rows.length >= 2) {
    first.forEach((name, col) => pairs.push([name, (rows[1]!.cells[col] ?? '').trim(), rows[1]!.line]));
  } else {
    return { ok: false, errors: ['This does not look like the lab-values template: download the template and fill in the value column.'] };
  }

  const values: Record<string, number | string> = {};
  const errors: string[] = [];
  for (const [name, raw, line] of pairs) {
    if (!name) continue;
    if (!known(name)) {
      errors.push(`Line ${line}: “${name}” is not a field of the template.`);
      continue;
    }
    if (raw === '') continue;
    if (name === 'basis') {
      const lower = raw.toLowerCase();
      const basis = lower === 'asfed' || lower === 'as-fed' ? 'asFed' : lower === 'dm' ? 'dm' : null;
      if (!basis) errors.push(`Line ${line}: basis must be dm or asFed, not “${raw}”.`);
      else values['basis'] = basis;
      continue;
    }
    // A decimal comma is common where `;` separates the cells.
    const n = Number(raw.replace('%', '').replace(',', '.'));
    if (!Number.isFinite(n)) errors.push(`Line ${line}: ${name} must be a number, not “${raw}”.`);
    else values[byColumn.get(name)!.key] = n;
  }
  for (const f of fields) {
    if (f.required && values[f.key] === undefined && !errors.some((e) => e.includes(f.csvColumn))) errors.push(`${f.csvColumn} is missing.`);
  }
  return errors.length > 0 ? { ok: false, errors } : { ok: true, values: { basis: 'dm', ...values } };
}

/** Non-empty rows with the line each starts on (a quoted cell may span lines). */
function parseRows(content: string): { rows: { cells: string[]; line: number }[]; errors: string[] } {
  const rows: { cells: string[]; line: number }[] = [];
  const errors: string[] = [];
  let offset = 0;
  const lineAt = (at: number) => 1 + (content.slice(0, at).match(/\n/g)?.length ?? 0);
  Papa.parse<string[]>(content, {
    delimitersToGuess: [',', ';', '\t'],
    step: (result) => {
      const line = lineAt(offset);
      offset = result.meta.cursor;
      // A line that does not end its quotes is named; a single-column file simply has no delimiter.
      for (const e of result.errors) if (e.type === 'Quotes') errors.push(`Line ${line}: a quoted value is not closed.`);
      if (result.data.some((c) => c.trim() !== '')) rows.push({ cells: result.data, line });
    },
  });
  return { rows, errors };
}
