/**
 * Where the server gets the current time. Services take a clock instead of calling `new Date()`, so
 * tests run on a fixed date and keep passing in any year.
 */
export interface Clock {
  now(): Date;
}

export const systemClock: Clock = { now: () => new Date() };

/** A clock stopped at `at` (an ISO date-time); `set` moves it, for tests that let time pass. */
export function fixedClock(at: string | Date): Clock & { set(at: string | Date): void } {
  let current = parseInstant(at);
  return {
    now: () => new Date(current),
    set: (next) => void (current = parseInstant(next)),
  };
}

/**
 * The system clock, or a fixed one when `BALEPROOF_FIXED_NOW` is set outside production
 * (demos and end-to-end runs on a chosen date). Production always uses the real time.
 */
export function clockFromEnv(env: { NODE_ENV: string; BALEPROOF_FIXED_NOW?: string | undefined }): Clock {
  if (env.BALEPROOF_FIXED_NOW && env.NODE_ENV !== 'production') return fixedClock(env.BALEPROOF_FIXED_NOW);
  return systemClock;
}

/** The clock's date as an ISO day (UTC), e.g. for comparing with date-only columns. */
export function isoDayOf(clock: Clock): string {
  return clock.now().toISOString().slice(0, 10);
}

function parseInstant(at: string | Date): number {
  const ms = at instanceof Date ? at.getTime() : Date.parse(at);
  if (Number.isNaN(ms)) throw new RangeError(`Not a date-time: ${String(at)}`);
  return ms;
}
