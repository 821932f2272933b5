import { afterNextRender, ChangeDetectionStrategy, Component, computed, effect, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { FormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatCheckbox } from '@angular/material/checkbox';
import { MatFormField, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatPaginator, PageEvent } from '@angular/material/paginator';
import { MatProgressBar } from '@angular/material/progress-bar';
import { MatOption, MatSelect } from '@angular/material/select';
import { ActivatedRoute, Router, RouterLink } from '@angular/router';
import { switchMap } from 'rxjs';
import { BALE_TYPE_LABELS, FORAGE_TYPE_LABELS } from '@shared/contracts/labels';
import type { LotSearchResult } from '@shared/contracts/lots';
import { errorOf, requestState, valueOf, type RequestState } from '../../../core/request-state';
import { LotCard } from '../lot-card/lot-card';
import { CompareSelection } from '../lot-compare/compare-selection';
import { SavedSearchesPanel } from '../saved-searches/saved-searches-panel';
import { LotsApi } from '../lots-api';
import { FILTER_KEYS, FILTER_LABELS, queryFromForm, SORT_OPTIONS } from './search-query';


/** The catalogue: filters in the URL, results rendered on the server. */
@Component({
  selector: 'app-lot-search-page',
  imports: [ReactiveFormsModule, RouterLink, LotCard, SavedSearchesPanel, MatFormField, MatLabel, MatSuffix, MatInput, MatSelect, MatOption, MatCheckbox, MatButton, MatPaginator, MatProgressBar],
  templateUrl: './lot-search-page.html',
  styleUrl: './lot-search-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LotSearchPage {
  private readonly api = inject(LotsApi);
  private readonly route = inject(ActivatedRoute);
  private readonly router = inject(Router);
  protected readonly compare = inject(CompareSelection);

  protected readonly forageTypes = Object.entries(FORAGE_TYPE_LABELS);
  protected readonly baleTypes = Object.entries(BALE_TYPE_LABELS);
  protected readonly sorts = SORT_OPTIONS;

  protected readonly filters = inject(FormBuilder).nonNullable.group(
    Object.fromEntries(FILTER_KEYS.map((k) => [k, k === 'compliantOnly' || k === 'verifiedOnly' || k === 'nitrateTestedOnly' ? false : ''])) as Record<string, string | boolean>,
  );

  protected readonly params = toSignal(this.route.queryParams, { initialValue: {} as Record<string, string> });

  protected readonly state = toSignal(this.route.queryParams.pipe(switchMap((params) => requestState(this.api.search(params)))), {
    initialValue: { status: 'loading' } as RequestState<LotSearchResult>,
  });
  protected readonly result = computed(() => valueOf(this.state()));
  protected readonly error = computed(() => errorOf(this.state()));
  protected readonly sort = computed(() => this.params()['sort'] ?? 'newest');
  /** The comparison link carries the ZIP so delivered prices use the same place. */
  protected readonly compareParams = computed(() => ({ ids: this.compare.ids().join(','), zip: this.params()['zip'] }));
  /** Filters in the URL, each removable on its own from the empty state. */
  protected readonly activeFilters = computed(() =>
    FILTER_KEYS.filter((k) => this.params()[k] !== undefined && !(k === 'radiusMi' && this.params()['zip'] !== undefined)).map((key) => ({
      key,
      label: FILTER_LABELS[key],
      value: key.endsWith('Only') ? '' : this.params()[key],
    })),
  );
  protected readonly hasFilters = computed(() => FILTER_KEYS.some((k) => this.params()[k] !== undefined));

  constructor() {
    afterNextRender(() => this.compare.restore());
    // Keep the form showing what the URL says (also after back/forward).
    effect(() => {
      const p = this.params();
      this.filters.reset(
        Object.fromEntries(FILTER_KEYS.map((k) => [k, k.endsWith('Only') ? p[k] === 'true' : (p[k] ?? '')])),
        { emitEvent: false },
      );
    });
  }

  protected applyFilters(): void {
    this.navigate({ ...queryFromForm(this.filters.getRawValue()), sort: this.params()['sort'], pageSize: this.params()['pageSize'], page: undefined });
  }

  protected removeFilter(key: string): void {
    // A ZIP without it would leave a radius (or a distance sort) the API rejects, so they go together.
    const drop = key === 'zip' ? { zip: undefined, radiusMi: undefined, sort: this.params()['sort'] === 'distance' ? undefined : this.params()['sort'] } : { [key]: undefined };
    this.navigate({ ...this.params(), ...drop, page: undefined });
  }

  protected clearFilters(): void {
    this.navigate({ sort: this.params()['sort'] });
  }

  protected changeSort(sort: string): void {
    this.navigate({ ...this.params(), sort: sort === 'newest' ? undefined : sort, page: undefined });
  }

  protected changePage(event: PageEvent): void {
    this.navigate({ ...this.params(), page: event.pageIndex > 0 ? String(event.pageIndex + 1) : undefined, pageSize: String(event.pageSize) });
  }

  private navigate(queryParams: Record<string, string | undefined>): void {
    void this.router.navigate([], { relativeTo: this.route, queryParams });
  }
}
