import { z } from 'zod';
import { nextDay } from '../time/farm-time';

/*
 * The order of a lot's dates: harvest start ≤ harvest end, harvest start ≤ sample date ≤ lab report date,
 * none later than tomorrow (a grower west of UTC may already see "tomorrow" in UTC) and no harvest before
 * 1990. The lot form shows these rules live and the server applies them with its clock, so both say the same.
 */

/** No tested hay on sale is older than this; an earlier year is a typo (0202, 1902). */
export const EARLIEST_HARVEST_DATE = '1990-01-01';

export interface LotDates {
  harvestStartedOn?: string | null;
  harvestEndedOn?: string | null;
  sampledOn?: string | null;
  reportDate?: string | null;
}
export type LotDateField = keyof LotDates;

export interface LotDateIssue {
  path: LotDateField;
  message: string;
}

const LABELS: Record<LotDateField, string> = {
  harvestStartedOn: 'Harvest start',
  harvestEndedOn: 'Harvest end',
  sampledOn: 'Sample date',
  reportDate: 'Report date',
};

/** The latest date accepted: the day after `now` (UTC). */
export function latestLotDate(now: Date): string {
  return nextDay(now.toISOString().slice(0, 10));
}

/**
 * Issues among the dates given, reported on the fields in `fields` (the form step being saved). A pair
 * out of order is reported on whichever of its two dates the step holds, saying what the other date is.
 */
export function lotDateIssues(dates: LotDates, now: Date, fields: readonly LotDateField[] = Object.keys(LABELS) as LotDateField[]): LotDateIssue[] {
  const issues: LotDateIssue[] = [];
  const latest = latestLotDate(now);
  for (const field of fields) {
    const value = dates[field];
    if (value && value > latest) issues.push({ path: field, message: `${LABELS[field]} ${value} is in the future; give the date it happened.` });
  }
  if (fields.includes('harvestStartedOn') && dates.harvestStartedOn && dates.harvestStartedOn < EARLIEST_HARVEST_DATE) {
    issues.push({ path: 'harvestStartedOn', message: `Harvest start ${dates.harvestStartedOn} is before ${EARLIEST_HARVEST_DATE.slice(0, 4)}; check the year.` });
  }
  const pairs: [LotDateField, LotDateField, string][] = [
    ['harvestStartedOn', 'sampledOn', 'The sample must be taken on or after the first day of harvest'],
    ['sampledOn', 'reportDate', 'The lab report cannot be dated before the sample was taken'],
  ];
  for (const [earlier, later, rule] of pairs) {
    const a = dates[earlier];
    const b = dates[later];
    if (!a || !b || b >= a) continue;
    const path = fields.includes(later) ? later : fields.includes(earlier) ? earlier : null;
    if (path) issues.push({ path, message: `${rule}: ${LABELS[later].toLowerCase()} ${b}, ${LABELS[earlier].toLowerCase()} ${a}.` });
  }
  return issues;
}

/** The same issues as a ZodError (the API's 400 `invalid_input` shape, each message beside its field). */
export function assertLotDates(dates: LotDates, now: Date, fields: readonly LotDateField[]): void {
  const issues = lotDateIssues(dates, now, fields);
  if (issues.length > 0) throw new z.ZodError(issues.map((i) => ({ code: 'custom' as const, path: [i.path], message: i.message, input: dates[i.path] })));
}

/**
 * The problem with a buyer's retest report date, or null: the retest is of the hay sold, so its report is
 * dated on or after the lot's own sample (or, without one, its first day of harvest) and not in the future.
 */
export function retestReportDateIssue(reportDate: string, lot: { sampledOn?: string | null; harvestStartedOn: string }, now: Date): string | null {
  if (reportDate > latestLotDate(now)) return `Retest report date ${reportDate} is in the future; give the date on the lab's report.`;
  const [earliest, what] = lot.sampledOn ? [lot.sampledOn, 'the lot was sampled for its listing'] : [lot.harvestStartedOn, 'the lot was harvested'];
  if (reportDate < earliest) return `A retest must be dated on or after the day ${what} (${earliest}); the report says ${reportDate}.`;
  return null;
}
