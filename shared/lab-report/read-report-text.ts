import type { ReadableField, ReadValue, ReportReading } from '../contracts/report-reading';
import { analysisField } from '../forage/analysis-fields';
import { ForageEvaluationRequestSchema } from '../forage/forage-contract';
import { nitratePctNo3 } from '../forage/nitrate';

/** One run of text on a PDF page, as a text extractor returns it (x, y in PDF points; y grows upwards). */
export interface TextItem {
  str: string;
  x: number;
  y: number;
  /** Width of the run in points; estimated from its length when the extractor gives none. */
  width?: number;
  page?: number;
}

type Basis = 'asFed' | 'dm';

const MOULD = /\bmou?lds?\b/;

/**
 * How each analysis line is recognised, most specific first: a line is claimed by the first pattern
 * that matches its label (the text before its first value), so "NDFD" wins over "NDF" and
 * "soluble protein, % of CP" is ignored rather than taken for crude protein.
 */
const LABELS: [ReadableField | 'moisture' | null, RegExp][] = [
  // Lines that look like a field but are something else: skipped.
  [null, /adjusted (crude )?protein|soluble protein|bound protein|adicp|ndicp|degradab|\bnsc\b|non[- ]?(structural|fib(re|er))|\bnfc\b|\btdn\b|net energy|\bne[lmg]\b|digestible energy|\bde\b|relative feed quality|\brfq\b|lignin|sulfur|sulphur|sodium|iron|zinc|copper|manganese|chloride|\bdcad\b|\bph\b|lactic|acetic|ammonia|yeast|zearalenone|ochratoxin|\bt-?2\b/],
  ['nitrateNo3PctDm', /nitrate|\bno3\b/],
  ['aflatoxinPpb', /aflatoxin/],
  ['donPpm', /\bdon\b|deoxynivalenol|vomitoxin/],
  ['fumonisinPpm', /fumonisin/],
  ['mouldCfuPerG', MOULD],
  ['ndfd48Pct', /\bndfd\b|\bndfd\d+|ndf digestib|digestible ndf|\bdndf\b/],
  ['moisture', /moisture|\bwater\b(?![- ]soluble)|\bh2o\b/],
  ['dryMatterPct', /^\s*(total )?dry matter\b|^\s*\bdm\b|^\s*dry substance/],
  ['crudeProteinPct', /crude protein|^\s*\bcp\b|^\s*protein\b|\(cp\)/],
  ['adfPct', /\badf\b|acid detergent fib/],
  ['ndfPct', /\ba?ndf(om)?\b|neutral detergent fib/],
  ['fatPct', /crude fat|\bfat\b|ether extract|\(ee\)|^\s*ee\b/],
  ['ashPct', /\bash\b|^\s*minerals? \(ash\)/],
  ['escPct', /\besc\b|ethanol[- ]soluble/],
  ['wscPct', /\bwsc\b|water[- ]soluble carb/],
  ['starchPct', /starch/],
  ['calciumPct', /calcium|^\s*ca\b/],
  ['phosphorusPct', /phosphorus|^\s*p\b/],
  ['potassiumPct', /potassium|^\s*k\b/],
  ['magnesiumPct', /magnesium|^\s*mg\b/],
  ['reportedRfv', /relative feed value|\brfv\b/],
];

const AS_FED = /as[- ]?fed|as[- ]received|as[- ]sampled|as[- ]is\b|wet basis/;
const DRY = /dry[- ]matter basis|\bdm basis|dry basis|100\s*% dm|dry[- ]matter\b|\bdm\b|% of dm|\bdry\b/;
// "48 h", "30-hr": incubation times, never values.
const HOURS = /\b\d{1,3}\s*-?\s*(h|hr|hrs|hour|hours)\b/g;
const NUMBER = /(?<![\w.,])\d{1,4}(?:[.,]\d+)?(?![\w]|[.,]\d)/g;

interface Line {
  text: string;
  /** x of each character of `text`, for assigning numbers to columns. */
  xAt: (offset: number) => number;
}

interface Column {
  basis: Basis;
  x: number;
}

/**
 * Reads analysis values from the text of a lab report. Understands the usual layouts: one value a line
 * with the basis stated on the line or in a heading ("dry matter basis"), and tables with an as-fed and a
 * dry-matter column (numbers are given to the column whose heading sits nearest above them).
 */
export function readReportText(items: TextItem[]): ReportReading {
  const lines = toLines(items);
  if (lines.every((l) => l.text.trim() === '')) return { status: 'no_text' };

  const values: Partial<Record<ReadableField, ReadValue>> = {};
  let moisture: { value: number; decimals: number; line: string } | null = null;
  let columns: Column[] = [];
  let sectionBasis: Basis | null = null;
  let basisStated = false;

  for (const line of lines) {
    const lower = line.text.toLowerCase().replace(HOURS, (m) => ' '.repeat(m.length));
    const numbers = [...lower.matchAll(NUMBER)].map((m) => ({ raw: m[0], at: m.index }));
    // A mould count may be printed with more digits than any analysis value ("120000", "1.2e5").
    const digit = /\d+/.exec(lower);
    if (numbers.length === 0 && digit && MOULD.test(lower.slice(0, digit.index))) numbers.push({ raw: digit[0], at: digit.index });
    const firstAt = numbers[0]?.at ?? lower.length;
    const label = lower.slice(0, firstAt);

    if (numbers.length === 0 || !LABELS.some(([, re]) => re.test(label))) {
      // Headings: two bases name the columns of a table; one names the basis of the section below.
      const asFed = lower.search(AS_FED);
      const dry = lower.search(DRY);
      if (asFed >= 0 && dry >= 0) {
        columns = [
          { basis: 'asFed' as const, x: line.xAt(asFed) },
          { basis: 'dm' as const, x: line.xAt(dry) },
        ].sort((a, b) => a.x - b.x);
        basisStated = true;
      } else if (asFed >= 0 || dry >= 0) {
        sectionBasis = asFed >= 0 ? 'asFed' : 'dm';
        columns = [];
        basisStated = true;
      }
      continue;
    }

    const field = LABELS.find(([, re]) => re.test(label))![0];
    if (field === null) continue;
    const parsed = numbers.map((n) => ({ value: Number(n.raw.replace(',', '.')), decimals: n.raw.split(/[.,]/)[1]?.length ?? 0, x: line.xAt(n.at), at: n.at }));

    if (field === 'moisture') {
      moisture = { value: parsed[0]!.value, decimals: parsed[0]!.decimals, line: line.text.trim() };
      continue;
    }
    if (field === 'dryMatterPct') {
      // Dry matter is a share of the sample as fed; a "100" in the dry-matter column says nothing.
      const dm = parsed.find((p) => p.value < 99.95 && p.value > 0);
      if (dm) values.dryMatterPct = { asFed: dm.value, dm: null, decimals: dm.decimals, line: line.text.trim() };
      continue;
    }
    const convert = unitConversion(field, lower);
    if (field === 'mouldCfuPerG' || analysisField(field).unit === 'ppb' || analysisField(field).unit === 'ppm') {
      // Counts and toxins as the lab prints them; "<" is a result below the lab's limit of detection: nothing read.
      if (/<\s*$/.test(lower.slice(0, firstAt))) continue;
      const count = field === 'mouldCfuPerG' ? colonyCount(lower.slice(firstAt)) : { value: convert(parsed[0]!.value, parsed[0]!.decimals), decimals: parsed[0]!.decimals };
      if (count) values[field] = { asFed: null, dm: count.value, decimals: count.decimals, line: line.text.trim() };
      continue;
    }
    if (field === 'reportedRfv' || field === 'ndfd48Pct') {
      // An index and a share of NDF: the same on either basis; kept with the dry-matter figures.
      const p = parsed[parsed.length - 1]!;
      values[field] = { asFed: null, dm: p.value, decimals: p.decimals, line: line.text.trim() };
      continue;
    }

    const read: ReadValue = { asFed: null, dm: null, decimals: 0, line: line.text.trim() };
    const lineBasis = basisOnLine(lower, label, numbers[0]!.at);
    if (columns.length === 2 && !lineBasis) {
      for (const p of parsed.slice(0, 2)) {
        const nearest = columns.reduce((best, c) => (Math.abs(c.x - p.x) < Math.abs(best.x - p.x) ? c : best));
        if (read[nearest.basis] === null) read[nearest.basis] = convert(p.value, p.decimals);
        else read[nearest.basis === 'asFed' ? 'dm' : 'asFed'] = convert(p.value, p.decimals);
      }
      read.decimals = Math.max(...parsed.slice(0, 2).map((p) => p.decimals));
    } else {
      const basis = lineBasis ?? sectionBasis ?? 'dm';
      const p = parsed[0]!;
      read[basis] = convert(p.value, p.decimals);
      read.decimals = p.decimals;
      if (lineBasis) basisStated = true;
    }
    if (read.asFed === null && read.dm === null) continue;
    // A value repeated in a later section (e.g. the dry-matter table after the as-fed one) fills the gap.
    const before = values[field];
    values[field] = before ? { ...before, asFed: before.asFed ?? read.asFed, dm: before.dm ?? read.dm, decimals: Math.max(before.decimals, read.decimals) } : read;
  }

  if (!values.dryMatterPct && moisture && moisture.value > 0 && moisture.value < 100) {
    values.dryMatterPct = { asFed: round(100 - moisture.value, moisture.decimals), dm: null, decimals: moisture.decimals, line: moisture.line };
  }
  const sane = Object.fromEntries(Object.entries(values).filter(([field, v]) => plausible(field as ReadableField, v!)));
  if (Object.keys(sane).length === 0) return { status: 'no_values' };
  return { status: 'read', values: sane, basisStated };
}

/** A basis written on the value's own line ("18.2 % DM", "CP, % as fed"), outside the field's name. */
function basisOnLine(lower: string, label: string, firstNumberAt: number): Basis | null {
  const unitPart = lower.slice(firstNumberAt);
  for (const part of [unitPart, label]) {
    if (AS_FED.test(part)) return 'asFed';
    if (/\bdm\b|dry[- ]matter|dry basis|\bdry\b/.test(part)) return 'dm';
  }
  return null;
}

/** Within the range the engine's contract accepts for the field (0–100 % for the minerals it does not take). */
function plausible(field: ReadableField, v: ReadValue): boolean {
  const shape = ForageEvaluationRequestSchema.shape as Record<string, { safeParse(x: unknown): { success: boolean } } | undefined>;
  const ok = (n: number) => (shape[field] ? shape[field].safeParse(n).success : n >= 0 && n <= 100);
  return [v.asFed, v.dm].every((n) => n === null || ok(n)) && (v.asFed !== null || v.dm !== null);
}

const PPM_PER = { '%': 10_000, ppm: 1, ppb: 0.001 } as const;

/**
 * Turns a printed figure into the field's unit: ppm or mg/kg on a percent line (1 % = 10,000 ppm), ppb ↔ ppm for
 * toxins (1 ppm = 1,000 ppb), and nitrate printed as nitrate-N (ppm NO3-N × 62.004/14.007 = ppm NO3).
 */
function unitConversion(field: ReadableField, lower: string): (value: number, decimals: number) => number {
  const unit = analysisField(field).unit;
  const target = unit === 'ppb' || unit === 'ppm' ? unit : unit.startsWith('%') ? '%' : null;
  if (target === null) return (value, decimals) => round(value, decimals);
  const printed = /\bppb\b|[µu]g\/kg/.test(lower) ? 'ppb' : /\bppm\b|mg\/kg/.test(lower) ? 'ppm' : target;
  if (field === 'nitrateNo3PctDm') {
    const asN = /nitrate[- ]?n\b|no3[- ]?n\b|\bn[- ]?no3\b|nitrate nitrogen/.test(lower);
    const unitOf = asN ? 'ppm-no3-n' : printed === '%' ? 'pct-no3' : 'ppm-no3';
    const factor = printed === 'ppb' ? 0.001 : 1;
    return (value) => Math.round(nitratePctNo3(value * factor, unitOf) * 10_000) / 10_000;
  }
  if (printed === target) return (value, decimals) => round(value, decimals);
  const factor = PPM_PER[printed] / PPM_PER[target];
  return target === '%' ? (value, decimals) => round(value * factor, decimals) : (value) => Math.round(value * factor * 10_000) / 10_000;
}

/** A mould count as labs print it: "45,000", "45 000", "120000", "1.2 x 10^5", "1.2E5" colony-forming units per gram. */
function colonyCount(text: string): { value: number; decimals: number } | null {
  const m = /(\d{1,3}(?:[, ]\d{3})+|\d+(?:\.\d+)?)(?:\s*(?:[x×*]\s*10\s*\^?\s*|e\+?)(\d{1,2}))?/.exec(text);
  if (!m) return null;
  const mantissa = Number(m[1]!.replace(/[, ]/g, ''));
  return { value: m[2] ? Math.round(mantissa * 10 ** Number(m[2])) : mantissa, decimals: 0 };
}

function round(value: number, decimals: number): number {
  const f = 10 ** Math.max(decimals, 0);
  return Math.round(value * f * 100) / (f * 100);
}

/** Groups runs into lines (same page, baseline within 2 pt), left to right, top to bottom. */
function toLines(items: TextItem[]): Line[] {
  const sorted = [...items].filter((i) => i.str.length > 0).sort((a, b) => (a.page ?? 1) - (b.page ?? 1) || b.y - a.y || a.x - b.x);
  const groups: TextItem[][] = [];
  for (const item of sorted) {
    const last = groups[groups.length - 1];
    const head = last?.[0];
    if (last && head && (head.page ?? 1) === (item.page ?? 1) && Math.abs(head.y - item.y) <= 2) last.push(item);
    else groups.push([item]);
  }
  return groups.map((group) => {
    group.sort((a, b) => a.x - b.x);
    let text = '';
    const spans: { start: number; item: TextItem; width: number }[] = [];
    for (const item of group) {
      if (text.length > 0) text += '  ';
      spans.push({ start: text.length, item, width: item.width ?? item.str.length * 5.5 });
      text += item.str;
    }
    const xAt = (offset: number) => {
      const span = [...spans].reverse().find((s) => s.start <= offset) ?? spans[0]!;
      const within = Math.min(offset - span.start, span.item.str.length);
      return span.item.x + (span.item.str.length > 0 ? (within / span.item.str.length) * span.width : 0);
    };
    return { text, xAt };
  });
}

/** Turns plain text lines into runs as a fixed-pitch page would give them (for text typed by hand). */
export function textLinesAsItems(lines: string[], charWidth = 6): TextItem[] {
  return lines.map((str, i) => ({ str, x: 0, y: 800 - i * 14, width: str.length * charWidth, page: 1 }));
}
