import { DecimalPipe, DOCUMENT } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { RouterLink } from '@angular/router';
import { debounceTime, firstValueFrom, switchMap } from 'rxjs';
import type { LotDetail } from '@shared/contracts/lots';
import { balesForTons, balesToTons } from '@shared/units/bales';
import { feeRateLabel } from '@shared/pricing/order-total';
import { apiErrorMessage } from '../../core/api-error';
import { requestState, valueOf, errorOf } from '../../core/request-state';
import { Session } from '../../core/session';
import { CartStore } from './cart-store';
import { OrdersApi } from './orders-api';
import type { DeliveryMethod } from '@shared/contracts/enums';
import { MoneyPipe } from '../../shared/ui/money-pipe';

/** On the lot page: choose a load (bales or tons), delivery or pickup and a day, see every figure, then pay. */
@Component({
  selector: 'app-buy-panel',
  imports: [MoneyPipe, DecimalPipe, MatButton, RouterLink],
  templateUrl: './buy-panel.html',
  styleUrl: './buy-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BuyPanel {
  private readonly api = inject(OrdersApi);
  private readonly document = inject(DOCUMENT);
  protected readonly session = inject(Session);
  private readonly cart = inject(CartStore);
  readonly lot = input.required<LotDetail>();

  protected readonly minBales = computed(() => Math.min(this.lot().balesAvailable, Math.max(1, balesForTons(this.lot().minOrderTons, this.lot().avgBaleWeightLb))));
  protected readonly bales = signal<number | null>(null);
  protected readonly chosenBales = computed(() => this.bales() ?? this.minBales());
  protected readonly tons = computed(() => balesToTons(Math.max(0, Math.round(this.chosenBales())), this.lot().avgBaleWeightLb));
  protected readonly method = signal<DeliveryMethod>('pickup');
  protected readonly zip = signal('');
  protected readonly address = signal('');
  protected readonly date = signal('');
  protected readonly pickupHour = signal<number | null>(null);
  protected readonly error = signal('');
  protected readonly busy = signal(false);
  protected readonly listed = signal(false);
  protected readonly feeRate = feeRateLabel;

  private readonly request = computed(() => ({ lotId: this.lot().id, bales: Math.round(this.chosenBales()), method: this.method(), deliveryZip: this.method() === 'delivery' && /^\d{5}$/.test(this.zip()) ? this.zip() : undefined }));
  private readonly quoteState = toSignal(toObservable(this.request).pipe(debounceTime(250), switchMap((q) => requestState(this.api.quote(q)))), { initialValue: { status: 'loading' } as const });
  protected readonly quote = computed(() => valueOf(this.quoteState()));
  protected readonly quoteError = computed(() => errorOf(this.quoteState()));
  private readonly daysState = toSignal(toObservable(computed(() => this.lot().id)).pipe(switchMap((id) => requestState(this.api.openDays(id)))), { initialValue: { status: 'loading' } as const });
  protected readonly days = computed(() => {
    const open = valueOf(this.daysState());
    if (!open) return [];
    return this.method() === 'delivery' ? open.days.filter((d) => d.deliveryDay && d.bookedLoads < d.capacityLoads) : open.days;
  });
  protected readonly hours = computed(() => {
    const open = valueOf(this.daysState());
    return open ? Array.from({ length: open.pickupToHour - open.pickupFromHour }, (_, i) => open.pickupFromHour + i) : [];
  });

  protected setTons(value: string): void {
    const tons = Number(value);
    if (tons > 0) this.bales.set(balesForTons(tons, this.lot().avgBaleWeightLb));
  }
  protected numberOf(value: string): number | null {
    return value === '' ? null : Number(value);
  }

  /** Puts this lot, at the chosen bales, on the hay list (replacing it if it is there already). */
  protected putOnList(): void {
    const lot = this.lot();
    const bales = Math.round(this.chosenBales());
    this.cart.addLines([{ lotId: lot.id, title: lot.title, farmName: lot.farm.name, bales, tons: balesToTons(bales, lot.avgBaleWeightLb), hayCents: this.quote()?.goodsCents ?? 0, freightCents: null }]);
    this.listed.set(true);
  }

  protected async reserveAndPay(): Promise<void> {
    this.error.set('');
    this.busy.set(true);
    try {
      const date = this.date();
      const created = await firstValueFrom(
        this.api.place({
          lotId: this.lot().id,
          bales: Math.round(this.chosenBales()),
          method: this.method(),
          ...(this.method() === 'delivery' ? { deliveryZip: this.zip(), deliveryAddress: this.address() } : {}),
          ...(date ? { window: { date, ...(this.method() === 'pickup' && this.pickupHour() !== null ? { pickupHour: this.pickupHour()! } : {}) } } : {}),
        }),
      );
      this.document.location.assign(created.paymentUrl);
    } catch (e) {
      this.error.set(apiErrorMessage(e));
      this.busy.set(false);
    }
  }
}
