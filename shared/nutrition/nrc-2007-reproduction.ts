/**
 * NRC (2007) Nutrient Requirements of Horses — daily requirements of broodmares by month, as the
 * 500 kg mature-weight rows (Table 16-3), scaled by body weight (every NRC 2007 term for mares is
 * proportional to BW: conceptus growth from a birth weight that is a share of the mare's BW, milk yield
 * as a share of BW).
 *
 * Each value says where it comes from:
 * - `table`: the NRC 2007 figure as printed in a published secondary source named beside it;
 * - `memory`: our recollection of the table, not re-checked;
 * - `estimate`: our own calculation, explained beside it (not a table value).
 *
 * Sources: Thunes, Summit Equine Nutrition, "Feeding the 3rd trimester mare" (DE by month of gestation,
 * 500 kg, from NRC 2007); a broodmare-protein forum post quoting the NRC 2007 1,100 lb rows (CP by month of
 * gestation, lactation months 1 and 6); Kellon (2008, endurance.net archive) for a 400 kg mare: CP 432 g open
 * (minimum maintenance), 583 g at month 7, 714 g at month 11, 1,228 g in lactation; Ca 16 / 22.4 / 28.8 g and
 * P 11.2 / 16 / 21 / 30.6 g — which, ×500/400, are the 500 kg rows below for months 7 and 11 and lactation P.
 */

export type Provenance = 'table' | 'memory' | 'estimate';

/** One value and where it comes from. */
export interface Sourced {
  readonly value: number;
  readonly from: Provenance;
}

/** A 500 kg mare's daily needs in one month. */
export interface MareMonthRow {
  /** Digestible energy, Mcal/day. */
  readonly deMcal: Sourced;
  /** Crude protein, g/day. */
  readonly crudeProteinG: Sourced;
  /** Calcium, g/day. */
  readonly calciumG: Sourced;
  /** Phosphorus, g/day. */
  readonly phosphorusG: Sourced;
}

/** Mature body weight the rows are printed for, kg. */
export const TABLE_BODY_WEIGHT_KG = 500;

const t = (value: number): Sourced => ({ value, from: 'table' });
const m = (value: number): Sourced => ({ value, from: 'memory' });
const e = (value: number): Sourced => ({ value, from: 'estimate' });

/**
 * Gestation months 5–11. Months 1–4 are fed as average maintenance (NRC 2007, per Thunes), so they are
 * not listed: `gestationRow` returns null for them.
 * DE: table (Thunes). CP: table (forum quote of NRC 2007; months 7 and 11 agree with Kellon's 400 kg figures).
 * Ca/P: months 7 and 11 table (Kellon, scaled); months 5–6 equal maintenance, 8 as 7, 9–10 as 11: memory.
 */
export const GESTATION_500KG: Readonly<Record<number, MareMonthRow>> = {
  5: { deMcal: t(17.1), crudeProteinG: t(685), calciumG: m(20.0), phosphorusG: m(14.0) },
  6: { deMcal: t(17.4), crudeProteinG: t(704), calciumG: m(20.0), phosphorusG: m(14.0) },
  7: { deMcal: t(17.9), crudeProteinG: t(729), calciumG: t(28.0), phosphorusG: t(20.0) },
  8: { deMcal: t(18.5), crudeProteinG: t(759), calciumG: m(28.0), phosphorusG: m(20.0) },
  9: { deMcal: t(19.2), crudeProteinG: t(797), calciumG: m(36.0), phosphorusG: m(26.3) },
  10: { deMcal: t(20.2), crudeProteinG: t(841), calciumG: m(36.0), phosphorusG: m(26.3) },
  11: { deMcal: t(21.4), crudeProteinG: t(893), calciumG: t(36.0), phosphorusG: t(26.3) },
};

/**
 * Lactation months 1–6.
 * DE: memory (31.7 / 31.7 / 30.6 / 29.4 / 28.3 / 27.2 Mcal). CP: months 1 and 6 table (forum quote; month 1
 * also Kellon 1,228 g × 500/400 = 1,535 g), months 2–5 memory. Month 1 Ca 59.1 g memory (Kellon's 67.8 g
 * at 400 kg disagrees; we keep the lower NRC figure we recall), P 38.3 g table (Kellon 30.6 × 500/400).
 * Months 2–6 Ca/P: estimate — the month-1 output above maintenance (Ca 20 g, P 14 g) scaled by that month's
 * CP above maintenance (630 g), i.e. by milk yield at a constant milk composition; milk is leaner in
 * minerals later in lactation, so these err on the generous side.
 */
export const LACTATION_500KG: Readonly<Record<number, MareMonthRow>> = {
  1: { deMcal: m(31.7), crudeProteinG: t(1535), calciumG: m(59.1), phosphorusG: t(38.3) },
  2: { deMcal: m(31.7), crudeProteinG: m(1528), calciumG: e(58.8), phosphorusG: e(38.1) },
  3: { deMcal: m(30.6), crudeProteinG: m(1468), calciumG: e(56.2), phosphorusG: e(36.5) },
  4: { deMcal: m(29.4), crudeProteinG: m(1405), calciumG: e(53.5), phosphorusG: e(34.8) },
  5: { deMcal: m(28.3), crudeProteinG: m(1340), calciumG: e(50.7), phosphorusG: e(33.1) },
  6: { deMcal: m(27.2), crudeProteinG: t(1265), calciumG: e(47.4), phosphorusG: e(31.1) },
};

export const GESTATION_MONTHS = { min: 1, max: 11, firstAboveMaintenance: 5 } as const;
export const LACTATION_MONTHS = { min: 1, max: 6 } as const;

/** The 500 kg row for a month of gestation, or null in months 1–4 (fed as average maintenance). */
export function gestationRow(month: number): MareMonthRow | null {
  return GESTATION_500KG[month] ?? null;
}

/** The 500 kg row for a month of lactation (1–6). */
export function lactationRow(month: number): MareMonthRow {
  const row = LACTATION_500KG[month];
  if (row === undefined) throw new RangeError(`lactation month must be ${LACTATION_MONTHS.min}–${LACTATION_MONTHS.max}; got ${month}`);
  return row;
}

/** "table", "memory" or "estimate" for each figure of a row, in words for `source`. */
export function describeProvenance(row: MareMonthRow): string {
  return `DE ${row.deMcal.value} Mcal (${row.deMcal.from}), CP ${row.crudeProteinG.value} g (${row.crudeProteinG.from}), Ca ${row.calciumG.value} g (${row.calciumG.from}), P ${row.phosphorusG.value} g (${row.phosphorusG.from})`;
}
