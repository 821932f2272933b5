import { z } from 'zod';
import { CLAIM_FIELD_ROWS, type ClaimNutrient } from '../forage/analysis-fields';

/** Nutrients a quality claim's retest is judged on (dry-matter basis, dry matter itself as fed). */
export const CLAIM_NUTRIENTS = CLAIM_FIELD_ROWS.map((f) => f.key);
export type { ClaimNutrient };

/**
 * How far a retest at another lab may sit from the listed analysis, in percentage units, before the
 * difference counts. CP, ADF and NDF: typical within-lab variation is about ±1, ±1 and ±1.4 units and
 * between labs about twice that (D. Meyer, quoted in Hay & Forage Grower, "Learn about labs",
 * hayandforage.com/mag/farming_learn_labs), so 2.0, 2.0 and 2.8. The other nutrients have no such
 * published figure to hand: their defaults are common practice.
 */
export const DEFAULT_TOLERANCES: Record<ClaimNutrient, { units: number; source: string }> = {
  crudeProteinPct: { units: 2.0, source: 'Hay & Forage Grower (Meyer): ±1 within a lab, about twice between labs' },
  adfPct: { units: 2.0, source: 'Hay & Forage Grower (Meyer): ±1 within a lab, about twice between labs' },
  ndfPct: { units: 2.8, source: 'Hay & Forage Grower (Meyer): ±1.4 within a lab, about twice between labs' },
  dryMatterPct: { units: 2.0, source: 'common practice (hay dries or takes up moisture between tests)' },
  ndfd48Pct: { units: 4.0, source: 'common practice' },
  fatPct: { units: 0.5, source: 'common practice' },
  ashPct: { units: 1.5, source: 'common practice' },
  escPct: { units: 1.5, source: 'common practice' },
  wscPct: { units: 1.5, source: 'common practice' },
  starchPct: { units: 1.0, source: 'common practice' },
  calciumPct: { units: 0.2, source: 'common practice' },
  phosphorusPct: { units: 0.05, source: 'common practice' },
};

const days = (label: string, max: number) => z.number({ error: `${label} must be a number of days.` }).int(`${label}: whole days.`).min(1, `${label}: at least 1 day.`).max(max, `${label}: at most ${max} days.`);

export const PlatformSettingsSchema = z
  .object({
    /** The platform's fee on the hay, in basis points (300 = 3 %). */
    platformFeeBps: z.number({ error: 'Platform fee must be a number.' }).int('Platform fee: whole basis points.').min(0, 'Platform fee cannot be negative.').max(2000, 'Platform fee: at most 20 %.'),
    /** Days after delivery for the buyer to accept the load; then it completes by itself. */
    acceptanceDays: days('Acceptance window', 30),
    /** Days after delivery for the buyer to report a quality problem. */
    claimDays: days('Claim window', 30),
    /** Per nutrient, percentage units a retest may differ before it counts. */
    tolerances: z.object(
      Object.fromEntries(CLAIM_NUTRIENTS.map((n) => [n, z.number({ error: `Tolerance for ${n} must be a number.` }).positive(`Tolerance for ${n} must be above 0.`).max(20, `Tolerance for ${n}: at most 20 units.`)])) as Record<ClaimNutrient, z.ZodNumber>,
    ).strict(),
  })
  .strict()
  .refine((s) => s.claimDays <= s.acceptanceDays, { message: 'The claim window cannot be longer than the acceptance window: once a load is accepted it can no longer be reported.', path: ['claimDays'] });
export type PlatformSettings = z.infer<typeof PlatformSettingsSchema>;

/**
 * The settings until an admin changes them; the one home of these figures. A 3 % fee on the hay and three
 * days to accept or report a delivered load are our own policy.
 */
export const DEFAULT_SETTINGS: PlatformSettings = {
  platformFeeBps: 300,
  acceptanceDays: 3,
  claimDays: 3,
  tolerances: Object.fromEntries(CLAIM_NUTRIENTS.map((n) => [n, DEFAULT_TOLERANCES[n].units])) as Record<ClaimNutrient, number>,
};
