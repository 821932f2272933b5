import type { HerdNeedsPlan } from '@shared/planner/herd-needs';
import { KG_PER_SHORT_TON } from '@shared/units/mass';
import { massIn, type ReaderUnit, tonnageIn, type TwoUnits } from './reader-units';

/** One line of the herd table: needs a day for the whole group, masses in the reader's unit. */
export interface HerdRow {
  readonly label: string;
  readonly bodyWeight: TwoUnits;
  readonly deMcal: number;
  readonly crudeProteinG: number;
  readonly dryMatterIntake: TwoUnits;
  readonly hayDryMatter: TwoUnits;
  /** Hay as-fed a day, when a lot (and so its dry matter) is chosen. */
  readonly hayAsFed: TwoUnits | null;
}

/** The period's hay: dry matter eaten, and with a lot the as-fed tons eaten and bought. */
export interface PeriodRow {
  /** Eaten by the horses, or bought: eaten plus the feeding method's waste. */
  readonly kind: 'eaten' | 'bought';
  readonly dryMatter: TwoUnits;
  readonly asFed: TwoUnits | null;
  readonly bales: number | null;
}

export interface HerdTables {
  readonly unit: ReaderUnit;
  readonly groups: readonly HerdRow[];
  readonly total: Omit<HerdRow, 'bodyWeight'>;
  readonly period: readonly PeriodRow[];
}

/**
 * The herd planner's answer as tables in the reader's unit. Nutrient needs stay in the units NRC (2007)
 * tabulates them in (Mcal of DE, g of crude protein); masses of horse and hay follow the reader.
 */
export function herdTables(plan: HerdNeedsPlan, unit: ReaderUnit, classLabel: (value: string) => string, dryMatterPct: number | null): HerdTables {
  const asFed = (dmKg: number) => (dryMatterPct ? massIn(dmKg / (dryMatterPct / 100), unit) : null);
  const groups = plan.groups.map((g) => ({
    label: `${g.count} × ${classLabel(g.class)}`,
    bodyWeight: massIn(g.bodyWeightKg, unit),
    deMcal: g.deMcalPerDay,
    crudeProteinG: g.crudeProteinGPerDay,
    dryMatterIntake: massIn(g.dmiKgPerDay, unit),
    hayDryMatter: massIn(g.hayDmKgPerDay, unit),
    hayAsFed: asFed(g.hayDmKgPerDay),
  }));
  const t = plan.totals;
  const total = {
    label: 'Herd, per day',
    deMcal: t.deMcalPerDay,
    crudeProteinG: t.crudeProteinGPerDay,
    dryMatterIntake: massIn(t.dmiKgPerDay, unit),
    hayDryMatter: massIn(t.hayDmKgPerDay, unit),
    hayAsFed: asFed(t.hayDmKgPerDay),
  };
  const dmTons = t.period.hayDmKg / KG_PER_SHORT_TON;
  const lot = plan.lot;
  const period: PeriodRow[] = [{ kind: 'eaten', dryMatter: tonnageIn(dmTons, unit), asFed: lot ? tonnageIn(lot.eatenTons, unit) : null, bales: null }];
  if (lot) {
    const boughtDmTons = dmTons / (1 - plan.waste.wasteFraction);
    period.push({ kind: 'bought', dryMatter: tonnageIn(boughtDmTons, unit), asFed: tonnageIn(lot.purchaseTons, unit), bales: lot.bales });
  }
  return { unit, groups, total, period };
}
