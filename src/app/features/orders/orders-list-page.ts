import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { RouterLink } from '@angular/router';

import { lotTitlesOf, type OrderSummary } from '@shared/contracts/orders';
import { orderStatusLabel } from '@shared/lifecycle/order-lifecycle';
import { errorOf, requestState, valueOf, type RequestState } from '../../core/request-state';
import { Session } from '../../core/session';
import { OrdersApi } from './orders-api';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { FarmDatePipe } from '../../shared/ui/farm-time-pipes';

/** A buyer's orders, or the orders a grower has received. */
@Component({
  selector: 'app-orders-list-page',
  imports: [MoneyPipe, FarmDatePipe, RouterLink],
  template: `
    <div class="bp-page">
      <h1>{{ grower ? 'Orders for your hay' : 'Your orders' }}</h1>
      @if (grower) { <p><a routerLink="/selling/calendar">Delivery calendar</a> · <a routerLink="/selling">Your lots</a></p> }
      @if (items(); as list) {
        @if (list.length === 0) { <p>No orders yet. @if (!grower) { <a routerLink="/hay">Find hay</a> } </p> }
        <ul class="orders">
          @for (o of list; track o.id) {
            <li>
              <a [routerLink]="['/orders', o.id]">Order {{ o.id }}: {{ o.bales }} bales of {{ titles(o) }}</a>
              <span>{{ statusLabel(o.status) }} · {{ (o.totalCents | money) }} · {{ o.method === 'delivery' ? 'delivery' : 'pickup' }}@if (o.windowStart) { {{ (o.windowStart | farmDate: o.farm.timeZone) }} }</span>
              <span class="who">{{ grower ? o.buyerName : o.farm.name }}</span>
            </li>
          }
        </ul>
      } @else if (error(); as message) {
        <div class="bp-error-box" role="alert">{{ message }}</div>
      } @else { <p>Loading…</p> }
    </div>
  `,
  styles: `.orders { list-style: none; padding: 0; } .orders li { display: flex; flex-direction: column; padding: 0.6rem 0; border-bottom: 1px solid var(--mat-sys-outline-variant, #ddd); } .who { color: var(--mat-sys-on-surface-variant, #555); font-size: 0.9rem; }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class OrdersListPage {
  private readonly api = inject(OrdersApi);
  protected readonly grower = inject(Session).role() === 'grower';
  private readonly state = toSignal(requestState(this.grower ? this.api.incoming() : this.api.mine()), { initialValue: { status: 'loading' } as RequestState<{ items: OrderSummary[] }> });
  protected readonly items = computed(() => valueOf(this.state())?.items ?? null);
  protected readonly error = computed(() => errorOf(this.state()));
  protected readonly statusLabel = orderStatusLabel;
  protected readonly titles = (o: OrderSummary) => lotTitlesOf(o.lines);
}
