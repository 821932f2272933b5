import { PayoutHistory } from './payout-history';
import { ChangeDetectionStrategy, Component, inject, input, OnInit, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { Router, RouterLink } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import { BALE_TYPE_LABELS } from '@shared/contracts/labels';
import type { FarmProfile, SellerLotRow } from '@shared/contracts/selling';
import { apiErrorMessage } from '../../../core/api-error';
import { fixed } from '../../catalogue/format';
import { MoneyPipe } from '../../../shared/ui/money-pipe';
import { SellingApi } from '../selling-api';
import { STATUS_LABELS } from '../ui/status-label';
import { draftProgress } from '../lot-form/form-steps';
import { Icon } from '../../../shared/ui/icon';

/** The grower's lots: status, stock left, views and orders, with withdraw, relist and copy. */
@Component({
  selector: 'app-selling-dashboard',
  imports: [MoneyPipe, RouterLink, MatButton, Icon, PayoutHistory],
  templateUrl: './selling-dashboard.html',
  styleUrl: './selling-dashboard.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SellingDashboard implements OnInit {
  private readonly api = inject(SellingApi);
  private readonly router = inject(Router);
  /** Set after a submit (query parameter), to confirm it. */
  readonly submitted = input<string>();

  protected readonly lots = signal<SellerLotRow[] | null>(null);
  protected readonly farm = signal<FarmProfile | null | undefined>(undefined);
  protected readonly error = signal('');
  protected readonly busyId = signal<number | null>(null);
  /** Pausing asks first, then offers an undo. */
  protected readonly confirmingId = signal<number | null>(null);
  protected readonly paused = signal<{ id: number; title: string } | null>(null);
  protected readonly progress = draftProgress;
  protected readonly statusLabels = STATUS_LABELS;
  protected readonly bales = BALE_TYPE_LABELS;
  protected readonly fixed = fixed;

  ngOnInit(): void {
    void this.load();
  }

  private async load(): Promise<void> {
    try {
      const [farm, lots] = await Promise.all([firstValueFrom(this.api.myFarm()), firstValueFrom(this.api.myLots())]);
      this.farm.set(farm.farm);
      this.lots.set(lots.items);
    } catch (e) {
      this.error.set(apiErrorMessage(e));
    }
  }

  protected async act(lot: SellerLotRow, action: 'withdraw' | 'relist' | 'copy'): Promise<void> {
    this.busyId.set(lot.id);
    this.error.set('');
    try {
      const result = await firstValueFrom(this.api.act(lot.id, action));
      if (action === 'copy') {
        await this.router.navigate(['/selling/lots', result.id]);
        return;
      }
      await this.load();
    } catch (e) {
      this.error.set(apiErrorMessage(e));
    } finally {
      this.busyId.set(null);
    }
  }

  protected async pause(lot: SellerLotRow): Promise<void> {
    this.confirmingId.set(null);
    await this.act(lot, 'withdraw');
    if (!this.error()) this.paused.set({ id: lot.id, title: lot.title });
  }

  protected async undoPause(p: { id: number; title: string }): Promise<void> {
    const lot = this.lots()?.find((l) => l.id === p.id);
    if (!lot) return;
    await this.act(lot, 'relist');
    if (!this.error()) this.paused.set(null);
  }

  protected thumb(lot: SellerLotRow): string | null {
    return lot.cover ? ([...lot.cover.variants].sort((a, b) => a.width - b.width)[0]?.url ?? null) : null;
  }
}
