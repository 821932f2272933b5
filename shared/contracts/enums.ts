/*
 * The value lists of a lot's closed vocabularies, each written once. The Drizzle pgEnums, the zod
 * schemas, the TypeScript types and the label tables all derive from these tuples; adding a value
 * here (plus a migration from `npm run db:generate`) is the whole change. This file imports nothing,
 * so the forage engine, the contracts and the database schema can all depend on it.
 */

/** How a forage is graded and which equations apply: legumes (alfalfa, clover), grasses, or a mix. */
export const FORAGE_CLASSES = ['legume', 'grass', 'mixed'] as const;
export type ForageClass = (typeof FORAGE_CLASSES)[number];

/** Where the hay is kept until it is sold. */
export const STORAGE_KINDS = ['barn', 'tarped', 'outside'] as const;
export type StorageKind = (typeof STORAGE_KINDS)[number];

/** Where on the bale the sampling cores were taken (or a grab sample by hand). */
export const CORE_POSITIONS = ['butt-end-centre', 'round-side', 'round-flat-end', 'bale-side', 'grab'] as const;
export type CorePosition = (typeof CORE_POSITIONS)[number];

/** How the lab analysed the sample: near-infrared spectroscopy or wet chemistry. */
export const ANALYSIS_METHODS = ['nirs', 'wet_chemistry'] as const;
export type AnalysisMethod = (typeof ANALYSIS_METHODS)[number];

/** Where a lab analysis stands with the reviewer. */
export const VERIFICATION_STATES = ['pending', 'verified', 'rejected'] as const;
export type VerificationState = (typeof VERIFICATION_STATES)[number];

/** How an order reaches the buyer: trucked by the grower, or picked up at the farm. */
export const DELIVERY_METHODS = ['delivery', 'pickup'] as const;
export type DeliveryMethod = (typeof DELIVERY_METHODS)[number];
