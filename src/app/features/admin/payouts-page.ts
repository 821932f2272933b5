import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatCheckbox } from '@angular/material/checkbox';
import { firstValueFrom } from 'rxjs';
import type { BatchView, GrowerPayoutDue } from '@shared/contracts/payouts';
import { apiErrorMessage } from '../../core/api-error';
import { AdminApi } from './admin-api';
import { AdminTabs } from './admin-tabs';
import { DatePipe } from '@angular/common';
import { MoneyPipe } from '../../shared/ui/money-pipe';

/**
 * Payouts: what each grower is owed (orders, amounts, refunds deducted), a batch made from the growers the
 * admin ticked, and settling it. The batch request carries a key made when the page loads, so a second
 * click or a reload-and-resubmit finds the same batch.
 */
@Component({
  selector: 'app-payouts-page',
  imports: [AdminTabs, MatButton, MatCheckbox, DatePipe, MoneyPipe],
  templateUrl: './payouts-page.html',
  styleUrl: './admin-tables.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PayoutsPage {
  private readonly api = inject(AdminApi);
  protected readonly due = signal<GrowerPayoutDue[]>([]);
  protected readonly batches = signal<BatchView[]>([]);
  protected readonly chosen = signal<ReadonlySet<number>>(new Set());
  protected readonly busy = signal(false);
  protected readonly error = signal('');
  protected readonly confirming = signal<BatchView | null>(null);
  protected readonly chosenTotal = computed(() => this.due().filter((g) => this.chosen().has(g.farmId)).reduce((s, g) => s + g.totalCents, 0));
  private requestKey = crypto.randomUUID();

  constructor() {
    void this.load();
  }

  protected statementUrl(farmId: number): string {
    return this.api.statementUrl(farmId);
  }

  protected toggle(farmId: number): void {
    this.chosen.update((s) => {
      const next = new Set(s);
      if (next.has(farmId)) next.delete(farmId);
      else next.add(farmId);
      return next;
    });
  }

  protected async prepare(): Promise<void> {
    await this.run(async () => {
      const batch = await firstValueFrom(this.api.createBatch(this.requestKey, [...this.chosen()]));
      this.requestKey = crypto.randomUUID();
      this.chosen.set(new Set());
      this.confirming.set(batch);
    });
  }

  protected async settle(batch: BatchView): Promise<void> {
    this.confirming.set(null);
    await this.run(() => firstValueFrom(this.api.settle(batch.id)));
  }

  protected async retry(payoutId: number): Promise<void> {
    await this.run(() => firstValueFrom(this.api.retryPayout(payoutId)));
  }

  private async run(work: () => Promise<unknown>): Promise<void> {
    this.busy.set(true);
    this.error.set('');
    try {
      await work();
    } catch (e) {
      this.error.set(apiErrorMessage(e));
    } finally {
      this.busy.set(false);
      await this.load();
    }
  }

  private async load(): Promise<void> {
    try {
      const [due, batches] = await Promise.all([firstValueFrom(this.api.payoutsDue()), firstValueFrom(this.api.batches())]);
      this.due.set(due.items.filter((g) => g.totalCents > 0));
      this.batches.set(batches.items);
    } catch (e) {
      this.error.set(apiErrorMessage(e));
    }
  }
}
