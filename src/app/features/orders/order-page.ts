import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { RouterLink } from '@angular/router';
import { firstValueFrom, Observable, switchMap } from 'rxjs';
import { lotTitlesOf, type OrderView } from '@shared/contracts/orders';
import { deliveryStatusLabel } from '@shared/lifecycle/delivery-lifecycle';
import { orderStatusLabel } from '@shared/lifecycle/order-lifecycle';
import { feeRateLabel } from '@shared/pricing/order-total';
import { apiErrorMessage } from '../../core/api-error';
import { errorOf, requestState, valueOf, type RequestState } from '../../core/request-state';
import { OrderThread } from '../messages/order-thread';
import { ClaimPanel } from './claims/claim-panel';
import { OrdersApi } from './orders-api';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { FarmDatePipe, FarmTimePipe } from '../../shared/ui/farm-time-pipes';
import { DecimalPipe } from '@angular/common';

/** One order: figures, the agreed date, what happened when (timeline), the steps open to the viewer, a printable receipt. */
@Component({
  selector: 'app-order-page',
  imports: [MoneyPipe, DecimalPipe, FarmDatePipe, FarmTimePipe, RouterLink, MatButton, ClaimPanel, OrderThread],
  templateUrl: './order-page.html',
  styleUrl: './order-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class OrderPage {
  private readonly api = inject(OrdersApi);
  /** Route parameter `:id`. */
  readonly id = input.required<string>();

  private readonly loaded = toSignal(toObservable(this.id).pipe(switchMap((id) => requestState(this.api.get(Number(id))))), {
    initialValue: { status: 'loading' } as RequestState<OrderView>,
  });
  private readonly updated = signal<OrderView | null>(null);
  protected readonly order = computed(() => {
    const u = this.updated();
    const l = valueOf(this.loaded());
    return u && u.id === l?.id ? u : l;
  });
  protected readonly loadError = computed(() => errorOf(this.loaded()));
  protected readonly error = signal('');
  protected readonly busy = signal(false);
  protected readonly date = signal('');
  protected readonly hour = signal(9);
  /** Weighed tons typed per order line (scale ticket), by line id. */
  protected readonly weighed = signal<Partial<Record<number, string>>>({});
  protected readonly ticket = signal<File | null>(null);
  protected readonly feeRate = feeRateLabel;
  protected readonly statusLabel = orderStatusLabel;
  protected readonly deliveryLabel = deliveryStatusLabel;
  protected readonly can = (action: string) => this.order()?.actions.includes(action) ?? false;

  protected cancel() {
    return this.run((id) => this.api.cancel(id));
  }
  protected confirmDate() {
    return this.run((id) => this.api.confirmDate(id));
  }
  protected proposeDate(asBuyer: boolean) {
    const window = { date: this.date(), ...(this.order()?.method === 'pickup' ? { pickupHour: this.hour() } : {}) };
    return this.run((id) => (asBuyer ? this.api.askForDate(id, window) : this.api.offerDate(id, window)));
  }
  protected titles(o: OrderView): string {
    return lotTitlesOf(o.lines);
  }
  protected weigh(lineId: number, value: string) {
    this.weighed.update((w) => ({ ...w, [lineId]: value }));
  }
  protected handOver() {
    const lines = Object.entries(this.weighed())
      .filter((entry): entry is [string, string] => (entry[1] ?? '').trim() !== '')
      .map(([lineId, v]) => ({ lineId: Number(lineId), weighedTons: Number(v) }));
    return this.run((id) => this.api.handOver(id, lines, this.ticket()));
  }
  protected accept() {
    return this.run((id) => this.api.accept(id));
  }
  /** Reads the order again after a claim changed it. */
  protected refresh() {
    return this.run((id) => this.api.get(id));
  }
  protected pickTicket(event: Event) {
    this.ticket.set((event.target as HTMLInputElement).files?.[0] ?? null);
  }
  protected print() {
    globalThis.print?.();
  }

  private async run(step: (id: number) => Observable<OrderView>): Promise<void> {
    const order = this.order();
    if (!order) return;
    this.busy.set(true);
    this.error.set('');
    try {
      this.updated.set(await firstValueFrom(step(order.id)));
    } catch (e) {
      this.error.set(apiErrorMessage(e));
    } finally {
      this.busy.set(false);
    }
  }
}
