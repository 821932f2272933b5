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

/** How the review desk and the lot form name each readable field, with its unit. */
export const READABLE_FIELD_LABELS: Record<ReadableField, { label: string; unit: string }> = {
  dryMatterPct: { label: 'Dry matter', unit: '% as fed' },
  crudeProteinPct: { label: 'Crude protein (CP)', unit: '% of DM' },
  adfPct: { label: 'Acid detergent fibre (ADF)', unit: '% of DM' },
  ndfPct: { label: 'Neutral detergent fibre (NDF)', unit: '% of DM' },
  ndfd48Pct: { label: 'NDF digestibility, 48 h', unit: '% of NDF' },
  fatPct: { label: 'Crude fat', unit: '% of DM' },
  ashPct: { label: 'Ash', unit: '% of DM' },
  escPct: { label: 'ESC (simple sugars)', unit: '% of DM' },
  wscPct: { label: 'WSC (water-soluble carbohydrate)', unit: '% of DM' },
  starchPct: { label: 'Starch', unit: '% of DM' },
  calciumPct: { label: 'Calcium (Ca)', unit: '% of DM' },
  phosphorusPct: { label: 'Phosphorus (P)', unit: '% of DM' },
  potassiumPct: { label: 'Potassium (K)', unit: '% of DM' },
  magnesiumPct: { label: 'Magnesium (Mg)', unit: '% of DM' },
  reportedRfv: { label: 'RFV printed on the report', unit: 'index' },
};

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
