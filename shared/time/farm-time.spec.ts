import { farmDateLabel, farmDay, farmInstant, farmTimeLabel, farmWindowLabel, isTimeZone, nextDay, timeZoneForState } from './farm-time';

// Offsets from the IANA tz database (US rules since 2007: daylight time from the 2nd Sunday in March to the
// 1st Sunday in November); Arizona keeps standard time all year.
describe('farm time', () => {
  it('accepts IANA zone names and refuses anything else', () => {
    expect(isTimeZone('America/Chicago')).toBe(true);
    expect(isTimeZone('America/Indiana/Indianapolis')).toBe(true);
    expect(isTimeZone('Pacific/Honolulu')).toBe(true);
    for (const bad of ['', 'Central', 'CST', 'America/Nowhere', 'America/Chicago; drop table', 'UTC+5', '../../etc']) expect(isTimeZone(bad)).toBe(false);
  });

  it('finds the instant of 9:00 farm time: CDT is UTC−5 in September, CST UTC−6 in December, Arizona UTC−7 all year', () => {
    expect(farmInstant('2026-09-17', 9, 'America/Chicago').toISOString()).toBe('2026-09-17T14:00:00.000Z');
    expect(farmInstant('2026-12-17', 9, 'America/Chicago').toISOString()).toBe('2026-12-17T15:00:00.000Z');
    expect(farmInstant('2026-09-17', 9, 'America/Phoenix').toISOString()).toBe('2026-09-17T16:00:00.000Z');
    expect(farmInstant('2026-09-17', 9, 'America/New_York').toISOString()).toBe('2026-09-17T13:00:00.000Z');
  });

  it('lands on the right hour on the days the clocks change (US rules: 8 March and 1 November 2026)', () => {
    expect(farmInstant('2026-03-08', 9, 'America/Chicago').toISOString()).toBe('2026-03-08T14:00:00.000Z');
    expect(farmInstant('2026-11-01', 9, 'America/Chicago').toISOString()).toBe('2026-11-01T15:00:00.000Z');
  });

  it('reads the farm’s calendar day: 23:30 on the 17th in Los Angeles is already the 18th in UTC', () => {
    const late = farmInstant('2026-09-17', 23, 'America/Los_Angeles');
    expect(late.toISOString().slice(0, 10)).toBe('2026-09-18');
    expect(farmDay(late, 'America/Los_Angeles')).toBe('2026-09-17');
    expect(nextDay('2026-09-30')).toBe('2026-10-01');
  });

  it('shows the farm’s clock with its zone named', () => {
    const start = farmInstant('2026-09-17', 9, 'America/Chicago');
    expect(farmTimeLabel(start, 'America/Chicago')).toBe('09:00 CDT');
    expect(farmWindowLabel(start, farmInstant('2026-09-17', 10, 'America/Chicago'), 'America/Chicago', 'pickup')).toBe('Thu, Sep 17, 2026, 09:00–10:00 CDT (farm time)');
  });

  it('defaults a farm to its state’s main zone (from memory)', () => {
    expect(timeZoneForState('KS')).toBe('America/Chicago');
    expect(timeZoneForState('az')).toBe('America/Phoenix');
    expect(isTimeZone(timeZoneForState('ZZ'))).toBe(true);
  });

  it('writes the farm’s day in the reader’s language: US English as "Thu, Sep 17, 2026" (ECMA-402 en-US, the pattern MDN shows for these options), day before month in French', () => {
    // 03:00 UTC on the 18th is still the evening of the 17th on a Central-time farm (CDT, UTC−5).
    const evening = '2026-09-18T03:00:00.000Z';
    expect(farmDateLabel(evening, 'America/Chicago')).toBe('Thu, Sep 17, 2026');
    const french = farmDateLabel(evening, 'America/Chicago', 'fr-CA');
    expect(french).toMatch(/^jeu\.? 17 sept\.? 2026$/);
    expect(farmTimeLabel(evening, 'America/Chicago', 'fr-CA')).toMatch(/^22 h 00 HAC$|^22:00 HAC$|^22 h 00 UTC−5$/);
  });
});
