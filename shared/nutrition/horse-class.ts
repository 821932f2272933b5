import { z } from 'zod';

/**
 * NRC (2007) classes of horse that Baleproof plans for.
 *
 * - Work classes follow NRC 2007 workload definitions (light ≈ 1–3 h/week, moderate ≈ 3–5 h/week;
 *   Smarsh, Penn State Ext. 2022, domain brief §6).
 * - `minimum-maintenance` / `maintenance` / `elevated-maintenance`: NRC 2007's three maintenance levels
 *   (easy keepers and sedentary horses; the average horse; nervous or hard keepers).
 * - `gestation` is a pregnant mare in `month` 1–11 (months 1–4 are fed as maintenance).
 * - `late-gestation` is month 11 of pregnancy, the most demanding month (same as `gestation` month 11).
 * - `lactation` is a nursing mare in `month` 1–6 (default 1, the most demanding month).
 * - `growing` is a weaned horse 4–24 months old; it needs `ageMonths`.
 */
export const HORSE_CLASSES = [
  'minimum-maintenance',
  'maintenance',
  'elevated-maintenance',
  'light-work',
  'moderate-work',
  'heavy-work',
  'very-heavy-work',
  'gestation',
  'late-gestation',
  'lactation',
  'growing',
] as const;

export type HorseClass = (typeof HORSE_CLASSES)[number];

export const HorseClassSchema = z.enum(HORSE_CLASSES, {
  error: `class must be one of: ${HORSE_CLASSES.join(', ')}`,
});

/** Classes for mature horses, whose requirements scale with body weight alone. */
export type MatureHorseClass = Exclude<HorseClass, 'growing'>;

/** Mature classes whose needs do not change month by month. */
export type SteadyHorseClass = Exclude<MatureHorseClass, 'gestation' | 'late-gestation' | 'lactation'>;

/** Classes that take a `month` (of gestation or lactation). */
export const MONTHLY_CLASSES = ['gestation', 'lactation'] as const;
