import type { PurchasePlanResponse } from '@shared/contracts/planner';
import { KG_PER_SHORT_TON } from '@shared/units/mass';
import { massIn, type ReaderUnit, tonnageIn, type TwoUnits } from './reader-units';

/** One need of the herd over the period against what the cheapest mix supplies, as eaten (after waste). */
export interface SupplyRow {
  readonly what: 'energy' | 'protein' | 'dry-matter';
  /** Least the hay must supply (for dry matter: the forage floor). */
  readonly need: TwoUnits;
  /** For dry matter only: the most the horses can eat. */
  readonly most: TwoUnits | null;
  readonly supplied: TwoUnits;
  readonly met: boolean;
}

const mcal = (value: number): TwoUnits => ({ value, unit: 'Mcal', other: value, otherUnit: 'Mcal' });

/**
 * The plan's supply against the herd's needs in the reader's unit: energy in Mcal (as NRC 2007 gives it),
 * crude protein in lb or kg, hay dry matter in US tons or tonnes. A need counts as met within 0.2 %,
 * the solver's rounding of whole tons (the same tolerance the plan's explanation uses).
 */
export function supplyRows(response: PurchasePlanResponse, unit: ReaderUnit): SupplyRow[] {
  const period = response.herd.totals.period;
  const supplied = response.plan.supplied;
  const atLeast = (have: number, need: number) => have >= need * 0.998;
  const tons = (kg: number) => tonnageIn(kg / KG_PER_SHORT_TON, unit);
  return [
    { what: 'energy', need: mcal(period.deFromHayMcal), most: null, supplied: mcal(supplied.deMcal), met: atLeast(supplied.deMcal, period.deFromHayMcal) },
    {
      what: 'protein',
      need: massIn(period.crudeProteinFromHayKg, unit),
      most: null,
      supplied: massIn(supplied.crudeProteinKg, unit),
      met: atLeast(supplied.crudeProteinKg, period.crudeProteinFromHayKg),
    },
    {
      what: 'dry-matter',
      need: tons(period.hayDmFloorKg),
      most: tons(period.hayDmMaxKg),
      supplied: tons(supplied.dryMatterKg),
      met: atLeast(supplied.dryMatterKg, period.hayDmFloorKg) && supplied.dryMatterKg <= period.hayDmMaxKg * 1.002,
    },
  ];
}

