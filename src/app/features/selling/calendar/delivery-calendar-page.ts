import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { RouterLink } from '@angular/router';
import { switchMap } from 'rxjs';
import type { CalendarDay } from '@shared/contracts/orders';
import { deliveryStatusLabel } from '@shared/lifecycle/delivery-lifecycle';
import { farmTimeLabel } from '@shared/time/farm-time';
import { errorOf, requestState, valueOf, type RequestState } from '../../../core/request-state';
import { isoWeekStart, plusCalendarDays } from '@shared/time/days';
import { OrdersApi } from '../../orders/orders-api';

const WEEKDAYS = ['Sun', 'Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat'];

/** Monday of the week holding `day` (ISO date, UTC). */
const mondayOf = isoWeekStart;
const shift = plusCalendarDays;

/** The grower's week: loads booked per day against the loads the farm can haul, and each order's date. */
@Component({
  selector: 'app-delivery-calendar-page',
  imports: [RouterLink],
  template: `
    <div class="bp-page">
      <h1>Delivery calendar</h1>
      <p><a routerLink="/orders">Orders</a> · <a routerLink="/selling">Your lots</a></p>
      <div class="nav">
        <button type="button" (click)="week.set(shift(week(), -7))">Previous week</button>
        <strong>Week of {{ week() }}</strong>
        <button type="button" (click)="week.set(shift(week(), 7))">Next week</button>
      </div>
      @if (days(); as list) {
        <ol class="week">
          @for (d of list; track d.date) {
            <li [class.off]="!d.deliveryDay" [class.full]="d.deliveryDay && d.bookedLoads >= d.capacityLoads">
              <h2>{{ weekday(d.date) }} {{ d.date.slice(5) }}</h2>
              <p class="load">{{ d.deliveryDay ? d.bookedLoads + ' of ' + d.capacityLoads + ' loads' : 'no deliveries' }}</p>
              @for (o of d.orders; track o.id) {
                <a [routerLink]="['/orders', o.id]">{{ o.method === 'pickup' ? 'Pickup ' + farmTime(o.windowStart) : o.loads + ' load' + (o.loads > 1 ? 's' : '') }}: {{ o.buyerName }} ({{ label(o.deliveryStatus) }})</a>
              }
            </li>
          }
        </ol>
      } @else if (error(); as message) {
        <div class="bp-error-box" role="alert">{{ message }}</div>
      } @else { <p>Loading…</p> }
    </div>
  `,
  styles: `
    .nav { display: flex; gap: 1rem; align-items: center; flex-wrap: wrap; margin: 1rem 0; }
    .week { list-style: none; padding: 0; display: grid; grid-template-columns: repeat(auto-fit, minmax(9rem, 1fr)); gap: 0.5rem; }
    .week li { border: 1px solid var(--mat-sys-outline-variant, #ccc); border-radius: 6px; padding: 0.5rem; display: flex; flex-direction: column; gap: 0.3rem; min-width: 0; }
    .week h2 { font-size: 1rem; margin: 0; }
    .week a { overflow-wrap: anywhere; font-size: 0.9rem; }
    .off { opacity: 0.6; }
    .full .load { font-weight: 600; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DeliveryCalendarPage {
  private readonly api = inject(OrdersApi);
  protected readonly week = signal(mondayOf(new Date()));
  private readonly state = toSignal(toObservable(this.week).pipe(switchMap((from) => requestState(this.api.calendar(from, 7)))), {
    initialValue: { status: 'loading' } as RequestState<{ days: CalendarDay[]; timeZone: string }>,
  });
  protected readonly days = computed(() => valueOf(this.state())?.days ?? null);
  protected readonly error = computed(() => errorOf(this.state()));
  protected readonly shift = shift;
  protected readonly label = deliveryStatusLabel;
  /** A pickup's hour on the farm's own clock, its zone named. */
  protected farmTime(iso: string): string {
    const zone = valueOf(this.state())?.timeZone;
    return zone ? farmTimeLabel(iso, zone) : '';
  }
  protected weekday(iso: string): string {
    return WEEKDAYS[new Date(`${iso}T00:00:00Z`).getUTCDay()]!;
  }
}
