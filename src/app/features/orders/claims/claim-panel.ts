import { ChangeDetectionStrategy, Component, computed, inject, input, output, signal } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { firstValueFrom, map, merge, Subject, switchMap } from 'rxjs';
import type { ClaimView } from '@shared/contracts/claims';
import type { OrderView } from '@shared/contracts/orders';
import { DatePipe } from '@angular/common';
import { apiErrorMessage } from '../../../core/api-error';
import { requestState, valueOf, type RequestState } from '../../../core/request-state';
import { MoneyPipe } from '../../../shared/ui/money-pipe';
import { RetestTable } from '../../../shared/ui/retest-table';
import { claimRequest, emptyClaimDraft, missingInDraft, RETEST_FIELDS, type ClaimDraft } from './claim-form';
import { ClaimsApi } from './claims-api';

/**
 * Quality claims on one order: the buyer reports what is wrong (with the values a retest disputes and its
 * PDF), and buyer and grower follow the claim to the admin's decision.
 */
@Component({
  selector: 'app-claim-panel',
  imports: [MatButton, RetestTable, DatePipe, MoneyPipe],
  templateUrl: './claim-panel.html',
  styleUrl: './claim-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ClaimPanel {
  private readonly api = inject(ClaimsApi);
  readonly order = input.required<OrderView>();
  /** A claim was filed: the order's status and timeline changed. */
  readonly filed = output<void>();

  private readonly reload = new Subject<void>();
  private readonly orderId = computed(() => this.order().id);
  private readonly loaded = toSignal(
    merge(toObservable(this.orderId), this.reload.pipe(map(() => this.orderId()))).pipe(switchMap((id) => requestState(this.api.forOrder(id)))),
    { initialValue: { status: 'loading' } as RequestState<{ items: ClaimView[] }> },
  );
  protected readonly claims = computed(() => valueOf(this.loaded())?.items ?? []);
  protected readonly canFile = computed(() => this.order().actions.includes('report_problem'));
  protected readonly draft = signal<ClaimDraft>(emptyClaimDraft());
  protected readonly pdf = signal<File | null>(null);
  protected readonly missing = computed(() => missingInDraft(this.draft(), this.order().lines.length));
  protected readonly busy = signal(false);
  protected readonly error = signal('');
  protected readonly fields = RETEST_FIELDS;

  protected edit<K extends keyof ClaimDraft>(key: K, value: ClaimDraft[K]): void {
    this.draft.update((d) => ({ ...d, [key]: value }));
  }
  protected editValue(field: string, value: string): void {
    this.draft.update((d) => ({ ...d, values: { ...d.values, [field]: value } }));
  }
  protected pickPdf(event: Event): void {
    this.pdf.set((event.target as HTMLInputElement).files?.[0] ?? null);
  }

  /** The buyer adds the retest PDF to a claim still waiting for a decision. */
  protected async attachTo(claim: ClaimView, event: Event): Promise<void> {
    const pdf = (event.target as HTMLInputElement).files?.[0];
    if (!pdf) return;
    this.busy.set(true);
    this.error.set('');
    try {
      await firstValueFrom(this.api.attachRetest(claim.id, pdf));
      this.reload.next();
    } catch (e) {
      this.error.set(apiErrorMessage(e));
    } finally {
      this.busy.set(false);
    }
  }

  protected async file(): Promise<void> {
    if (this.missing()) return;
    this.busy.set(true);
    this.error.set('');
    try {
      const claim = await firstValueFrom(this.api.open(claimRequest(this.orderId(), this.draft())));
      const pdf = this.pdf();
      if (pdf && this.draft().withRetest) {
        try {
          await firstValueFrom(this.api.attachRetest(claim.id, pdf));
        } catch (e) {
          this.error.set(`The claim was filed, but the retest PDF was not attached: ${apiErrorMessage(e)}`);
        }
      }
      this.draft.set(emptyClaimDraft());
      this.pdf.set(null);
      this.filed.emit();
      this.reload.next();
    } catch (e) {
      this.error.set(apiErrorMessage(e));
    } finally {
      this.busy.set(false);
    }
  }
}
