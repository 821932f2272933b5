import { clockFromEnv, fixedClock, isoDayOf, systemClock } from './clock';

describe('clock', () => {
  it('a fixed clock stays put until set, and hands out copies that callers cannot move', () => {
    const clock = fixedClock('2026-09-15T12:00:00Z');
    const first = clock.now();
    first.setUTCFullYear(1999);
    expect(clock.now().toISOString()).toBe('2026-09-15T12:00:00.000Z');
    clock.set('2027-01-03T00:00:00Z');
    expect(isoDayOf(clock)).toBe('2027-01-03');
  });

  it('refuses a date-time it cannot read', () => {
    expect(() => fixedClock('next Tuesday')).toThrow(RangeError);
  });

  it('honours BALEPROOF_FIXED_NOW outside production only', () => {
    const at = '2026-03-01T08:00:00Z';
    expect(clockFromEnv({ NODE_ENV: 'development', BALEPROOF_FIXED_NOW: at }).now().toISOString()).toBe('2026-03-01T08:00:00.000Z');
    expect(clockFromEnv({ NODE_ENV: 'production', BALEPROOF_FIXED_NOW: at })).toBe(systemClock);
    expect(clockFromEnv({ NODE_ENV: 'test' })).toBe(systemClock);
  });
});
