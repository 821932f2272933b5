import { inject, LOCALE_ID, Pipe, type PipeTransform } from '@angular/core';
import { formatCents } from '@shared/units/money';

/**
 * Integer cents as dollars in the reader's locale, through the one shared formatter:
 * `{{ lot.priceCentsPerTon | money }}` → "$400.00", `{{ cents | money: 0 }}` → "$400" (whole dollars),
 * `{{ cents | money: 3 }}` for small per-unit rates.
 * A missing amount reads "—".
 */
@Pipe({ name: 'money' })
export class MoneyPipe implements PipeTransform {
  private readonly locale = inject(LOCALE_ID);

  transform(cents: number | null | undefined, digits = 2): string {
    if (cents === null || cents === undefined || !Number.isFinite(cents)) return '—';
    return formatCents(cents, { fractionDigits: digits, locale: this.locale });
  }
}
