import { calendarDaysBetween, hoursBetween, instantSpan, isoWeekStart, plusCalendarDays, plusDays, utcDateOf } from './days';

describe('day arithmetic', () => {
  it('moves calendar dates across month ends, leap days and the US spring-forward Sunday', () => {
    // Gregorian calendar: 2028 is a leap year (divisible by 4, not by 100), 2027 is not.
    expect(plusCalendarDays('2028-02-28', 1)).toBe('2028-02-29');
    expect(plusCalendarDays('2027-02-28', 1)).toBe('2027-03-01');
    expect(plusCalendarDays('2027-01-01', -1)).toBe('2026-12-31');
    // US daylight saving time starts on the second Sunday of March (Energy Policy Act of 2005): 8 March 2026.
    expect(plusCalendarDays('2026-03-07', 1)).toBe('2026-03-08');
    expect(plusCalendarDays('2026-03-08', 1)).toBe('2026-03-09');
    expect(plusCalendarDays('2026-03-01', 14)).toBe('2026-03-15');
  });

  it('moves an instant by whole 24-hour days, also across a daylight-saving change', () => {
    const at = new Date('2026-03-07T15:30:00Z');
    expect(plusDays(at, 3).toISOString()).toBe('2026-03-10T15:30:00.000Z');
    expect(plusDays(at, -84).toISOString()).toBe('2025-12-13T15:30:00.000Z');
  });

  it('finds the Monday of the UTC week (ISO 8601 weeks start on Monday)', () => {
    // 17 September 2026 is a Thursday; 20 September a Sunday, the last day of that ISO week.
    expect(isoWeekStart(new Date('2026-09-17T23:59:00Z'))).toBe('2026-09-14');
    expect(isoWeekStart(new Date('2026-09-20T00:30:00Z'))).toBe('2026-09-14');
    expect(isoWeekStart(new Date('2026-09-21T00:00:00Z'))).toBe('2026-09-21');
  });

  it('counts calendar days between dates or date-times, each on its UTC day', () => {
    // Gregorian calendar: 2028 has 29 February, so 1 Feb → 1 Mar is 29 days; 2027 has 28.
    expect(calendarDaysBetween('2028-02-01', '2028-03-01')).toBe(29);
    expect(calendarDaysBetween('2027-02-01', '2027-03-01')).toBe(28);
    // Across the US spring-forward Sunday (8 March 2026) a calendar day is still one day.
    expect(calendarDaysBetween('2026-03-07', '2026-03-09')).toBe(2);
    // 23:30 UTC on 10 June is still 10 June; 00:10 UTC on 11 June is the next day.
    expect(calendarDaysBetween('2026-06-10', '2026-06-10T23:30:00Z')).toBe(0);
    expect(calendarDaysBetween('2026-06-10', '2026-06-11T00:10:00Z')).toBe(1);
    expect(calendarDaysBetween('2026-06-11', '2026-06-10')).toBe(-1);
    expect(utcDateOf('2026-06-10T20:00:00-05:00')).toBe('2026-06-11');
  });

  it('spans a date alone over its whole UTC day and a date-time over one instant', () => {
    const day = instantSpan('2026-06-10');
    expect(day.start.toISOString()).toBe('2026-06-10T00:00:00.000Z');
    expect(day.end.toISOString()).toBe('2026-06-11T00:00:00.000Z');
    expect(instantSpan('2026-06-10T08:00:00Z').end.toISOString()).toBe('2026-06-10T08:00:00.000Z');
    expect(Number.isNaN(instantSpan('next Tuesday').start.getTime())).toBe(true);
    expect(hoursBetween(day.start, new Date('2026-06-12T00:30:00Z'))).toBe(48.5);
  });
});
