import { formatCents } from '@shared/units/money';

/**
 * Display helpers for the catalogue: money from integer cents (through the shared formatter, for
 * code that builds text; templates use the locale-aware `money` pipe), numbers with fixed decimals.
 */
export function dollars(cents: number | null | undefined, digits = 0): string {
  if (cents === null || cents === undefined) return '—';
  return formatCents(cents, { fractionDigits: digits });
}

export function fixed(value: number | null | undefined, digits = 1): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  return value.toLocaleString('en-US', { minimumFractionDigits: digits, maximumFractionDigits: digits });
}

/** Road-trip distance in words: a lot in the buyer's own town reads "under 1 mi", never "0 mi". */
export function distanceLabel(miles: number | null | undefined): string {
  if (miles === null || miles === undefined || !Number.isFinite(miles)) return '';
  if (miles < 1) return 'under 1 mi';
  return `${Math.round(miles).toLocaleString('en-US')} mi`;
}

/** "1st cutting", "2nd cutting", … */
export function cuttingLabel(cutting: number): string {
  const suffix = cutting % 100 >= 11 && cutting % 100 <= 13 ? 'th' : ({ 1: 'st', 2: 'nd', 3: 'rd' } as Record<number, string>)[cutting % 10] ?? 'th';
  return `${cutting}${suffix} cutting`;
}
