import type { Finding } from './forage-contract';

/*
 * Nitrate in hay. Labs report it three ways, all on a dry-matter basis: ppm nitrate-nitrogen (NO3-N), ppm nitrate
 * ion (NO3) or % nitrate ion. NO3 weighs 62.004 g/mol against N's 14.007, so 1 ppm NO3-N = 4.427 ppm NO3 and
 * % NO3 = ppm NO3-N × 0.000443 (the factor labs print; ECIR group's reading of an equine lab report).
 *
 * Caution levels (ppm NO3-N, DM; Clemson University Agricultural Service Laboratory, "Nitrate level"):
 *   < 1,000 safe under all conditions · 1,000–1,500 safe for non-pregnant animals · 1,500–2,000 limit to half the
 *   ration · 2,000–3,500 limit to 35–40 %, not for pregnant animals · 3,500–4,000 limit to 25 % · > 4,000 potentially toxic.
 * Those are livestock (mostly ruminant) levels. Horses ferment in the hindgut and are more tolerant: they are reported
 * to eat hay of 1–1.5 % nitrate safely (Oklahoma State Equine Extension, 2024), and a lab's practical upper limit for
 * horses is 1.5 % nitrate = 3,450 ppm NO3-N (Dairy One, as quoted on the ECIR group).
 */

export const NITRATE_UNITS = ['pct-no3', 'ppm-no3', 'ppm-no3-n'] as const;
export type NitrateUnit = (typeof NITRATE_UNITS)[number];

/** ppm NO3 per ppm NO3-N: molar mass of nitrate over nitrogen (62.004 / 14.007). */
const NO3_PER_NO3_N = 62.004 / 14.007;

/** Nitrate as % NO3 of dry matter, from a lab value in any of the usual units. */
export function nitratePctNo3(value: number, unit: NitrateUnit): number {
  switch (unit) {
    case 'pct-no3':
      return value;
    case 'ppm-no3':
      return value / 10_000;
    case 'ppm-no3-n':
      return (value * NO3_PER_NO3_N) / 10_000;
  }
}

/** ppm NO3-N from % NO3 (DM), to read a value against the livestock table. */
export function nitrateNPpm(pctNo3: number): number {
  return (pctNo3 * 10_000) / NO3_PER_NO3_N;
}

/** Livestock caution levels, ppm NO3-N on DM (Clemson); the horse limit, % NO3 on DM (Dairy One; OSU 2024). */
export const NITRATE_LEVELS = { safeForAllPpmN: 1000, potentiallyToxicPpmN: 4000, horseUpperLimitPctNo3: 1.5 } as const;

const VET = 'Ask your veterinarian or an equine nutritionist before feeding it, especially to pregnant mares.';

/** Findings for a nitrate result (% NO3 of DM). */
export function nitrateFindings(pctNo3: number | null): Finding[] {
  if (pctNo3 === null) return [];
  const ppmN = nitrateNPpm(pctNo3);
  const reading = `Nitrate ${pctNo3.toFixed(2)}% of dry matter (${Math.round(ppmN).toLocaleString('en-US')} ppm nitrate-N)`;
  if (pctNo3 >= NITRATE_LEVELS.horseUpperLimitPctNo3) {
    return [{ severity: 'warning', code: 'nitrate-above-horse-limit', message: `${reading} is at or above the ~1.5% practical upper limit for horses: do not feed it without professional advice. ${VET}` }];
  }
  if (ppmN > NITRATE_LEVELS.safeForAllPpmN) {
    return [{ severity: 'info', code: 'nitrate-above-livestock-safe', message: `${reading} is above the 1,000 ppm nitrate-N considered safe for all livestock; horses are more tolerant (up to about 1–1.5% nitrate), but mix it with low-nitrate hay for pregnant mares. ${VET}` }];
  }
  return [{ severity: 'info', code: 'nitrate-low', message: `${reading} is below the 1,000 ppm nitrate-N considered safe for all livestock under all conditions.` }];
}

/**
 * Whether to prompt for a nitrate test: small-grain (oat, wheat, barley) and sorghum-type hays, and any hay
 * grown in drought or after heavy nitrogen fertiliser (Oklahoma State 2024; NC State Extension "Nitrates 101";
 * Cash et al., Montana State). Oat is the small grain among our forage types.
 */
export function nitrateTestAdvised(input: { forageType: string; drought?: boolean; heavyNitrogen?: boolean }): boolean {
  return NITRATE_PRONE_FORAGE_TYPES.has(input.forageType) || input.drought === true || input.heavyNitrogen === true;
}

// Forage-type ids as in shared/contracts FORAGE_TYPES (plain strings: the contracts import this engine).
const NITRATE_PRONE_FORAGE_TYPES = new Set(['oat', 'wheat', 'barley', 'triticale', 'rye', 'sudangrass', 'sorghum_sudangrass', 'forage_sorghum']);

/** The prompt shown to growers and buyers of hay that tends to carry nitrate. */
export const NITRATE_TEST_PROMPT =
  'Small-grain (oat, wheat, barley) and sorghum-type hays, and hay grown in drought or after heavy nitrogen fertiliser, can carry nitrate: test it before feeding.';
