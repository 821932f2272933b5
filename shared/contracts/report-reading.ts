/**
 * What Baleproof read from a lab report PDF's text layer when it was uploaded. Values are percent as
 * printed, on the basis of the column or section they were printed in (`asFed` and/or `dm`); `null`
 * where the report does not give that basis. The grower confirms them in the lot form; the review desk
 * shows them beside the values entered.
 */
export const READABLE_FIELDS = [
  'dryMatterPct',
  'crudeProteinPct',
  'adfPct',
  'ndfPct',
  'ndfd48Pct',
  'fatPct',
  'ashPct',
  'escPct',
  'wscPct',
  'starchPct',
  'calciumPct',
  'phosphorusPct',
  'potassiumPct',
  'magnesiumPct',
  'reportedRfv',
] as const;
export type ReadableField = (typeof READABLE_FIELDS)[number];

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
