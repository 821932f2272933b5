import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import type { RetestJudgement } from '@shared/claims/judge-retest';

/**
 * A claim's retest beside the listed analysis, as the forage engine judged it: per nutrient the listed value,
 * the retest, the difference and the tolerance (a row beyond it is marked in words, not colour alone), then
 * RFV and the USDA grade each gives. Shown to the admin who decides and to the buyer and grower.
 */
@Component({
  selector: 'app-retest-table',
  imports: [DecimalPipe],
  template: `
    <table [attr.aria-label]="label()">
      <thead><tr><th scope="col">Nutrient</th><th scope="col" class="n">Listed</th><th scope="col" class="n">Retest</th><th scope="col" class="n">Difference</th><th scope="col" class="n">Tolerance</th><th scope="col">Unit</th></tr></thead>
      <tbody>
        @for (n of judgement().nutrients; track n.field) {
          <tr [class.outside]="n.outside"><th scope="row">{{ n.label }}</th><td class="n">{{ (n.listed | number: '1.0-2') ?? '—' }}</td><td class="n">{{ (n.retest | number: '1.1-1') ?? '—' }}</td><td class="n">{{ (n.difference | number: '1.0-2') ?? '—' }}</td><td class="n">±{{ n.tolerance | number: '1.0-2' }}</td><td>{{ n.unit }}{{ n.outside ? ' — beyond tolerance' : '' }}</td></tr>
        }
        <tr><th scope="row">RFV / USDA grade</th><td class="n">{{ judgement().listed.rfv | number: '1.0-0' }} · {{ judgement().listed.usdaGrade }}</td><td class="n">{{ judgement().retest.rfv | number: '1.0-0' }} · {{ judgement().retest.usdaGrade }}</td><td colspan="3">{{ judgement().gradeChanged ? 'the retest gives another grade' : 'same grade' }}</td></tr>
      </tbody>
    </table>
  `,
  styles: `
    :host { display: block; overflow-x: auto; }
    table { border-collapse: collapse; margin: 6px 0 12px; }
    th, td { padding: 4px 8px; border-bottom: 1px solid var(--bp-rule); text-align: left; vertical-align: top; }
    .n { text-align: right; font-variant-numeric: tabular-nums; }
    .outside { background: var(--bp-error-bg, #fbe9e7); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RetestTable {
  readonly judgement = input.required<RetestJudgement>();
  /** The table's accessible name. */
  readonly label = input.required<string>();
}
