import { ChangeDetectionStrategy, Component, computed, inject, input, RESPONSE_INIT } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { MatIcon } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { catchError, map, of, switchMap } from 'rxjs';
import { BALE_TYPE_LABELS, CORE_POSITION_LABELS, FORAGE_TYPE_LABELS, STORAGE_LABELS } from '../../../../../shared/contracts/labels';
import type { LotDetail } from '../../../../../shared/contracts/lots';
import { apiErrorMessage } from '../../../core/api-error';
import { dollars, fixed } from '../format';
import { LotsApi } from '../lots-api';
import { LotGallery } from './lot-gallery';
import { LotAnalysisPanel } from './lot-analysis-panel';

type LotState = { status: 'loading' } | { status: 'ok'; lot: LotDetail } | { status: 'missing' } | { status: 'error'; message: string };

@Component({
  selector: 'app-lot-page',
  imports: [RouterLink, MatIcon, LotGallery, LotAnalysisPanel],
  templateUrl: './lot-page.html',
  styleUrl: './lot-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LotPage {
  private readonly api = inject(LotsApi);
  private readonly responseInit = inject(RESPONSE_INIT, { optional: true });
  /** Route parameter `:id`. */
  readonly id = input.required<string>();

  private readonly state = toSignal(
    toObservable(this.id).pipe(
      switchMap((id) =>
        this.api.get(Number(id)).pipe(
          map((lot): LotState => ({ status: 'ok', lot })),
          catchError((error) => {
            if (error?.status === 404 || error?.status === 400) {
              if (this.responseInit) this.responseInit.status = 404;
              return of<LotState>({ status: 'missing' });
            }
            return of<LotState>({ status: 'error', message: apiErrorMessage(error) });
          }),
        ),
      ),
    ),
    { initialValue: { status: 'loading' } as LotState },
  );

  protected readonly lot = computed(() => {
    const s = this.state();
    return s.status === 'ok' ? s.lot : null;
  });
  protected readonly status = computed(() => this.state().status);
  protected readonly errorMessage = computed(() => {
    const s = this.state();
    return s.status === 'error' ? s.message : '';
  });

  protected readonly labels = { forage: FORAGE_TYPE_LABELS, bale: BALE_TYPE_LABELS, storage: STORAGE_LABELS, core: CORE_POSITION_LABELS };
  protected readonly dollars = dollars;
  protected readonly fixed = fixed;
}
