import {
  READABLE_FIELD_LABELS,
  READABLE_FIELDS,
  type ReadableField,
  type ReadingComparison,
  type ReportReading,
} from '../contracts/report-reading';
import { analysisField, ENTERED_FIELDS, isShareOfSample, READABLE_FIELD_ROWS } from '../forage/analysis-fields';

/** Fields whose as-fed and dry-matter figures differ by the dry-matter share. */
const PER_SAMPLE = new Set<ReadableField>(READABLE_FIELD_ROWS.filter((f) => f.key !== 'dryMatterPct' && isShareOfSample(f)).map((f) => f.key));
/** Readable fields the lot form takes (potassium and magnesium are only shown to the reviewer). */
const ENTERED = new Set<string>(ENTERED_FIELDS.map((f) => f.key));

/**
 * Compares the values a grower entered (dry-matter basis, dry matter as fed) with those read from the
 * report. A value matches when it is within one unit of the last printed decimal (a typed value may be
 * rounded once); when the report printed only the as-fed figure, its conversion to dry matter adds the
 * rounding of both printed figures (common practice, not a published rule).
 */
export function compareWithReading(entered: Partial<Record<ReadableField, number | null>>, reading: ReportReading | null): ReadingComparison[] {
  const values = reading?.status === 'read' ? reading.values : {};
  const dmShare = values.dryMatterPct?.asFed ?? entered.dryMatterPct ?? null;
  const rows: ReadingComparison[] = [];
  for (const field of READABLE_FIELDS) {
    const typed = entered[field] ?? null;
    const got = values[field];
    if (typed === null && !got) continue;
    const { label, unit } = READABLE_FIELD_LABELS[field];
    let read: number | null = null;
    let tolerance: number | null = null;
    if (got) {
      const step = 10 ** -got.decimals;
      if (field === 'dryMatterPct') {
        read = got.asFed;
        tolerance = step;
      } else if (got.dm !== null || !PER_SAMPLE.has(field)) {
        read = got.dm ?? got.asFed;
        tolerance = step;
      } else if (got.asFed !== null && dmShare) {
        read = (got.asFed * 100) / dmShare;
        tolerance = step * (100 / dmShare) + Math.abs(read) * 0.005;
      }
    }
    const status: ReadingComparison['status'] =
      read === null ? 'not_on_report' : typed === null ? 'not_entered' : Math.abs(typed - read) <= tolerance! + 1e-9 ? 'match' : 'mismatch';
    rows.push({ field, label, unit, entered: typed, read: read === null ? null : Math.round(read * 1000) / 1000, line: got?.line ?? null, status, tolerance });
  }
  return rows;
}

/**
 * The lot form's values from a reading, to be confirmed by the grower: on the basis the report gives
 * most fully (dry matter when tied), so the grower sees the figures as printed.
 */
export function prefillFromReading(reading: ReportReading): Record<string, number | string> | null {
  if (reading.status !== 'read') return null;
  const v = reading.values;
  const typedOnBasis = [...PER_SAMPLE].filter((f) => analysisField(f).basis === 'entered');
  const count = (basis: 'asFed' | 'dm') => typedOnBasis.filter((f) => v[f]?.[basis] != null).length;
  const basis = count('dm') >= count('asFed') ? 'dm' : 'asFed';
  const out: Record<string, number | string> = { basis };
  if (v.dryMatterPct?.asFed != null) out['dryMatterPct'] = v.dryMatterPct.asFed;
  const dmShare = v.dryMatterPct?.asFed ?? null;
  for (const field of READABLE_FIELDS) {
    const got = v[field];
    if (!got || field === 'dryMatterPct' || !ENTERED.has(field)) continue;
    let value: number | null;
    if (analysisField(field).basis === 'entered') value = got[basis];
    else if (analysisField(field).basis === 'dm') {
      // Typed on dry matter whatever the basis of the rest: an as-fed figure is converted.
      value = got.dm ?? (got.asFed !== null && dmShare ? Math.round(((got.asFed * 100) / dmShare) * 1000) / 1000 : null);
    } else value = got.dm ?? got.asFed;
    if (value != null) out[field] = value;
  }
  return out;
}
