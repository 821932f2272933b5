import { addDays, addMilliseconds, format, milliseconds, parseISO, startOfISOWeek } from 'date-fns';

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
