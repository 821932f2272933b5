import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { RouterLink } from '@angular/router';
import { BALE_TYPE_LABELS, FORAGE_TYPE_LABELS } from '../../../../../shared/contracts/labels';
import type { LotSummary } from '../../../../../shared/contracts/lots';
import { dollars, fixed } from '../format';

/** One lot in the catalogue grid: photo, the key measured figures, price per ton as-fed and of DM. */
@Component({
  selector: 'app-lot-card',
  imports: [RouterLink],
  templateUrl: './lot-card.html',
  styleUrl: './lot-card.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LotCard {
  readonly lot = input.required<LotSummary>();

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
