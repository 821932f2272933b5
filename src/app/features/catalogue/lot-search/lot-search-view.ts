import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { FormBuilder, FormControl, ReactiveFormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatProgressBar } from '@angular/material/progress-bar';
import { ActivatedRoute, Router, RouterLink } from '@angular/router';
import { debounceTime } from 'rxjs';
import { BALE_TYPE_LABELS, FORAGE_TYPE_LABELS } from '@shared/contracts/labels';
import type { LotSearchResult } from '@shared/contracts/lots';
import { KeepTypedValue } from '../../../core/keep-typed-value';
import { errorOf, valueOf, type RequestState } from '../../../core/request-state';
import { LotCard } from '../lot-card/lot-card';
import { LotMap } from '../lot-map/lot-map';
import { CompareSelection } from '../lot-compare/compare-selection';
import { SavedSearchesPanel } from '../saved-searches/saved-searches-panel';
import { Pager, type PagerChange } from '../../../shared/ui/pager';
import { apiQueryFor, FILTER_KEYS, FILTER_LABELS, hasAnyFilter, isTickFilter, queryFromForm, SORT_OPTIONS } from './search-query';

/**
 * The catalogue's filters, sort and lots. Its code (the forms library among it) loads only when the page wakes
 * (lot-search-page.ts); the search itself and the URL's filters come from the page.
 */
@Component({
  selector: 'app-lot-search-view',
  imports: [DecimalPipe, ReactiveFormsModule, RouterLink, LotCard, SavedSearchesPanel, MatButton, Pager, MatProgressBar, LotMap, KeepTypedValue],
  templateUrl: './lot-search-view.html',
  styleUrl: './lot-search-view.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LotSearchView {
  private readonly route = inject(ActivatedRoute);
  private readonly router = inject(Router);
  protected readonly compare = inject(CompareSelection);

  /** The filters chosen from a list. */
  protected readonly lists = [
    { key: 'forageType', label: FILTER_LABELS.forageType, options: Object.entries(FORAGE_TYPE_LABELS) },
    { key: 'baleType', label: FILTER_LABELS.baleType, options: Object.entries(BALE_TYPE_LABELS) },
  ] as const;
  protected readonly sorts = SORT_OPTIONS;

  protected readonly filters = inject(FormBuilder).nonNullable.group(
    Object.fromEntries(FILTER_KEYS.map((k) => [k, isTickFilter(k) ? false : ''])) as Record<string, string | boolean>,
  );

  /** The URL's query (the page's, so both read the same one). */
  readonly params = input.required<Record<string, string>>();
  /** The search for it, asked by the page. */
  readonly state = input.required<RequestState<LotSearchResult>>();

  /** What the API is asked (a distance sort without a ZIP is dropped, with a note). */
  protected readonly apiQuery = computed(() => apiQueryFor(this.params()));
  protected readonly result = computed(() => valueOf(this.state()));
  /** The API's message without its field prefix ("cpMin: …"), under our own lead-in. */
  protected readonly error = computed(() => errorOf(this.state())?.replace(/^[a-zA-Z]+: /, '') ?? null);
  /** On phones the filters fold away (closed until asked for); on wide screens they are always shown. */
  protected readonly filtersOpen = signal(false);
  /** The map is drawn on request (it loads the states' outlines). */
  protected readonly showMap = signal(false);
  protected readonly mapLots = computed(() => (this.result()?.items ?? []).map((l) => ({ id: l.id, title: l.title, lat: l.mapPoint.lat, lon: l.mapPoint.lon })));
  protected readonly mapOrigin = computed(() => {
    const o = this.result()?.origin;
    return o ? { lat: o.lat, lon: o.lon, label: `${o.city}, ${o.state} ${o.zip}` } : null;
  });
  protected readonly mapRadius = computed(() => (this.params()['zip'] && this.params()['radiusMi'] ? Number(this.params()['radiusMi']) : null));
  protected readonly sortNotice = signal<string | null>(null);
  protected readonly filterCount = computed(() => FILTER_KEYS.filter((k) => this.params()[k] !== undefined && k !== 'radiusMi').length);
  /** The query last sent from the form, so the URL echo does not overwrite what is being typed. */
  private lastApplied = '';
  protected readonly sort = computed(() => this.apiQuery().query['sort'] ?? 'newest');
  /** The sort box, kept showing the URL's order. */
  protected readonly sortControl = new FormControl('newest', { nonNullable: true });
  /** The comparison link carries the ZIP so delivered prices use the same place. */
  protected readonly compareParams = computed(() => ({ ids: this.compare.ids().join(','), zip: this.params()['zip'] }));
  /** Filters in the URL, each removable on its own from the empty state. */
  protected readonly activeFilters = computed(() =>
    FILTER_KEYS.filter((k) => this.params()[k] !== undefined && !(k === 'radiusMi' && this.params()['zip'] !== undefined)).map((key) => ({
      key,
      label: FILTER_LABELS[key],
      value: isTickFilter(key) ? '' : this.params()[key],
    })),
  );
  protected readonly hasFilters = computed(() => hasAnyFilter(this.params()));

  constructor() {
    // Filters apply as they change, once typing pauses.
    this.filters.valueChanges.pipe(debounceTime(450), takeUntilDestroyed()).subscribe(() => this.applyFilters());
    this.sortControl.valueChanges.pipe(takeUntilDestroyed()).subscribe((sort) => this.changeSort(sort));
    // Keep the form and the sort box showing what the URL says (also after back/forward).
    effect(() => this.sortControl.setValue(this.sort(), { emitEvent: false }));
    effect(() => {
      const p = this.params();
      if (JSON.stringify(pickFilters(p)) === this.lastApplied) return;
      this.filters.reset(
        Object.fromEntries(FILTER_KEYS.map((k) => [k, isTickFilter(k) ? p[k] === 'true' : (p[k] ?? '')])),
        { emitEvent: false },
      );
    });
  }

  /**
   * Marks the URL's choice in a list on the server's page (an attribute, which the browser shows before the
   * page wakes; once awake, the form sets the list itself).
   */
  protected chosen(key: string, value: string): '' | null {
    return (this.params()[key] ?? '') === value ? '' : null;
  }

  protected applyFilters(): void {
    const query = queryFromForm(this.filters.getRawValue());
    // A ZIP being typed is not a ZIP yet: leave distance out until it has five digits.
    if (query['zip'] !== undefined && !/^\d{5}$/.test(query['zip'])) {
      query['zip'] = this.params()['zip'];
      query['radiusMi'] = this.params()['radiusMi'];
    }
    const sort = query['zip'] === undefined && this.params()['sort'] === 'distance' ? undefined : this.params()['sort'];
    if (JSON.stringify(pickFilters(query)) === JSON.stringify(pickFilters(this.params()))) return;
    this.lastApplied = JSON.stringify(pickFilters(query));
    // Refining a search replaces the history entry, so Back returns to where the search started.
    this.navigate({ ...query, sort, pageSize: this.params()['pageSize'], page: undefined }, this.hasFilters());
  }

  /** The form's submit (Enter, or "Show hay" on a phone): apply now and fold the panel to show the lots. */
  protected showLots(): void {
    this.applyFilters();
    this.filtersOpen.set(false);
  }

  protected removeFilter(key: string): void {
    // A ZIP without it would leave a radius (or a distance sort) the API rejects, so they go together.
    const drop = key === 'zip' ? { zip: undefined, radiusMi: undefined, sort: this.params()['sort'] === 'distance' ? undefined : this.params()['sort'] } : { [key]: undefined };
    this.navigate({ ...this.params(), ...drop, page: undefined });
  }

  protected clearFilters(): void {
    // "Nearest" cannot outlive the ZIP it measures from.
    const sort = this.params()['sort'] === 'distance' ? undefined : this.params()['sort'];
    this.lastApplied = JSON.stringify({});
    this.sortNotice.set(null);
    this.navigate({ sort });
  }

  protected changeSort(sort: string): void {
    if (sort === 'distance' && !this.params()['zip']) {
      this.sortNotice.set('Give your ZIP code under “Price, quantity and distance” to sort by distance.');
      this.filtersOpen.set(true);
      // The list stays in its order, so the box says so too.
      this.sortControl.setValue(this.sort(), { emitEvent: false });
      return;
    }
    this.sortNotice.set(null);
    this.navigate({ ...this.params(), sort: sort === 'newest' ? undefined : sort, page: undefined });
  }

  protected changePage(event: PagerChange): void {
    this.navigate({ ...this.params(), page: event.page > 1 ? String(event.page) : undefined, pageSize: String(event.pageSize) });
  }

  private navigate(queryParams: Record<string, string | undefined>, replaceUrl = false): void {
    void this.router.navigate([], { relativeTo: this.route, queryParams, replaceUrl });
  }
}

function pickFilters(q: Record<string, string | undefined>): Record<string, string> {
  return Object.fromEntries(FILTER_KEYS.filter((k) => q[k] !== undefined && q[k] !== '').map((k) => [k, String(q[k])]));
}
