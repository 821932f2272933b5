import { addDays, addMilliseconds, differenceInCalendarDays, differenceInMilliseconds, format, milliseconds, parseISO, startOfISOWeek } from 'date-fns';

/*
 * Day arithmetic through date-fns, in one place. Calendar dates (YYYY-MM-DD) are parsed and formatted in the
 * same zone, so a daylight-saving change never moves a date; instants move by whole 24-hour days.
 */

/** `date` (YYYY-MM-DD) moved by whole calendar days (negative for earlier). */
export function plusCalendarDays(date: string, days: number): string {
  return format(addDays(parseISO(date), days), 'yyyy-MM-dd');
}

/** An instant `days` × 24 hours later (earlier when negative): a window of N days from a moment. */
export function plusDays(instant: Date, days: number): Date {
  return addMilliseconds(instant, milliseconds({ days }));
}

/** Monday (the ISO week's first day) of the UTC calendar week holding `instant`, as YYYY-MM-DD. */
export function isoWeekStart(instant: Date): string {
  return format(startOfISOWeek(parseISO(instant.toISOString().slice(0, 10))), 'yyyy-MM-dd');
}

const DATE_ONLY = /^\d{4}-\d{2}-\d{2}$/;

/** The UTC calendar date (YYYY-MM-DD) of an ISO date, which stays as it is, or of an ISO date-time. */
export function utcDateOf(iso: string): string {
  return DATE_ONLY.test(iso) ? iso : new Date(iso).toISOString().slice(0, 10);
}

/** Whole calendar days from `from` to `to` (ISO dates or date-times, each on its UTC day); negative when `to` is earlier. */
export function calendarDaysBetween(from: string, to: string): number {
  return differenceInCalendarDays(parseISO(utcDateOf(to)), parseISO(utcDateOf(from)));
}

/**
 * The instants an ISO date or date-time covers: a date alone is its whole UTC day (from its midnight to the
 * next); a date-time is one instant. Invalid dates give invalid `Date`s (check with `isNaN(start.getTime())`).
 */
export function instantSpan(iso: string): { start: Date; end: Date } {
  if (!DATE_ONLY.test(iso)) {
    const at = new Date(iso);
    return { start: at, end: at };
  }
  const start = new Date(`${iso}T00:00:00Z`);
  return { start, end: plusDays(start, 1) };
}

/** Hours (with fractions) from `start` to `end`. */
export function hoursBetween(start: Date, end: Date): number {
  return differenceInMilliseconds(end, start) / milliseconds({ hours: 1 });
}
