import { addDays, differenceInCalendarDays, parseISO } from 'date-fns';
import type { WindowRequest } from '@shared/contracts/orders';
import type { farms } from '../../db/schema';
import { HttpError } from '../../middleware/http-error';
import type { DeliveryMethod } from '@shared/contracts/enums';

/** How far ahead a buyer may book: from tomorrow up to this many days. */
export const BOOKING_HORIZON_DAYS = 60;

const bad = (message: string, path = 'window.date') => new HttpError(400, 'bad_window', message, [{ path, message }]);

/**
 * The window for a delivery day or a pickup appointment, checked against the grower's calendar. Times are
 * the farm's wall-clock time, kept as UTC instants of the same digits (the farm's zone is not recorded).
 */
export function windowFor(farm: typeof farms.$inferSelect, method: DeliveryMethod, request: WindowRequest, now: Date): { start: Date; end: Date } {
  const day = parseISO(`${request.date}T00:00:00Z`);
  if (Number.isNaN(day.getTime()) || day.toISOString().slice(0, 10) !== request.date) throw bad('That date does not exist.');
  const ahead = differenceInCalendarDays(day, parseISO(now.toISOString().slice(0, 10) + 'T00:00:00Z'));
  if (ahead < 1) throw bad('Choose a day from tomorrow on.');
  if (ahead > BOOKING_HORIZON_DAYS) throw bad(`Choose a day within the next ${BOOKING_HORIZON_DAYS} days.`);
  if (method === 'delivery') {
    if (!farm.deliveryWeekdays.includes(day.getUTCDay())) throw bad('The grower does not deliver on that day of the week.');
    return { start: new Date(day.getTime() + 7 * 3600_000), end: new Date(day.getTime() + 18 * 3600_000) };
  }
  const hour = request.pickupHour ?? farm.pickupFromHour;
  if (hour < farm.pickupFromHour || hour >= farm.pickupToHour) {
    throw bad(`Pickup appointments start between ${farm.pickupFromHour}:00 and ${farm.pickupToHour - 1}:00.`, 'window.pickupHour');
  }
  return { start: new Date(day.getTime() + hour * 3600_000), end: new Date(day.getTime() + (hour + 1) * 3600_000) };
}

/** The calendar days from `from` for `count` days, as YYYY-MM-DD. */
export function daysFrom(from: string, count: number): string[] {
  const start = parseISO(`${from}T00:00:00Z`);
  return Array.from({ length: count }, (_, i) => addDays(start, i).toISOString().slice(0, 10));
}
