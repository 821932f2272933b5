import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { RouterLink } from '@angular/router';
import { BALE_TYPE_LABELS, FORAGE_TYPE_LABELS } from '@shared/contracts/labels';
import type { LotSummary } from '@shared/contracts/lots';
import { USDA_GRADE_RULE_SHORT } from '@shared/forage/grades';
import { dollars, fixed } from '../format';
import { CompareSelection } from '../lot-compare/compare-selection';

/** One lot in the catalogue grid: photo, the key measured figures, price per ton as-fed and of DM. */
@Component({
  selector: 'app-lot-card',
  imports: [RouterLink, MatButton],
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
  protected readonly srcset = computed(() => {
    const cover = this.lot().cover;
    if (!cover) return null;
    const webp = cover.variants.filter((v) => v.format === 'webp');
    return { src: webp[0]?.url ?? '', srcset: webp.map((v) => `${v.url} ${v.width}w`).join(', '), alt: cover.altText };
  });
  protected readonly dollars = dollars;
  protected readonly fixed = fixed;
}
