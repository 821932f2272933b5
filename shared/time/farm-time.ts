import { plusCalendarDays } from './days';
/**
 * A farm's own clock. Delivery days and pickup hours are the farm's wall-clock time in its IANA time zone
 * (recorded on the farm); they are stored as real instants and shown back in the farm's zone, to buyer and
 * grower alike, with the zone's abbreviation so nobody mistakes them for their own time.
 */

/** Time zones a US farm may choose: the IANA names in common use across the states (from memory). */
export const FARM_TIME_ZONES = [
  { id: 'America/New_York', label: 'Eastern' },
  { id: 'America/Detroit', label: 'Eastern (Michigan)' },
  { id: 'America/Indiana/Indianapolis', label: 'Eastern (Indiana)' },
  { id: 'America/Kentucky/Louisville', label: 'Eastern (Kentucky)' },
  { id: 'America/Chicago', label: 'Central' },
  { id: 'America/Denver', label: 'Mountain' },
  { id: 'America/Boise', label: 'Mountain (Idaho)' },
  { id: 'America/Phoenix', label: 'Mountain, no daylight saving (Arizona)' },
  { id: 'America/Los_Angeles', label: 'Pacific' },
  { id: 'America/Anchorage', label: 'Alaska' },
  { id: 'Pacific/Honolulu', label: 'Hawaii' },
] as const;

/** Whether `zone` is an IANA Area/Location time-zone name this runtime knows (e.g. America/Chicago). */
export function isTimeZone(zone: string): boolean {
  if (!/^[A-Za-z_]+(\/[A-Za-z0-9_+-]+){1,2}$/.test(zone)) return false;
  try {
    // An unknown name throws RangeError (ECMA-402); known links such as America/Indiana/Indianapolis pass.
    new Intl.DateTimeFormat('en-US', { timeZone: zone });
    return true;
  } catch {
    return false;
  }
}

/**
 * The zone most of a state keeps (from memory; states split between zones get their larger part). The
 * grower can choose another on the farm profile.
 */
const STATE_ZONES: Record<string, string> = {
  AL: 'America/Chicago', AK: 'America/Anchorage', AZ: 'America/Phoenix', AR: 'America/Chicago', CA: 'America/Los_Angeles',
  CO: 'America/Denver', CT: 'America/New_York', DE: 'America/New_York', DC: 'America/New_York', FL: 'America/New_York',
  GA: 'America/New_York', HI: 'Pacific/Honolulu', ID: 'America/Boise', IL: 'America/Chicago', IN: 'America/Indiana/Indianapolis',
  IA: 'America/Chicago', KS: 'America/Chicago', KY: 'America/New_York', LA: 'America/Chicago', ME: 'America/New_York',
  MD: 'America/New_York', MA: 'America/New_York', MI: 'America/Detroit', MN: 'America/Chicago', MS: 'America/Chicago',
  MO: 'America/Chicago', MT: 'America/Denver', NE: 'America/Chicago', NV: 'America/Los_Angeles', NH: 'America/New_York',
  NJ: 'America/New_York', NM: 'America/Denver', NY: 'America/New_York', NC: 'America/New_York', ND: 'America/Chicago',
  OH: 'America/New_York', OK: 'America/Chicago', OR: 'America/Los_Angeles', PA: 'America/New_York', RI: 'America/New_York',
  SC: 'America/New_York', SD: 'America/Chicago', TN: 'America/Chicago', TX: 'America/Chicago', UT: 'America/Denver',
  VT: 'America/New_York', VA: 'America/New_York', WA: 'America/Los_Angeles', WV: 'America/New_York', WI: 'America/Chicago',
  WY: 'America/Denver',
};

export function timeZoneForState(state: string): string {
  return STATE_ZONES[state.toUpperCase()] ?? 'America/Chicago';
}

interface WallClock {
  year: number;
  month: number;
  day: number;
  hour: number;
  minute: number;
}

function wallClock(instant: Date, zone: string): WallClock {
  const parts = new Intl.DateTimeFormat('en-US', { timeZone: zone, hourCycle: 'h23', year: 'numeric', month: '2-digit', day: '2-digit', hour: '2-digit', minute: '2-digit' }).formatToParts(instant);
  const get = (type: string) => Number(parts.find((p) => p.type === type)!.value);
  return { year: get('year'), month: get('month'), day: get('day'), hour: get('hour'), minute: get('minute') };
}

/** The instant when the farm's clock reads `date` (YYYY-MM-DD) at `hour`:00. */
export function farmInstant(date: string, hour: number, zone: string): Date {
  const [y, m, d] = date.split('-').map(Number) as [number, number, number];
  const asUtc = Date.UTC(y, m - 1, d, hour);
  // The zone's offset at that moment, found by reading the farm's clock at a first guess, then corrected once
  // more for a guess that lands across a daylight-saving change.
  let guess = asUtc;
  for (let i = 0; i < 2; i++) {
    const w = wallClock(new Date(guess), zone);
    guess += asUtc - Date.UTC(w.year, w.month - 1, w.day, w.hour, w.minute);
  }
  return new Date(guess);
}

/** The farm's calendar day (YYYY-MM-DD) at `instant`. */
export function farmDay(instant: Date, zone: string): string {
  const w = wallClock(instant, zone);
  return `${w.year}-${String(w.month).padStart(2, '0')}-${String(w.day).padStart(2, '0')}`;
}

/** The calendar day after `date` (YYYY-MM-DD). */
export function nextDay(date: string, days = 1): string {
  return plusCalendarDays(date, days);
}

/** "Thu, Sep 17, 2026" in the farm's zone, written the reader's way (`locale`, default US English; "jeu. 17 sept. 2026" in fr-CA). */
export function farmDateLabel(instant: Date | string, zone: string, locale = 'en-US'): string {
  return new Intl.DateTimeFormat(locale, { timeZone: zone, weekday: 'short', day: 'numeric', month: 'short', year: 'numeric' }).format(new Date(instant));
}

/** "09:00 CDT" in the farm's zone: the farm's clock, with its zone named (24-hour, in the reader's `locale`). */
export function farmTimeLabel(instant: Date | string, zone: string, locale = 'en-US'): string {
  return new Intl.DateTimeFormat(locale, { timeZone: zone, hour: '2-digit', minute: '2-digit', hourCycle: 'h23', timeZoneName: 'short' }).format(new Date(instant));
}

/** A delivery day or pickup appointment in words, in the farm's time: "Thu, Sep 17, 2026, 09:00–10:00 CDT (farm time)". */
export function farmWindowLabel(start: Date | string, end: Date | string, zone: string, method: 'delivery' | 'pickup'): string {
  const day = farmDateLabel(start, zone);
  const from = farmTimeLabel(start, zone);
  const to = farmTimeLabel(end, zone);
  return `${day}, ${from.split(' ')[0]}–${to} (farm time)${method === 'delivery' ? ', delivery day' : ''}`;
}
