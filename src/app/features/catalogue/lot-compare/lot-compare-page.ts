import { afterNextRender, ChangeDetectionStrategy, Component, computed, inject, LOCALE_ID } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { FormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatProgressBar } from '@angular/material/progress-bar';
import { ActivatedRoute, Router, RouterLink } from '@angular/router';
import { map, of, switchMap } from 'rxjs';
import type { LotComparison } from '@shared/contracts/compare';
import { errorOf, requestState, valueOf, type RequestState } from '../../../core/request-state';
import { CompareApi } from './compare-api';
import { compareSections } from './compare-rows';
import { CompareSelection } from './compare-selection';
import { NutrientStrips, type StripRow } from './nutrient-strips';

type CompareState = { status: 'idle' } | RequestState<LotComparison>;

/** Up to four lots side by side: nutrients on a DM basis and what each costs per unit delivered. */
@Component({
  selector: 'app-lot-compare-page',
  imports: [FormsModule, RouterLink, MatButton, MatFormField, MatLabel, MatHint, MatSuffix, MatInput, MatProgressBar, NutrientStrips],
  templateUrl: './lot-compare-page.html',
  styleUrl: './lot-compare-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LotComparePage {
  private readonly api = inject(CompareApi);
  private readonly route = inject(ActivatedRoute);
  private readonly router = inject(Router);
  private readonly selection = inject(CompareSelection);
  private readonly locale = inject(LOCALE_ID);

  protected readonly params = toSignal(this.route.queryParamMap.pipe(map((p) => ({ ids: p.get('ids') ?? '', zip: p.get('zip') ?? '', tons: p.get('tons') ?? '' }))), {
    initialValue: { ids: '', zip: '', tons: '' },
  });
  protected readonly ids = computed(() =>
    this.params()
      .ids.split(',')
      .map((s) => Number(s.trim()))
      .filter((n) => Number.isInteger(n) && n > 0),
  );

  protected readonly state = toSignal(
    this.route.queryParamMap.pipe(
      switchMap((p) => {
        const ids = (p.get('ids') ?? '').split(',').map(Number).filter((n) => Number.isInteger(n) && n > 0);
        if (ids.length === 0) return of<CompareState>({ status: 'idle' });
        return requestState<LotComparison>(this.api.compare({ ids, zip: p.get('zip') ?? undefined, tons: p.get('tons') ?? undefined }));
      }),
    ),
    { initialValue: { status: 'loading' } as CompareState },
  );

  protected readonly result = computed(() => valueOf(this.state()));
  protected readonly error = computed(() => errorOf(this.state()));
  protected readonly sections = computed(() => compareSections(this.result()?.items ?? [], this.locale));
  protected readonly chartLots = computed(() => (this.result()?.items ?? []).map((l) => l.title));
  /** For horses: more protein, energy and feed value is better; more fibre and more sugar + starch is worse. */
  protected readonly chartRows = computed<StripRow[]>(() => {
    const items = this.result()?.items ?? [];
    const row = (label: string, unit: string, better: 'higher' | 'lower', pick: (n: (typeof items)[number]['nutrients']) => number | null): StripRow => ({
      label, unit, better, values: items.map((l) => pick(l.nutrients)),
    });
    return [
      row('Crude protein', '% of DM', 'higher', (n) => n.crudeProteinPct),
      row('TDN', '% of DM', 'higher', (n) => n.tdnPct),
      row('RFV', 'index', 'higher', (n) => n.rfv),
      row('ADF', '% of DM', 'lower', (n) => n.adfPct),
      row('NDF', '% of DM', 'lower', (n) => n.ndfPct),
      row('NSC (sugar + starch)', '% of DM', 'lower', (n) => n.nscPct),
    ];
  });
  protected readonly atFarmNotes = computed(() => {
    const notes = (this.result()?.items ?? []).filter((l) => l.pricing.note).map((l) => `${l.title}: ${l.pricing.note}`);
    return [...new Set(notes)];
  });

  constructor() {
    afterNextRender(() => this.selection.restore());
  }

  protected priceDelivery(zip: string, tons: string): void {
    void this.router.navigate([], { relativeTo: this.route, queryParams: { zip: zip.trim() || undefined, tons: tons.trim() || undefined }, queryParamsHandling: 'merge' });
  }

  protected removeLot(id: number): void {
    this.selection.remove(id);
    const ids = this.ids().filter((x) => x !== id);
    void this.router.navigate([], { relativeTo: this.route, queryParams: { ids: ids.length ? ids.join(',') : undefined }, queryParamsHandling: 'merge' });
  }
}
