import { READABLE_FIELD_ROWS, type ReadableField } from '../forage/analysis-fields';

/**
 * What Baleproof read from a lab report PDF's text layer when it was uploaded. Values are in the field's unit
 * (percent for nutrients), on the basis of the column or section they were printed in (`asFed` and/or `dm`); `null`
 * where the report does not give that basis. The grower confirms them in the lot form; the review desk
 * shows them beside the values entered.
 */
export const READABLE_FIELDS = READABLE_FIELD_ROWS.map((f) => f.key);
export type { ReadableField };

export interface ReadValue {
  asFed: number | null;
  dm: number | null;
  /** Decimal places printed (the precision a typed value is compared at). */
  decimals: number;
  /** The report's line the value came from, for the reviewer. */
  line: string;
}

export type ReportReading =
  | {
      status: 'read';
      values: Partial<Record<ReadableField, ReadValue>>;
      /** False when the report never said which basis its numbers are on (then dry matter is assumed). */
      basisStated: boolean;
    }
  /** The PDF has no text layer (a scan or photo): nothing could be read. */
  | { status: 'no_text' }
  /** Text was found but none of it looked like analysis values. */
  | { status: 'no_values' }
  | { status: 'unreadable'; message: string };

/** How the review desk and the lot form name each readable field, with its unit (from the analysis-field table). */
export const READABLE_FIELD_LABELS = Object.fromEntries(READABLE_FIELD_ROWS.map((f) => [f.key, { label: f.label, unit: f.unit }])) as Record<ReadableField, { label: string; unit: string }>;

/** One line of the review desk's comparison: the entered value beside the value read from the PDF. */
export interface ReadingComparison {
  field: ReadableField;
  label: string;
  unit: string;
  /** As stored (dry-matter basis; dry matter itself as fed); null when the grower left it empty. */
  entered: number | null;
  /** Read from the PDF on the same basis as `entered`; null when the report does not give it. */
  read: number | null;
  /** The report's line, as printed. */
  line: string | null;
  status: 'match' | 'mismatch' | 'not_on_report' | 'not_entered';
  /** Largest difference still counted as a match (the printed precision, plus rounding of a basis change). */
  tolerance: number | null;
}
