/**
 * Money as integer US cents (conventions: "money as integer cents"). Totals are always whole
 * cents; per-unit rates derived from them (cents per Mcal, per lb of protein) may be fractional
 * and are rounded only for display.
 */

import { roundTo } from './rounding';

/** Integer number of US cents. A plain number, documented rather than branded, so zod output fits. */
export type Cents = number;

/**
 * Rounds a cent amount to a whole cent, half away from zero (0.5 → 1, −0.5 → −1),
 * after removing floating-point noise (45454.499999999 stays 45454, 0.285 * 100 → 29).
 */
export function roundCents(cents: number): Cents {
  if (!Number.isFinite(cents)) throw new RangeError(`cents must be finite; got ${cents}`);
  const magnitude = Math.round(Number(Math.abs(cents).toPrecision(15)));
  return magnitude === 0 ? 0 : Math.sign(cents) * magnitude;
}

/** Dollars (possibly with a fraction) → whole cents: 12.345 → 1235. */
export function dollarsToCents(dollars: number): Cents {
  return roundCents(dollars * 100);
}

export interface FormatCentsOptions {
  /** Show the ".00" part. Default true; false rounds to whole dollars ("$1,050"). */
  readonly showCents?: boolean;
  /**
   * Places after the dollar point, 0–4 (default 2); more than 2 only for small per-unit rates
   * ("$0.085" per Mcal). `showCents: false` means 0.
   */
  readonly fractionDigits?: number;
  /**
   * The reader's locale (a BCP 47 tag such as "fr-CA"); default "en-US". The app passes Angular's
   * LOCALE_ID (see the `money` pipe); e-mails and server messages use the default.
   */
  readonly locale?: string;
}

const formatters = new Map<string, Intl.NumberFormat>();

function currencyFormat(locale: string, digits: number): Intl.NumberFormat {
  const key = `${locale}|${digits}`;
  let format = formatters.get(key);
  if (!format) {
    format = new Intl.NumberFormat(locale, { style: 'currency', currency: 'USD', minimumFractionDigits: digits, maximumFractionDigits: digits });
    formatters.set(key, format);
  }
  return format;
}

/**
 * Formats cents as US dollars for display, the one money formatter of the app, e-mails and server
 * messages: 105000 → "$1,050.00", -550 → "-$5.50"; in "fr-CA" 105000 → "1 050,00 $ US".
 * The amount is first rounded to the places shown, half away from zero and without float noise
 * (never "$0.30000000000000004"), so fractional per-unit rates display sanely.
 */
export function formatCents(cents: Cents, options: FormatCentsOptions = {}): string {
  const digits = options.showCents === false ? 0 : (options.fractionDigits ?? 2);
  if (!Number.isInteger(digits) || digits < 0 || digits > 4) throw new RangeError(`fractionDigits must be 0–4; got ${digits}`);
  const amount = roundTo(cents / 100, digits);
  return currencyFormat(options.locale ?? 'en-US', digits).format(amount);
}

/**
 * Cents as a plain decimal number of dollars with two places and no symbol or grouping:
 * 123450 → "1234.50". For files and payment descriptions that other programs read (CSV statements).
 */
export function centsToDecimalText(cents: Cents): string {
  const whole = roundCents(cents);
  const abs = Math.abs(whole);
  return `${whole < 0 ? '-' : ''}${Math.floor(abs / 100)}.${String(abs % 100).padStart(2, '0')}`;
}
