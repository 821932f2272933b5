import { inject, LOCALE_ID, Pipe, type PipeTransform } from '@angular/core';
import { farmDateLabel, farmTimeLabel } from '@shared/time/farm-time';

/**
 * A delivery day or pickup instant on the farm's own clock, written the reader's way (LOCALE_ID):
 * `{{ d.windowStart | farmDate: farm.timeZone }}` → "Thu, Sep 17, 2026" (en-US), "jeu. 17 sept. 2026" (fr-CA).
 * Angular's DatePipe takes only fixed offsets, not a farm's IANA zone with its daylight-saving rules.
 */
@Pipe({ name: 'farmDate' })
export class FarmDatePipe implements PipeTransform {
  private readonly locale = inject(LOCALE_ID);

  transform(instant: string | Date | null | undefined, zone: string): string {
    return instant ? farmDateLabel(instant, zone, this.locale) : '—';
  }
}

/** The farm's clock at an instant with its zone named, in the reader's locale: `{{ start | farmTime: zone }}` → "09:00 CDT". */
@Pipe({ name: 'farmTime' })
export class FarmTimePipe implements PipeTransform {
  private readonly locale = inject(LOCALE_ID);

  transform(instant: string | Date | null | undefined, zone: string): string {
    return instant ? farmTimeLabel(instant, zone, this.locale) : '—';
  }
}
