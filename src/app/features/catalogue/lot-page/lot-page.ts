import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, LOCALE_ID, RESPONSE_INIT } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { RouterLink } from '@angular/router';
import { switchMap, tap } from 'rxjs';
import { BALE_TYPE_LABELS, CORE_POSITION_LABELS, FORAGE_TYPE_LABELS, LOT_STATUS_LABELS, STORAGE_LABELS } from '@shared/contracts/labels';
import type { LotDetail } from '@shared/contracts/lots';
import { costPerTonDryMatterCents } from '@shared/pricing/cost-per-nutrient';
import { errorOf, requestState, valueOf, type RequestState } from '../../../core/request-state';
import { cuttingLabel, inLocale } from '../format';
import { MoneyPipe } from '../../../shared/ui/money-pipe';
import { LotsApi } from '../lots-api';
import { LotGallery } from './lot-gallery';
import { LotAnalysisPanel } from './lot-analysis-panel';
import { BuyPanel } from '../../orders/buy-panel';
import { Session } from '../../../core/session';
import { LotThread } from '../../messages/lot-thread';
import { Icon } from '../../../shared/ui/icon';

@Component({
  selector: 'app-lot-page',
  imports: [MoneyPipe, RouterLink, Icon, DatePipe, LotGallery, LotAnalysisPanel, BuyPanel, LotThread],
  templateUrl: './lot-page.html',
  styleUrl: './lot-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LotPage {
  private readonly api = inject(LotsApi);
  private readonly responseInit = inject(RESPONSE_INIT, { optional: true });
  protected readonly session = inject(Session);
  /** Route parameter `:id`. */
  readonly id = input.required<string>();

  private readonly state = toSignal(
    toObservable(this.id).pipe(
      switchMap((id) => requestState(this.api.get(Number(id)))),
      // A missing lot answers 404 to the browser too, not a 200 page that says "not found".
      tap((s) => {
        if (this.responseInit && s.status === 'error' && isMissing(s.httpStatus)) this.responseInit.status = 404;
      }),
    ),
    { initialValue: { status: 'loading' } as RequestState<LotDetail> },
  );

  protected readonly lot = computed(() => valueOf(this.state()));
  protected readonly status = computed(() => {
    const s = this.state();
    return s.status === 'error' && isMissing(s.httpStatus) ? 'missing' : s.status;
  });
  protected readonly errorMessage = computed(() => errorOf(this.state()) ?? '');
  /** The as-fed price per ton of dry matter, as the catalogue card and compare show it. */
  protected readonly perDmTonCents = computed(() => {
    const lot = this.lot();
    return lot?.analysis ? costPerTonDryMatterCents(lot.priceCentsPerTon, lot.analysis.dryMatterPct) : null;
  });

  protected readonly labels = { forage: FORAGE_TYPE_LABELS, bale: BALE_TYPE_LABELS, storage: STORAGE_LABELS, core: CORE_POSITION_LABELS };
  protected readonly fixed = inLocale(inject(LOCALE_ID)).fixed;
  protected readonly cutting = cuttingLabel;
  protected readonly statusLabels = LOT_STATUS_LABELS;
}

/** 400 (not a lot id) and 404 both mean there is no such lot to show. */
function isMissing(httpStatus: number): boolean {
  return httpStatus === 404 || httpStatus === 400;
}
