/**
 * The one table of lab-analysis fields. Everything that lists analysis values reads it: the CSV
 * template and its reader, lab-report PDF reading and the review desk's comparison, the lot form's
 * analysis step, the lot page and the compare sheet, the engine's basis list, the claim nutrients and
 * the database mapping (a stored field's key is its `lab_analyses` column).
 *
 * `basis` says how a figure relates to the sample:
 * - `entered`: a share of the sample, typed on the basis the grower picks and stored on dry matter;
 * - `dm`: always a share of dry matter, whatever the basis of the rest (labs print nitrate so);
 * - `as-fed`: a share of the sample as fed (dry matter itself, moisture);
 * - `none`: not a share of the sample (NDFD is % of NDF, RFV an index, counts and toxins as the lab prints them).
 *
 * `where` says who uses a field: `entry` (lot form and CSV), `stored` (a `lab_analyses` column),
 * `report` (read from a lab report PDF), `claim` (judged when a buyer's retest is compared).
 */
export interface AnalysisField {
  key: string;
  /** Full name, with the trade's abbreviation. */
  label: string;
  /** Name in tight places (form fields, the compare sheet). */
  short: string;
  /** Unit as stored and shown to buyers. */
  unit: string;
  required: boolean;
  basis: 'entered' | 'dm' | 'as-fed' | 'none';
  /** Field name in the CSV template. */
  csvColumn: string;
  /** Decimals shown (and the precision a lab usually prints). */
  precision: number;
  group: 'nutrient' | 'check' | 'safety';
  where: readonly ('entry' | 'stored' | 'report' | 'claim')[];
}

const ALL = ['entry', 'stored', 'report', 'claim'] as const;

export const ANALYSIS_FIELDS = [
  { key: 'dryMatterPct', label: 'Dry matter', short: 'Dry matter (DM)', unit: '% as fed', required: true, basis: 'as-fed', csvColumn: 'dryMatterPct', precision: 1, group: 'nutrient', where: ALL },
  { key: 'crudeProteinPct', label: 'Crude protein (CP)', short: 'Crude protein (CP)', unit: '% of DM', required: true, basis: 'entered', csvColumn: 'crudeProteinPct', precision: 1, group: 'nutrient', where: ALL },
  { key: 'adfPct', label: 'Acid detergent fibre (ADF)', short: 'ADF', unit: '% of DM', required: true, basis: 'entered', csvColumn: 'adfPct', precision: 1, group: 'nutrient', where: ALL },
  { key: 'ndfPct', label: 'Neutral detergent fibre (NDF)', short: 'NDF', unit: '% of DM', required: true, basis: 'entered', csvColumn: 'ndfPct', precision: 1, group: 'nutrient', where: ALL },
  { key: 'ndfd48Pct', label: 'NDF digestibility, 48 h', short: 'NDFD 48 h (% of NDF)', unit: '% of NDF', required: false, basis: 'none', csvColumn: 'ndfd48Pct', precision: 1, group: 'nutrient', where: ALL },
  { key: 'fatPct', label: 'Crude fat (EE)', short: 'Crude fat (EE)', unit: '% of DM', required: false, basis: 'entered', csvColumn: 'fatPct', precision: 1, group: 'nutrient', where: ALL },
  { key: 'ashPct', label: 'Ash', short: 'Ash', unit: '% of DM', required: false, basis: 'entered', csvColumn: 'ashPct', precision: 1, group: 'nutrient', where: ALL },
  { key: 'escPct', label: 'Ethanol-soluble carbohydrate (ESC)', short: 'ESC (sugars)', unit: '% of DM', required: false, basis: 'entered', csvColumn: 'escPct', precision: 1, group: 'nutrient', where: ALL },
  { key: 'wscPct', label: 'Water-soluble carbohydrate (WSC)', short: 'WSC (sugars + fructans)', unit: '% of DM', required: false, basis: 'entered', csvColumn: 'wscPct', precision: 1, group: 'nutrient', where: ALL },
  { key: 'starchPct', label: 'Starch', short: 'Starch', unit: '% of DM', required: false, basis: 'entered', csvColumn: 'starchPct', precision: 1, group: 'nutrient', where: ALL },
  { key: 'calciumPct', label: 'Calcium (Ca)', short: 'Calcium', unit: '% of DM', required: false, basis: 'entered', csvColumn: 'calciumPct', precision: 2, group: 'nutrient', where: ALL },
  { key: 'phosphorusPct', label: 'Phosphorus (P)', short: 'Phosphorus', unit: '% of DM', required: false, basis: 'entered', csvColumn: 'phosphorusPct', precision: 2, group: 'nutrient', where: ALL },
  { key: 'potassiumPct', label: 'Potassium (K)', short: 'Potassium', unit: '% of DM', required: false, basis: 'entered', csvColumn: 'potassiumPct', precision: 2, group: 'nutrient', where: ['report'] },
  { key: 'magnesiumPct', label: 'Magnesium (Mg)', short: 'Magnesium', unit: '% of DM', required: false, basis: 'entered', csvColumn: 'magnesiumPct', precision: 2, group: 'nutrient', where: ['report'] },
  { key: 'moisturePct', label: 'Moisture', short: 'Moisture (checks DM)', unit: '% as fed', required: false, basis: 'as-fed', csvColumn: 'moisturePct', precision: 1, group: 'check', where: ['entry'] },
  { key: 'reportedRfv', label: 'RFV printed on the report', short: 'RFV printed on report', unit: 'index', required: false, basis: 'none', csvColumn: 'reportedRfv', precision: 0, group: 'check', where: ['entry', 'stored', 'report'] },
  { key: 'nitrateNo3PctDm', label: 'Nitrate (NO3)', short: 'Nitrate, % of DM (ppm nitrate-N × 0.000443)', unit: '% of DM', required: false, basis: 'dm', csvColumn: 'nitrateNo3PctDm', precision: 2, group: 'safety', where: ['entry', 'stored', 'report'] },
  { key: 'mouldCfuPerG', label: 'Mould count', short: 'Mould count', unit: 'CFU/g', required: false, basis: 'none', csvColumn: 'mouldCfuPerG', precision: 0, group: 'safety', where: ['entry', 'stored', 'report'] },
  { key: 'aflatoxinPpb', label: 'Aflatoxin', short: 'Aflatoxin', unit: 'ppb', required: false, basis: 'none', csvColumn: 'aflatoxinPpb', precision: 1, group: 'safety', where: ['entry', 'stored', 'report'] },
  { key: 'donPpm', label: 'DON (vomitoxin)', short: 'DON (vomitoxin)', unit: 'ppm', required: false, basis: 'none', csvColumn: 'donPpm', precision: 2, group: 'safety', where: ['entry', 'stored', 'report'] },
  { key: 'fumonisinPpm', label: 'Fumonisin', short: 'Fumonisin', unit: 'ppm', required: false, basis: 'none', csvColumn: 'fumonisinPpm', precision: 2, group: 'safety', where: ['entry', 'stored', 'report'] },
] as const satisfies readonly AnalysisField[];

type Row = (typeof ANALYSIS_FIELDS)[number];
type Use = AnalysisField['where'][number];
type RowUsedIn<U extends Use> = Row extends infer R ? (R extends { where: readonly (infer W)[] } ? (U extends W ? R : never) : never) : never;

export type AnalysisFieldKey = Row['key'];
/** Fields typed by the grower (lot form, CSV template). */
export type EnteredField = RowUsedIn<'entry'>['key'];
/** Fields kept in a `lab_analyses` column of the same name. */
export type StoredField = RowUsedIn<'stored'>['key'];
/** Fields read from a lab report PDF. */
export type ReadableField = RowUsedIn<'report'>['key'];
/** Fields a buyer's retest is judged on. */
export type ClaimNutrient = RowUsedIn<'claim'>['key'];
export type BasisDependentField = Extract<RowUsedIn<'entry'>, { basis: 'entered' }>['key'];

const usedIn = <U extends Use>(use: U) => ANALYSIS_FIELDS.filter((f): f is Extract<Row, RowUsedIn<U>> => (f.where as readonly Use[]).includes(use));

export const ENTERED_FIELDS = usedIn('entry');
export const STORED_FIELDS = usedIn('stored');
export const READABLE_FIELD_ROWS = usedIn('report');
export const CLAIM_FIELD_ROWS = usedIn('claim');

/** Typed lab fields that are a share of the sample, so they change with the basis (DM ↔ as-fed). */
export const BASIS_DEPENDENT_FIELDS = ENTERED_FIELDS.filter((f): f is Extract<Row, { key: BasisDependentField }> => f.basis === 'entered').map((f) => f.key);

const BY_KEY = new Map<string, Row>(ANALYSIS_FIELDS.map((f) => [f.key, f]));
export function analysisField<K extends AnalysisFieldKey>(key: K): Extract<Row, { key: K }> {
  return BY_KEY.get(key) as Extract<Row, { key: K }>;
}

/** True for a figure that is a share of the sample, so a report's as-fed and DM columns differ by the DM share. */
export const isShareOfSample = (f: Pick<AnalysisField, 'basis'>) => f.basis === 'entered' || f.basis === 'dm';

/** The unit beside an input: a basis-dependent figure is "%" on whichever basis was chosen. */
export const entryUnit = (f: Pick<AnalysisField, 'basis' | 'unit'>) => (f.basis === 'entered' ? '%' : f.unit);

/** The named fields of a row (a stored analysis, a view): the mapping between the table and a `lab_analyses` row. */
export function pickFields<T extends object, K extends keyof T>(row: T, keys: readonly K[]): Pick<T, K> {
  return Object.fromEntries(keys.map((k) => [k, row[k]])) as Pick<T, K>;
}

/** Keys of the stored fields (the `lab_analyses` value columns), in table order. */
export const STORED_KEYS = STORED_FIELDS.map((f) => f.key);
/** Stored fields a lab may leave out (null in the row, absent from an engine request). */
export const OPTIONAL_STORED_KEYS = STORED_FIELDS.filter((f): f is Extract<(typeof STORED_FIELDS)[number], { required: false }> => !f.required).map((f) => f.key);
