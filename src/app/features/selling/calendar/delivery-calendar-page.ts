import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { RouterLink } from '@angular/router';
import { switchMap } from 'rxjs';
import type { CalendarDay } from '@shared/contracts/orders';
import { deliveryStatusLabel } from '@shared/lifecycle/delivery-lifecycle';
import { errorOf, requestState, valueOf, type RequestState } from '../../../core/request-state';
import { isoWeekStart, plusCalendarDays } from '@shared/time/days';
import { FarmTimePipe } from '../../../shared/ui/farm-time-pipes';
import { OrdersApi } from '../../orders/orders-api';

/** Monday of the week holding `day` (ISO date, UTC). */
const mondayOf = isoWeekStart;
const shift = plusCalendarDays;

/** The grower's week: loads booked per day against the loads the farm can haul, and each order's date. */
@Component({
  selector: 'app-delivery-calendar-page',
  imports: [RouterLink, DatePipe, FarmTimePipe],
  template: `
    <div class="bp-page">
      <h1>Delivery calendar</h1>
      <p><a routerLink="/orders">Orders</a> · <a routerLink="/selling">Your lots</a></p>
      <div class="nav">
        <button type="button" (click)="week.set(shift(week(), -7))">Previous week</button>
        <strong>Week of {{ week() | date: 'mediumDate' : 'UTC' }}</strong>
        <button type="button" (click)="week.set(shift(week(), 7))">Next week</button>
      </div>
      @if (days(); as list) {
        <ol class="week">
          @for (d of list; track d.date) {
            <li [class.off]="!d.deliveryDay" [class.full]="d.deliveryDay && d.bookedLoads >= d.capacityLoads">
              <h2>{{ d.date | date: 'EEE d MMM' : 'UTC' }}</h2>
              <p class="load">{{ d.deliveryDay ? d.bookedLoads + ' of ' + d.capacityLoads + ' loads' : 'no deliveries' }}</p>
              @for (o of d.orders; track o.id) {
                <a [routerLink]="['/orders', o.id]">{{ o.method === 'pickup' ? 'Pickup ' + (o.windowStart | farmTime: zone()) : o.loads + ' load' + (o.loads > 1 ? 's' : '') }}: {{ o.buyerName }} ({{ label(o.deliveryStatus) }})</a>
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
    .week li { background: var(--bp-tag); border: 1px solid var(--bp-ink); border-radius: 2px; padding: 0.5rem; display: flex; flex-direction: column; gap: 0.3rem; min-width: 0; }
    .week h2 { font-size: 1rem; margin: 0; }
    .week a { overflow-wrap: anywhere; font-size: 0.9rem; }
    /* A day without deliveries reads quieter by its dashed rule and muted words (7:1), never by fading: faded text fails contrast. */
    .off { background: transparent; border: 1px dashed var(--bp-rule); color: var(--bp-muted); }
    .full .load { font-weight: 600; }
    .full .load::after { content: ' — full'; }
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
  /** The farm's zone: pickup hours are shown on the farm's own clock, the zone named. */
  protected readonly zone = computed(() => valueOf(this.state())?.timeZone ?? 'UTC');
}
