import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { CORE_POSITION_LABELS } from '../../../../../shared/contracts/labels';
import type { LotAnalysisView, LotDetail, LotSamplingView } from '../../../../../shared/contracts/lots';
import { fixed } from '../format';

interface NutrientRow {
  label: string;
  dm: number;
}

/** The lab analysis on dry-matter and as-fed bases, with the sampling record. */
@Component({
  selector: 'app-lot-analysis-panel',
  templateUrl: './lot-analysis-panel.html',
  styleUrl: './lot-analysis-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LotAnalysisPanel {
  readonly analysis = input.required<LotAnalysisView>();
  readonly forageClass = input.required<LotDetail['forageClass']>();
  readonly sampling = input<LotSamplingView | null>(null);
  readonly lot = input.required<LotDetail>();

  protected readonly rows = computed<NutrientRow[]>(() => {
    const a = this.analysis();
    const rows: [string, number | null][] = [
      ['Crude protein (CP)', a.crudeProteinPct],
      ['Acid detergent fibre (ADF)', a.adfPct],
      ['Neutral detergent fibre (NDF)', a.ndfPct],
      ['NDF digestibility, 48 h (% of NDF)', a.ndfd48Pct],
      ['Crude fat (EE)', a.fatPct],
      ['Ash', a.ashPct],
      ['Ethanol-soluble carbohydrate (ESC)', a.escPct],
      ['Water-soluble carbohydrate (WSC)', a.wscPct],
      ['Starch', a.starchPct],
      ['Calcium', a.calciumPct],
      ['Phosphorus', a.phosphorusPct],
    ];
    return rows.filter((r): r is [string, number] => r[1] !== null).map(([label, dm]) => ({ label, dm }));
  });
  /** NDFD is a share of NDF, not of the hay, so it has no as-fed value. */
  protected asFed(row: NutrientRow): string {
    return row.label.startsWith('NDF digestibility') ? '—' : fixed((row.dm * this.analysis().dryMatterPct) / 100);
  }
  protected readonly corePositions = CORE_POSITION_LABELS;
  protected readonly fixed = fixed;
}
