import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { RouterLink } from '@angular/router';
import { BALE_TYPE_LABELS, FORAGE_TYPE_LABELS } from '@shared/contracts/labels';
import type { LotSummary } from '@shared/contracts/lots';
import { USDA_GRADE_RULE_SHORT } from '@shared/forage/grades';
import { usdaScaleFor } from '@shared/forage/grade-scale';
import { GradeMark } from '../../../shared/ui/grade-mark';
import { MoneyPipe } from '../../../shared/ui/money-pipe';
import { cuttingLabel, distanceLabel } from '../format';
import { CompareSelection } from '../lot-compare/compare-selection';

/** One lot in the catalogue, drawn as a lab sample tag: lot number, grade on its scale, the assay, both prices. */
@Component({
  selector: 'app-lot-card',
  imports: [RouterLink, DecimalPipe, MoneyPipe, GradeMark],
  templateUrl: './lot-card.html',
  styleUrl: './lot-card.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LotCard {
  protected readonly selection = inject(CompareSelection);
  readonly lot = input.required<LotSummary>();

  protected readonly compared = computed(() => this.selection.ids().includes(this.lot().id));
  protected readonly gradeRule = USDA_GRADE_RULE_SHORT;
  protected readonly forage = computed(() => FORAGE_TYPE_LABELS[this.lot().forageType]);
  protected readonly bale = computed(() => BALE_TYPE_LABELS[this.lot().baleType]);
  protected readonly cuttingLabel = computed(() => cuttingLabel(this.lot().cutting));
  protected readonly gradeScale = computed(() => usdaScaleFor(this.lot().forageClass));
  protected readonly distance = computed(() => distanceLabel(this.lot().distanceMi));
  protected readonly srcset = computed(() => {
    const cover = this.lot().cover;
    if (!cover) return null;
    const webp = cover.variants.filter((v) => v.format === 'webp');
    return { src: webp[0]?.url ?? '', srcset: webp.map((v) => `${v.url} ${v.width}w`).join(', '), alt: cover.altText };
  });
}
