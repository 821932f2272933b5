import { afterNextRender, ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { ActivatedRoute } from '@angular/router';
import { map, switchMap } from 'rxjs';
import type { LotSearchResult } from '@shared/contracts/lots';
import { requestState, type RequestState } from '../../../core/request-state';
import { CompareSelection } from '../lot-compare/compare-selection';
import { LotsApi } from '../lots-api';
import { apiQueryFor, filledParams } from './search-query';
import { LotSearchView } from './lot-search-view';

/**
 * The catalogue: filters in the URL, results rendered on the server.
 *
 * Opened by a full page load, the app itself starts only at the visitor's first sign of use
 * (shared/contracts/page-wake.ts; until then the server's forms hold their submits, core/wake/held-forms.ts).
 * Even then the page stays as the server sent it until touched: its 17 filter fields, the sort and the lot
 * cards (lot-search-view.ts) wake on the first click, key or typing inside it (what was typed is kept), when
 * the URL changes, or when the compare sheet has lots to tick. Until then the app runs only this thin part,
 * which asks the search (answered from the server's page, so it is not asked again when the rest wakes); the
 * forms library and the view's code load when it wakes. Opened here by the router, the view renders at once.
 */
@Component({
  selector: 'app-lot-search-page',
  imports: [LotSearchView],
  template: `
    @defer (on immediate; hydrate on interaction; hydrate when compare.count() > 0 || searchMoved()) {
      <app-lot-search-view [params]="params()" [state]="state()" />
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LotSearchPage {
  private readonly api = inject(LotsApi);
  private readonly route = inject(ActivatedRoute);
  protected readonly compare = inject(CompareSelection);

  protected readonly params = toSignal(this.route.queryParams.pipe(map(filledParams)), { initialValue: {} as Record<string, string> });
  private readonly firstParams = this.params();
  /** The URL has moved on from the one the page opened with (the server's page no longer shows it). */
  protected readonly searchMoved = computed(() => this.params() !== this.firstParams);
  protected readonly state = toSignal(this.route.queryParams.pipe(switchMap((params) => requestState(this.api.search(apiQueryFor(params).query)))), {
    initialValue: { status: 'loading' } as RequestState<LotSearchResult>,
  });

  constructor() {
    afterNextRender(() => this.compare.restore());
  }
}
