import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { firstValueFrom } from 'rxjs';
import type { ClaimView, ResolveClaim } from '@shared/contracts/claims';
import { DatePipe } from '@angular/common';
import { dollarsToCents } from '@shared/units/money';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { apiErrorMessage } from '../../core/api-error';
import { AdminApi } from './admin-api';
import { RetestTable } from '../../shared/ui/retest-table';
import { AdminTabs } from './admin-tabs';

/**
 * Quality claims: each buyer's report, the retest beside the listed analysis (the engine's figures,
 * differences against the tolerance per nutrient, the grade each gives), and the decision.
 */
@Component({
  selector: 'app-claims-page',
  imports: [AdminTabs, FormsModule, MatButton, RetestTable, DatePipe, MoneyPipe],
  templateUrl: './claims-page.html',
  styleUrl: './admin-tables.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ClaimsPage {
  private readonly api = inject(AdminApi);
  protected readonly claims = signal<ClaimView[]>([]);
  protected readonly error = signal('');
  protected readonly busy = signal(false);
  protected readonly confirming = signal<{ claim: ClaimView; decision: ResolveClaim } | null>(null);
  protected outcome: Record<number, 'reject' | 'partial' | 'full'> = {};
  protected refund: Record<number, number | null> = {};
  protected note: Record<number, string> = {};

  constructor() {
    void this.load();
  }

  protected ask(claim: ClaimView): void {
    const outcome = this.outcome[claim.id] ?? 'reject';
    const note = (this.note[claim.id] ?? '').trim();
    const decision: ResolveClaim = outcome === 'partial' ? { outcome, note, refundCents: dollarsToCents(this.refund[claim.id] ?? 0) } : { outcome, note };
    this.confirming.set({ claim, decision });
  }

  protected async decide(): Promise<void> {
    const c = this.confirming();
    this.confirming.set(null);
    if (!c) return;
    this.busy.set(true);
    this.error.set('');
    try {
      await firstValueFrom(this.api.resolveClaim(c.claim.id, c.decision));
    } catch (e) {
      this.error.set(apiErrorMessage(e));
    } finally {
      this.busy.set(false);
      await this.load();
    }
  }

  protected refundOf(c: { claim: ClaimView; decision: ResolveClaim }): number {
    return c.decision.outcome === 'partial' ? c.decision.refundCents : c.decision.outcome === 'full' ? c.claim.refundableCents : 0;
  }

  private async load(): Promise<void> {
    try {
      this.claims.set((await firstValueFrom(this.api.claims())).items);
    } catch (e) {
      this.error.set(apiErrorMessage(e));
    }
  }
}
