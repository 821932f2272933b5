import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, LOCALE_ID, signal } from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatProgressBar } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import type { PurchasePlanResponse } from '@shared/contracts/planner';
import type { HerdNeedsRequest } from '@shared/planner/herd-needs';
import { formatCents } from '@shared/units/money';
import { apiErrorMessage } from '../../core/api-error';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { CartStore } from '../orders/cart-store';
import { PlannerApi } from './planner-api';
import { supplyRows } from './purchase-rows';
import { type ReaderUnit, tonnageIn } from './reader-units';
import { StackedBars } from './stacked-bars';

/** The cheapest delivered mix of listed lots that meets the herd's energy and protein, and one click to the cart. */
@Component({
  selector: 'app-purchase-plan-panel',
  imports: [MoneyPipe, DecimalPipe, StackedBars, FormsModule, RouterLink, MatButton, MatFormField, MatLabel, MatHint, MatSuffix, MatInput, MatProgressBar],
  templateUrl: './purchase-plan-panel.html',
  styleUrl: './purchase-plan-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PurchasePlanPanel {
  private readonly api = inject(PlannerApi);
  private readonly cart = inject(CartStore);
  private readonly locale = inject(LOCALE_ID);

  readonly herd = input.required<HerdNeedsRequest>();
  /** The unit the herd was entered in: tons and masses are shown in it. */
  readonly unit = input<ReaderUnit>('lb');

  protected readonly zip = signal('');
  protected readonly maxDistanceMi = signal<number | null>(300);
  protected readonly busy = signal(false);
  protected readonly error = signal<string | null>(null);
  protected readonly result = signal<PurchasePlanResponse | null>(null);
  protected readonly added = signal(false);
  protected readonly supply = computed(() => {
    const r = this.result();
    return r ? supplyRows(r, this.unit()) : [];
  });
  protected readonly costBars = computed(() => (this.result()?.lines ?? []).map((l) => ({ label: l.title, parts: [l.hayCents, l.freightCents] })));
  /** Chart totals in whole dollars, through the one money formatter. */
  protected readonly money = (cents: number) => formatCents(cents, { fractionDigits: 0, locale: this.locale });

  protected tonnage(shortTons: number): number {
    return tonnageIn(shortTons, this.unit()).value;
  }

  protected async findPlan(): Promise<void> {
    this.busy.set(true);
    this.error.set(null);
    this.added.set(false);
    try {
      const maxDistanceMi = this.maxDistanceMi();
      this.result.set(
        await firstValueFrom(this.api.purchasePlan({ herd: this.herd(), zip: this.zip().trim(), ...(maxDistanceMi ? { maxDistanceMi } : {}) })),
      );
    } catch (error) {
      this.result.set(null);
      this.error.set(apiErrorMessage(error));
    } finally {
      this.busy.set(false);
    }
  }

  protected addPlanToCart(plan: PurchasePlanResponse): void {
    this.cart.addLines(
      plan.lines.map((l) => ({ lotId: l.lotId, title: l.title, farmName: l.farmName, tons: l.tons, bales: l.bales, hayCents: l.hayCents, freightCents: l.freightCents })),
    );
    this.added.set(true);
  }
}
