import type { HorseClass } from '@shared/nutrition/horse-class';
import type { FeedingMethod } from '@shared/planner/feeding-methods';
import type { HerdNeedsRequest } from '@shared/planner/herd-needs';

/** A group of horses as the form holds it (numbers may be blank while typing). */
export interface GroupDraft {
  count: number | null;
  bodyWeight: number | null;
  weightUnit: 'lb' | 'kg';
  class: HorseClass;
  ageMonths: number | null;
  /** Month of gestation (1–11) or lactation (1–6). */
  month: number | null;
}

export const HORSE_CLASS_OPTIONS: { value: HorseClass; label: string }[] = [
  { value: 'minimum-maintenance', label: 'Maintenance, easy keeper (minimum)' },
  { value: 'maintenance', label: 'Maintenance (idle or retired)' },
  { value: 'elevated-maintenance', label: 'Maintenance, hard keeper (elevated)' },
  { value: 'light-work', label: 'Light work (1–3 h a week)' },
  { value: 'moderate-work', label: 'Moderate work (3–5 h a week)' },
  { value: 'heavy-work', label: 'Heavy work (4–5 h a week, some speed)' },
  { value: 'very-heavy-work', label: 'Very heavy work (racing, elite endurance)' },
  { value: 'gestation', label: 'Mare in foal (choose the month)' },
  { value: 'lactation', label: 'Mare nursing a foal (choose the month)' },
  { value: 'growing', label: 'Growing (4–24 months)' },
];

export function newGroup(): GroupDraft {
  return { count: 1, bodyWeight: 1100, weightUnit: 'lb', class: 'maintenance', ageMonths: null, month: null };
}

/** The shared planner's request from the form; blanks become NaN so the schema names the field. */
export function herdRequest(
  groups: readonly GroupDraft[],
  days: number | null,
  feedingMethod: FeedingMethod,
  hayPct: number | null,
): HerdNeedsRequest {
  const n = (v: number | null) => (v === null || v === undefined ? Number.NaN : Number(v));
  return {
    groups: groups.map((g) => ({
      count: n(g.count),
      bodyWeight: n(g.bodyWeight),
      weightUnit: g.weightUnit,
      class: g.class,
      ...(g.class === 'growing' ? { ageMonths: n(g.ageMonths) } : {}),
      ...(g.class === 'gestation' || g.class === 'lactation' ? { month: g.month === null || g.month === undefined ? (g.class === 'lactation' ? 1 : Number.NaN) : n(g.month) } : {}),
    })),
    days: n(days),
    feedingMethod,
    hayShareOfDiet: n(hayPct) / 100,
  };
}

/** "groups.0.bodyWeight" → "Group 1, body weight". */
export function fieldName(path: readonly PropertyKey[]): string {
  const names: Record<string, string> = {
    count: 'number of horses',
    bodyWeight: 'body weight',
    ageMonths: 'age',
    month: 'month',
    class: 'class',
    days: 'days to cover',
    hayShareOfDiet: 'hay share of the diet',
    feedingMethod: 'feeding method',
  };
  if (path[0] === 'groups' && typeof path[1] === 'number') return `Group ${path[1] + 1}${path[2] ? ', ' + (names[String(path[2])] ?? String(path[2])) : ''}`;
  return names[String(path[0])] ?? path.map(String).join('.');
}
