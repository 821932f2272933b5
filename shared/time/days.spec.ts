import { isoWeekStart, plusCalendarDays, plusDays } from './days';

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
});
