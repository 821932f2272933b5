import { HttpClient } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type { PayoutView } from '@shared/contracts/payouts';
import { DatePipe } from '@angular/common';
import { MoneyPipe } from '../../../shared/ui/money-pipe';

/** The grower's payouts, newest first, with what each paid for and a CSV statement. */
@Component({
  selector: 'app-payout-history',
  imports: [DatePipe, MoneyPipe],
  template: `
    <section aria-labelledby="payouts-title">
      <h2 id="payouts-title">Payouts</h2>
      @if (items().length === 0) {
        <p>No payouts yet. Orders are paid out after the buyer accepts the load or the acceptance time runs out.</p>
      } @else {
        <table aria-label="Payout history">
          <thead><tr><th scope="col">Payout</th><th scope="col">State</th><th scope="col">Sent</th><th scope="col">Orders</th><th scope="col" class="n">Amount</th></tr></thead>
          <tbody>
            @for (p of items(); track p.id) {
              <tr><td>{{ p.id }}</td><td>{{ p.statusLabel }}@if (p.heldReason) { — {{ p.heldReason }}}</td><td>{{ (p.sentAt | date: 'mediumDate' : 'UTC') ?? '—' }}</td>
                <td>{{ orders(p) }}</td><td class="n">{{ p.amountCents | money }}</td></tr>
            }
          </tbody>
        </table>
        <a href="/api/payouts/mine/statement.csv" download>Download the statement (CSV)</a>
      }
    </section>
  `,
  styles: `
    table { border-collapse: collapse; width: 100%; }
    th, td { padding: 4px 8px; border-bottom: 1px solid var(--mat-sys-outline-variant); text-align: left; }
    .n { text-align: right; font-variant-numeric: tabular-nums; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PayoutHistory {
  private readonly http = inject(HttpClient);
  protected readonly items = signal<PayoutView[]>([]);

  constructor() {
    firstValueFrom(this.http.get<{ items: PayoutView[] }>('/api/payouts/mine')).then(
      (r) => this.items.set(r.items),
      () => this.items.set([]),
    );
  }

  protected orders(p: PayoutView): string {
    return p.lines.map((l) => `#${l.orderId}`).join(', ');
  }
}
