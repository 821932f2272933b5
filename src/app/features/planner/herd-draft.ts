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
}

export const HORSE_CLASS_OPTIONS: { value: HorseClass; label: string }[] = [
  { value: 'maintenance', label: 'Maintenance (idle or retired)' },
  { value: 'light-work', label: 'Light work (1–3 h a week)' },
  { value: 'moderate-work', label: 'Moderate work (3–5 h a week)' },
  { value: 'heavy-work', label: 'Heavy work (4–5 h a week, some speed)' },
  { value: 'very-heavy-work', label: 'Very heavy work (racing, elite endurance)' },
  { value: 'late-gestation', label: 'Mare, late gestation (month 11)' },
  { value: 'lactation', label: 'Mare, early lactation (month 1)' },
  { value: 'growing', label: 'Growing (4–24 months)' },
];

export function newGroup(): GroupDraft {
  return { count: 1, bodyWeight: 1100, weightUnit: 'lb', class: 'maintenance', ageMonths: null };
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
    class: 'class',
    days: 'days to cover',
    hayShareOfDiet: 'hay share of the diet',
    feedingMethod: 'feeding method',
  };
  if (path[0] === 'groups' && typeof path[1] === 'number') return `Group ${path[1] + 1}${path[2] ? ', ' + (names[String(path[2])] ?? String(path[2])) : ''}`;
  return names[String(path[0])] ?? path.map(String).join('.');
}
