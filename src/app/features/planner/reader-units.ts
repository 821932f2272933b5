import { KG_PER_SHORT_TON, LB_PER_KG } from '@shared/units/mass';

/** The mass unit the reader typed the herd in. */
export type ReaderUnit = 'lb' | 'kg';

/** A quantity in the reader's unit, with the same quantity in the other system beside it. */
export interface TwoUnits {
  readonly value: number;
  readonly unit: string;
  readonly other: number;
  readonly otherUnit: string;
}

/** The unit of the first group: the planner answers in the unit the herd was entered in. */
export function readerUnit(groups: readonly { weightUnit: ReaderUnit }[]): ReaderUnit {
  return groups[0]?.weightUnit ?? 'lb';
}

/** Kilograms shown in the reader's unit (lb or kg), the other beside. */
export function massIn(kg: number, unit: ReaderUnit): TwoUnits {
  const lb = kg * LB_PER_KG;
  return unit === 'lb' ? { value: lb, unit: 'lb', other: kg, otherUnit: 'kg' } : { value: kg, unit: 'kg', other: lb, otherUnit: 'lb' };
}

/**
 * Short tons (2,000 lb, the hay trade's ton) shown as the reader reckons them: US tons for pound
 * users, metric tonnes (1,000 kg) for kilogram users, the other beside.
 */
export function tonnageIn(shortTons: number, unit: ReaderUnit): TwoUnits {
  const tonnes = (shortTons * KG_PER_SHORT_TON) / 1000;
  return unit === 'lb'
    ? { value: shortTons, unit: 'US tons', other: tonnes, otherUnit: 'tonnes' }
    : { value: tonnes, unit: 'tonnes', other: shortTons, otherUnit: 'US tons' };
}
