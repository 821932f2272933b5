import { formatNumber } from '@angular/common';
import { formatCents } from '@shared/units/money';

/**
 * Display helpers for text built in code (templates use Angular's `number` pipe and the `money` pipe): money from
 * integer cents through the one shared formatter, numbers with fixed decimals through Angular's formatNumber, both in
 * the reader's locale (LOCALE_ID; US English by default).
 */
export function dollars(cents: number | null | undefined, digits = 0, locale = 'en-US'): string {
  if (cents === null || cents === undefined) return '—';
  return formatCents(cents, { fractionDigits: digits, locale });
}

export function fixed(value: number | null | undefined, digits = 1, locale = 'en-US'): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  return formatNumber(value, locale, `1.${digits}-${digits}`);
}

/** `fixed` and `dollars` bound to one locale, for a component: `protected readonly fixed = inLocale(inject(LOCALE_ID)).fixed`. */
export function inLocale(locale: string) {
  return {
    fixed: (value: number | null | undefined, digits = 1) => fixed(value, digits, locale),
    dollars: (cents: number | null | undefined, digits = 0) => dollars(cents, digits, locale),
  };
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
