import { addDays, differenceInCalendarDays, parseISO } from 'date-fns';
import type { WindowRequest } from '@shared/contracts/orders';
import { farmDay, farmInstant } from '@shared/time/farm-time';
import type { farms } from '../../db/schema';
import { HttpError } from '../../middleware/http-error';
import type { DeliveryMethod } from '@shared/contracts/enums';

/** How far ahead a buyer may book: from tomorrow up to this many days. */
export const BOOKING_HORIZON_DAYS = 60;

const bad = (message: string, path = 'window.date') => new HttpError(400, 'bad_window', message, [{ path, message }]);

/**
 * The window for a delivery day or a pickup appointment, checked against the grower's calendar. Days and
 * hours are the farm's wall-clock time in its recorded zone, stored as the real instants.
 */
export function windowFor(farm: typeof farms.$inferSelect, method: DeliveryMethod, request: WindowRequest, now: Date): { start: Date; end: Date } {
  const day = parseISO(`${request.date}T00:00:00Z`);
  if (Number.isNaN(day.getTime()) || day.toISOString().slice(0, 10) !== request.date) throw bad('That date does not exist.');
  // "From tomorrow" on the farm's calendar, not the server's.
  const ahead = differenceInCalendarDays(day, parseISO(farmDay(now, farm.timeZone) + 'T00:00:00Z'));
  if (ahead < 1) throw bad('Choose a day from tomorrow on.');
  if (ahead > BOOKING_HORIZON_DAYS) throw bad(`Choose a day within the next ${BOOKING_HORIZON_DAYS} days.`);
  if (method === 'delivery') {
    if (!farm.deliveryWeekdays.includes(day.getUTCDay())) throw bad('The grower does not deliver on that day of the week.');
    return { start: farmInstant(request.date, 7, farm.timeZone), end: farmInstant(request.date, 18, farm.timeZone) };
  }
  const hour = request.pickupHour ?? farm.pickupFromHour;
  if (hour < farm.pickupFromHour || hour >= farm.pickupToHour) {
    throw bad(`Pickup appointments start between ${farm.pickupFromHour}:00 and ${farm.pickupToHour - 1}:00.`, 'window.pickupHour');
  }
  const start = farmInstant(request.date, hour, farm.timeZone);
  return { start, end: new Date(start.getTime() + 3600_000) };
}

/** The calendar days from `from` for `count` days, as YYYY-MM-DD. */
export function daysFrom(from: string, count: number): string[] {
  const start = parseISO(`${from}T00:00:00Z`);
  return Array.from({ length: count }, (_, i) => addDays(start, i).toISOString().slice(0, 10));
}
