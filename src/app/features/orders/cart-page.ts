import { afterNextRender, ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { RouterLink } from '@angular/router';
import { catchError, debounceTime, firstValueFrom, map, of, switchMap } from 'rxjs';
import type { LineQuote, ListCheckoutResult, ListQuote } from '@shared/contracts/orders';
import { feeRateLabel } from '@shared/pricing/order-total';
import { apiErrorMessage } from '../../core/api-error';
import { Session } from '../../core/session';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { fixed } from '../catalogue/format';
import { CartStore, type CartLine } from './cart-store';
import { OrdersApi } from './orders-api';

/** The list the quote was asked for, and its answer. */
type ListState = { lines: { lotId: number; bales: number }[] } & ({ quote: ListQuote } | { error: string });
type Unit = 'bales' | 'loads';

/**
 * The hay list: lots the buyer means to buy (from lot pages or the planner's cheapest mix), grouped by
 * grower, with quantities in bales or loads and live figures. Each grower's lots make one order (one truck
 * trip, one payment); one checkout holds every lot's bales at once and gives a payment page per grower.
 */
@Component({
  selector: 'app-cart-page',
  imports: [MoneyPipe, RouterLink, MatButton],
  templateUrl: './cart-page.html',
  styleUrl: './cart-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CartPage {
  private readonly api = inject(OrdersApi);
  protected readonly cart = inject(CartStore);
  protected readonly session = inject(Session);
  /** False until the browser has read the saved list, so the server never claims the list is empty. */
  protected readonly ready = signal(false);
  protected readonly method = signal<'pickup' | 'delivery'>('pickup');
  protected readonly zip = signal('');
  protected readonly address = signal('');
  protected readonly units = signal<Record<number, Unit>>({});
  protected readonly busy = signal(false);
  protected readonly error = signal('');
  protected readonly placed = signal<ListCheckoutResult['orders'] | null>(null);
  protected readonly fixed = fixed;
  protected readonly feeRate = feeRateLabel;

  private readonly zipOk = computed(() => /^\d{5}$/.test(this.zip()));
  private readonly request = computed(() => ({ lines: this.cart.lines().map((l) => ({ lotId: l.lotId, bales: l.bales })), method: this.method(), deliveryZip: this.method() === 'delivery' && this.zipOk() ? this.zip() : undefined }));
  /** Until a delivery ZIP is given, the figures are the hay and fee alone (priced as at the farm). */
  protected readonly freightPending = computed(() => this.method() === 'delivery' && !this.zipOk());
  /** The server's figures for the list as it stands: one order per grower, freight on each grower's combined loads. */
  private readonly quoted = toSignal(
    toObservable(this.request).pipe(
      debounceTime(250),
      switchMap((r) =>
        r.lines.length === 0
          ? of<ListState>({ lines: [], quote: { growers: [] } })
          : this.api.quoteList({ lines: r.lines, method: r.deliveryZip ? r.method : 'pickup', deliveryZip: r.deliveryZip }).pipe(
              map((quote): ListState => ({ lines: r.lines, quote })),
              catchError((e) => of<ListState>({ lines: r.lines, error: apiErrorMessage(e) })),
            ),
      ),
    ),
    { initialValue: null },
  );
  /** The quote, once it answers for exactly the list on screen. */
  private readonly current = computed(() => {
    const q = this.quoted();
    const lines = this.request().lines;
    return q && q.lines.length === lines.length && q.lines.every((l, i) => l.lotId === lines[i]!.lotId && l.bales === lines[i]!.bales) ? q : null;
  });
  protected readonly quoteError = computed(() => {
    const c = this.current();
    return c && 'error' in c ? c.error : null;
  });
  private readonly growerQuotes = computed(() => {
    const c = this.current();
    return c && 'quote' in c ? c.quote.growers : [];
  });

  /** The list by grower, in the order the lots were added: each grower's lots become one order. */
  protected readonly growers = computed(() => {
    const byFarm = new Map<string, CartLine[]>();
    for (const line of this.cart.lines()) byFarm.set(line.farmName, [...(byFarm.get(line.farmName) ?? []), line]);
    return [...byFarm].map(([farmName, lines]) => ({ farmName, lines, quote: this.growerQuotes().find((g) => g.lines.some((l) => l.lotId === lines[0]!.lotId)) ?? null }));
  });
  protected readonly totalCents = computed(() => this.growerQuotes().reduce((s, g) => s + g.totalCents, 0));
  protected readonly problems = computed(() => this.quoteError() !== null || this.growerQuotes().some((g) => !!g.problem));
  protected readonly complete = computed(() => this.current() !== null);
  protected readonly canCheckout = computed(() => this.cart.count() > 0 && this.complete() && !this.problems() && (this.method() === 'pickup' || (this.zipOk() && this.address().trim().length >= 5)));

  constructor() {
    afterNextRender(() => {
      this.cart.restore();
      this.ready.set(true);
    });
  }

  protected lineQuote(lotId: number): LineQuote | undefined {
    for (const g of this.growerQuotes()) for (const l of g.lines) if (l.lotId === lotId) return l;
    return undefined;
  }
  protected unitOf(lotId: number): Unit {
    return this.units()[lotId] ?? 'bales';
  }
  /** The quantity as shown in the line's unit: bales, or loads of the grower's truck (two decimals). */
  protected shownQuantity(line: CartLine): string {
    const q = this.lineQuote(line.lotId);
    if (this.unitOf(line.lotId) === 'bales' || !q) return String(line.bales);
    return String(Math.round((line.bales / q.balesPerLoad) * 100) / 100);
  }
  protected setUnit(lotId: number, unit: string): void {
    this.units.update((u) => ({ ...u, [lotId]: unit === 'loads' ? 'loads' : 'bales' }));
  }
  protected setQuantity(line: CartLine, value: string): void {
    const amount = Number(value);
    if (!(amount > 0)) return;
    const perLoad = this.lineQuote(line.lotId)?.balesPerLoad ?? null;
    const bales = this.unitOf(line.lotId) === 'loads' && perLoad ? Math.round(amount * perLoad) : Math.round(amount);
    this.cart.setBales(line.lotId, Math.max(1, bales));
  }

  protected async checkout(): Promise<void> {
    this.error.set('');
    this.busy.set(true);
    try {
      const r = this.request();
      const result = await firstValueFrom(
        this.api.placeList({ lines: r.lines, method: r.method, ...(r.method === 'delivery' ? { deliveryZip: this.zip(), deliveryAddress: this.address().trim() } : {}) }),
      );
      this.placed.set(result.orders);
      this.cart.clear();
    } catch (e) {
      this.error.set(apiErrorMessage(e));
    } finally {
      this.busy.set(false);
    }
  }
}
