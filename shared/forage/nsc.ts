import type { NscFlag, NscMethod } from './forage-contract';

/*
 * Non-structural carbohydrate (NSC) for horses.
 * NSC = WSC + starch, or ESC + starch (ESC is a subset of WSC). WSC + starch is preferred
 * when both sugars are reported: it includes fructans and is the higher, safer figure.
 * Advice for laminitis-prone / insulin-dysregulated horses: hay NSC < 10–12% DM
 * (Frank 2009; Frank et al. 2010, ACVIM consensus, via Vet Record UK-hay soaking study).
 * Always judged on DM: an as-fed figure looks lower than it is.
 */

/** Strict advised limit, % DM. */
export const NSC_STRICT_LIMIT_PCT = 10;
/** Upper end of the advised range, % DM. */
export const NSC_UPPER_LIMIT_PCT = 12;

/** Sugar and starch analysis, % on one basis; absent values are null. */
export interface NscInputs {
  wscPct: number | null;
  escPct: number | null;
  starchPct: number | null;
}

/** NSC with the definition used. */
export interface NscResult {
  nscPct: number;
  method: NscMethod;
}

/** NSC (same basis as the inputs), or null unless starch and WSC or ESC are reported. */
export function nonStructuralCarbohydrate(input: NscInputs): NscResult | null {
  if (input.starchPct === null) return null;
  if (input.wscPct !== null) return { nscPct: input.wscPct + input.starchPct, method: 'wsc-plus-starch' };
  if (input.escPct !== null) return { nscPct: input.escPct + input.starchPct, method: 'esc-plus-starch' };
  return null;
}

/**
 * Flags NSC (% DM) against the advised limit: below 10 → within; 10 up to (not including) 12 →
 * above the strict limit; 12 or more → above the upper limit. "< 10–12%" is read literally, so
 * exactly 10 or 12 already fails that limit.
 */
export function nscFlag(nscPctDm: number): NscFlag {
  if (nscPctDm < NSC_STRICT_LIMIT_PCT) return 'within-advised-limit';
  if (nscPctDm < NSC_UPPER_LIMIT_PCT) return 'above-strict-limit';
  return 'above-upper-limit';
}
