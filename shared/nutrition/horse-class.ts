import { z } from 'zod';

/**
 * NRC (2007) classes of horse that Baleproof plans for.
 *
 * - Work classes follow NRC 2007 workload definitions (light ≈ 1–3 h/week, moderate ≈ 3–5 h/week;
 *   Smarsh, Penn State Ext. 2022, domain brief §6).
 * - `late-gestation` is month 11 of pregnancy, the most demanding month.
 * - `lactation` is month 1 of lactation, the most demanding month.
 * - `growing` is a weaned horse 4–24 months old; it needs `ageMonths`.
 */
export const HORSE_CLASSES = [
  'maintenance',
  'light-work',
  'moderate-work',
  'heavy-work',
  'very-heavy-work',
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
