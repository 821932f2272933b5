import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, LOCALE_ID } from '@angular/core';
import { CORE_POSITION_LABELS } from '@shared/contracts/labels';
import type { LotAnalysisView, LotDetail } from '@shared/contracts/lots';
import { afgcGradeRule, type ForageEvaluation, nitrateNPpm, type Nutrients, usdaGradeRule, VISUAL_MOULD_LABELS } from '@shared/forage';
import { STORED_FIELDS } from '@shared/forage/analysis-fields';
import { lotCautions } from '@shared/safety/lot-cautions';
import { inLocale } from '../format';
import { FeedValueScale } from './figures/feed-value-scale';
import { GradeBands } from './figures/grade-bands';
import { NscGauge } from './figures/nsc-gauge';
import { GradeMark } from '../../../shared/ui/grade-mark';
import { usdaScaleFor } from '@shared/forage/grade-scale';
import { DE_METHOD_LABELS, FIGURE_MEANINGS, NSC_FLAG_TEXT, NSC_METHOD_LABELS, TDN_METHOD_LABELS } from './figure-notes';

/** The lab's shares of the sample from the analysis-field table, with the computed NSC after starch. */
const NUTRIENT_ROWS: { key: keyof Nutrients; label: string; precision: number }[] = STORED_FIELDS.filter((f) => f.basis === 'entered').flatMap((f) => {
  const row = { key: f.key, label: f.label, precision: f.precision };
  return f.key === 'starchPct' ? [row, { key: 'nscPct' as const, label: 'Non-structural carbohydrate (NSC)', precision: 1 }] : [row];
});

/** The lab analysis on dry-matter and as-fed bases, the computed indices, grades, findings and cautions. */
@Component({
  selector: 'app-lot-analysis-panel',
  imports: [DecimalPipe, NscGauge, FeedValueScale, GradeBands, GradeMark],
  templateUrl: './lot-analysis-panel.html',
  styleUrl: './lot-analysis-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LotAnalysisPanel {
  readonly analysis = input.required<LotAnalysisView>();
  readonly evaluation = input.required<ForageEvaluation>();
  readonly lot = input.required<LotDetail>();

  protected readonly usdaScale = computed(() => usdaScaleFor(this.lot().forageClass));

  protected readonly rows = computed(() => {
    const { dm, asFed } = this.evaluation();
    return NUTRIENT_ROWS.filter(({ key }) => dm[key] !== null).map(({ key, label, precision }) => ({ label, precision, dm: dm[key], asFed: asFed[key] }));
  });
  protected readonly cautions = computed(() => {
    const lot = this.lot();
    return lotCautions({
      forageClass: lot.forageClass,
      baleType: lot.baleType,
      moistureAtBalingPct: lot.moistureAtBalingPct,
      storage: lot.storage,
      nscFlag: this.evaluation().nscFlag,
      dryMatterPct: this.analysis().dryMatterPct,
      forageType: lot.forageType,
      nitrateTested: this.analysis().nitrateNo3PctDm !== null,
      droughtStressed: lot.droughtStressed,
      heavyNitrogen: lot.heavyNitrogen,
    });
  });
  protected readonly usdaRule = computed(() => usdaGradeRule(this.evaluation().grades.usda));
  protected readonly afgcRule = computed(() => {
    const afgc = this.evaluation().grades.afgc;
    return afgc === null ? null : afgcGradeRule(afgc);
  });
  protected readonly deMcalPerLbDm = computed(() => this.evaluation().horseDe.mcalPerLbDm);

  protected readonly meanings = FIGURE_MEANINGS;
  protected readonly tdnMethods = TDN_METHOD_LABELS;
  protected readonly deMethods = DE_METHOD_LABELS;
  protected readonly nscMethods = NSC_METHOD_LABELS;
  protected readonly nscFlags = NSC_FLAG_TEXT;
  protected readonly corePositions = CORE_POSITION_LABELS;
  protected readonly fixed = inLocale(inject(LOCALE_ID)).fixed;
  protected readonly mouldLabels = VISUAL_MOULD_LABELS;
  protected readonly nitrateN = nitrateNPpm;
}
