import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import type { ForageEvaluation } from '@shared/forage';
import { fixed } from '../../catalogue/format';
import { FindingsList } from '../ui/findings-list';

/** The engine's figures for an analysis: RFV, RFQ, TDN, horse DE, NSC, grades and findings. */
@Component({
  selector: 'app-analysis-preview',
  imports: [FindingsList],
  template: `
    <h3>Computed figures</h3>
    @if (evaluation(); as e) {
      <dl class="figures bp-num">
        <dt>RFV</dt><dd data-figure="rfv">{{ fixed(e.rfv, 0) }}</dd>
        <dt>RFQ</dt><dd>{{ e.rfq === null ? '—' : fixed(e.rfq, 0) }}</dd>
        <dt>TDN</dt><dd>{{ fixed(e.tdnPct, 1) }}% DM</dd>
        <dt>Horse DE</dt><dd>{{ fixed(e.horseDe.mcalPerLbDm, 2) }} Mcal/lb DM</dd>
        <dt>NSC</dt><dd>{{ e.nscPct === null ? '—' : fixed(e.nscPct, 1) + '% DM' }}</dd>
        <dt>CP (DM)</dt><dd>{{ fixed(e.dm.crudeProteinPct, 1) }}%</dd>
        <dt>USDA grade</dt><dd>{{ e.grades.usda.name }}</dd>
        @if (e.grades.afgc) { <dt>AFGC grade</dt><dd>{{ e.grades.afgc.name }}</dd> }
      </dl>
      <app-findings-list [findings]="e.findings" label="Analysis findings" emptyText="No findings: the values look consistent." />
    }
    @if (note()) { <p class="note" aria-live="polite">{{ note() }}</p> }
  `,
  styles: `
    :host { display: block; background: var(--mat-sys-surface-container-low); border-radius: 10px; padding: 12px 16px; }
    h3 { margin: 0 0 8px; }
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
  protected readonly fixed = fixed;
}
