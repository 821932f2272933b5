/**
 * Grade names, best first. Kept apart from the zod contract so pages that only show grades (lot cards,
 * the grade scale) do not pull the schema library into the browser's first load.
 */

/** USDA AMS alfalfa grade names (best first). */
export const USDA_ALFALFA_GRADES = ['Supreme', 'Premium', 'Good', 'Fair', 'Utility'] as const;
/** USDA AMS grass grade names (best first). */
export const USDA_GRASS_GRADES = ['Premium', 'Good', 'Fair', 'Low'] as const;
/** AFGC legume grade names (best first). */
export const AFGC_GRADES = ['Prime', 'Grade 1', 'Grade 2', 'Grade 3', 'Grade 4', 'Grade 5'] as const;
