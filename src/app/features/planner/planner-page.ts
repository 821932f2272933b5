import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { FormsModule } from '@angular/forms';
import { MatButton, MatIconButton } from '@angular/material/button';
import { MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { ActivatedRoute, Router, RouterLink } from '@angular/router';
import { catchError, map, of, switchMap } from 'rxjs';
import { NITRATE_TEST_PROMPT, nitrateTestAdvised } from '@shared/forage/nitrate';
import { FEEDING_METHODS, type FeedingMethod, WASTE_ALLOWANCES } from '@shared/planner/feeding-methods';
import { HerdNeedsRequestSchema, planHerdNeeds } from '@shared/planner/herd-needs';
import { SORGHUM_TYPE_FORAGES } from '@shared/safety/lot-cautions';
import { fieldName, type GroupDraft, herdRequest, HORSE_CLASS_OPTIONS, newGroup } from './herd-draft';
import { HerdResults } from './herd-results';
import { PlannerApi } from './planner-api';
import { PurchasePlanPanel } from './purchase-plan-panel';
import { massIn, readerUnit } from './reader-units';
import { Icon } from '../../shared/ui/icon';

/** Herd needs (NRC 2007) → hay per day, tons and bales of a chosen lot → the least-cost purchase. */
@Component({
  selector: 'app-planner-page',
  imports: [DecimalPipe, FormsModule, RouterLink, MatButton, MatIconButton, Icon, MatFormField, MatLabel, MatHint, MatSuffix, MatInput, MatSelect, MatOption, HerdResults, PurchasePlanPanel],
  templateUrl: './planner-page.html',
  styleUrl: './planner-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PlannerPage {
  private readonly api = inject(PlannerApi);
  private readonly route = inject(ActivatedRoute);
  private readonly router = inject(Router);

  protected readonly classes = HORSE_CLASS_OPTIONS;
  protected readonly methods = FEEDING_METHODS.map((m) => ({ value: m, ...WASTE_ALLOWANCES[m] }));

  protected readonly groups = signal<GroupDraft[]>([newGroup()]);
  protected readonly days = signal<number | null>(365);
  protected readonly feedingMethod = signal<FeedingMethod>('small-square-feeder');
  protected readonly hayPct = signal<number | null>(100);

  protected readonly lotOptions = toSignal(this.api.lotOptions().pipe(catchError(() => of([]))), { initialValue: [] });
  protected readonly lotId = toSignal(this.route.queryParamMap.pipe(map((p) => Number(p.get('lot')) || null)), { initialValue: null });
  protected readonly lot = toSignal(
    this.route.queryParamMap.pipe(
      map((p) => Number(p.get('lot')) || null),
      switchMap((id) => (id ? this.api.lotFigures(id).pipe(catchError(() => of(null))) : of(null))),
    ),
    { initialValue: null },
  );

  /** The shared planner's request, checked by its schema; errors carry readable field names. */
  private readonly checked = computed(() => {
    const request = herdRequest(this.groups(), this.days(), this.feedingMethod(), this.hayPct());
    const lot = this.lot();
    const withLot = lot
      ? { ...request, lot: { dryMatterPct: lot.nutrients.dryMatterPct, crudeProteinPctDm: lot.nutrients.crudeProteinPct, deMcalPerKgDm: lot.nutrients.deMcalPerKgDm, baleWeightLb: lot.avgBaleWeightLb } }
      : request;
    const parsed = HerdNeedsRequestSchema.safeParse(withLot);
    return parsed.success
      ? { request, plan: planHerdNeeds(parsed.data), errors: [] as string[] }
      : { request, plan: null, errors: parsed.error.issues.map((i) => `${fieldName(i.path)}: ${i.message}`) };
  });
  protected readonly plan = computed(() => this.checked().plan);
  protected readonly errors = computed(() => this.checked().errors);
  /** The herd without a lot, for the purchase plan (the plan chooses lots itself). */
  protected readonly herdForPurchase = computed(() => (this.checked().plan ? this.checked().request : null));
  protected readonly waste = computed(() => WASTE_ALLOWANCES[this.feedingMethod()]);
  /** Small-grain and sorghum-type hays: the nitrate prompt (and the sorghum warning) beside the chosen lot. */
  protected readonly lotHazards = computed(() => {
    const lot = this.lot();
    if (!lot || !nitrateTestAdvised({ forageType: lot.forageType })) return null;
    return { nitrate: NITRATE_TEST_PROMPT, sorghum: SORGHUM_TYPE_FORAGES.has(lot.forageType) };
  });
  /** Answers come in the unit the herd was entered in. */
  protected readonly unit = computed(() => readerUnit(this.groups()));

  protected mass(kg: number): number {
    return massIn(kg, this.unit()).value;
  }

  protected updateGroup(index: number, patch: Partial<GroupDraft>): void {
    this.groups.update((list) => list.map((g, i) => (i === index ? { ...g, ...patch } : g)));
  }

  protected addGroup(): void {
    this.groups.update((list) => [...list, newGroup()]);
  }

  protected removeGroup(index: number): void {
    this.groups.update((list) => list.filter((_, i) => i !== index));
  }

  protected chooseLot(id: number | null): void {
    void this.router.navigate([], { relativeTo: this.route, queryParams: { lot: id ?? undefined }, queryParamsHandling: 'merge' });
  }
}
