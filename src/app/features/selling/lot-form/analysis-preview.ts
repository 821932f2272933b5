import { ChangeDetectionStrategy, Component, inject, input, LOCALE_ID } from '@angular/core';
import type { ForageEvaluation } from '@shared/forage';
import { inLocale } from '../../catalogue/format';
import { FindingsList } from '../ui/findings-list';
import { GradeMark } from '../../../shared/ui/grade-mark';

/** The engine's figures for an analysis: RFV, RFQ, TDN, horse DE, NSC, grades and findings. */
@Component({
  selector: 'app-analysis-preview',
  imports: [FindingsList, GradeMark],
  template: `
    <h2 class="h">Computed figures</h2>
    @if (evaluation(); as e) {
      <dl class="figures bp-num">
        <dt>RFV</dt><dd data-figure="rfv">{{ fixed(e.rfv, 0) }}</dd>
        <dt>RFQ</dt><dd>{{ e.rfq === null ? '—' : fixed(e.rfq, 0) }}</dd>
        <dt>TDN</dt><dd>{{ fixed(e.tdnPct, 1) }}% DM</dd>
        <dt>Horse DE</dt><dd>{{ fixed(e.horseDe.mcalPerKgDm, 2) }} Mcal/kg DM</dd>
        <dt>NSC</dt><dd>{{ e.nscPct === null ? '—' : fixed(e.nscPct, 1) + '% DM' }}</dd>
        <dt>CP (DM)</dt><dd>{{ fixed(e.dm.crudeProteinPct, 1) }}%</dd>
        <dt>USDA grade</dt><dd><app-grade-mark [name]="e.grades.usda.name" [scale]="e.grades.usda.table === 'usda-ams-2003-grass' ? 'usda-grass' : 'usda-alfalfa'" /></dd>
        @if (e.grades.afgc; as afgc) { <dt>AFGC grade</dt><dd><app-grade-mark [name]="afgc.name" scale="afgc" /></dd> }
      </dl>
      <app-findings-list [findings]="e.findings" label="Analysis findings" emptyText="No findings: the values look consistent." />
    }
    @if (note()) { <p class="note" aria-live="polite">{{ note() }}</p> }
  `,
  styles: `
    :host { display: block; background: var(--mat-sys-surface-container-low); border-radius: 10px; padding: 12px 16px; }
    .h { margin: 0 0 8px; font-size: var(--bp-text-lg); }
    .figures { display: grid; grid-template-columns: auto 1fr; gap: 4px 12px; margin: 0; }
    dt { color: var(--mat-sys-on-surface-variant); }
    dd { margin: 0; font-weight: 600; }
    .note { color: var(--mat-sys-on-surface-variant); font-size: 0.875rem; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AnalysisPreview {
  readonly evaluation = input<ForageEvaluation | null>(null);
  readonly note = input('');
  protected readonly fixed = inLocale(inject(LOCALE_ID)).fixed;
}
