import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, LOCALE_ID, output } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { BALE_TYPE_LABELS, FORAGE_TYPE_LABELS } from '@shared/contracts/labels';
import type { EditableLot } from '@shared/contracts/selling';
import { inLocale } from '../../catalogue/format';
import { MoneyPipe } from '../../../shared/ui/money-pipe';
import { cautionInputOf, CautionsList } from '../ui/cautions-list';
import { FindingsList } from '../ui/findings-list';
import { SellingApi } from '../selling-api';
import { AnalysisPreview } from './analysis-preview';
import { StepSave } from './step-save';

/** Step 7: the listing as a whole, what still blocks it, the cautions buyers will see, and submit. */
@Component({
  selector: 'app-review-step',
  imports: [MoneyPipe, MatButton, DatePipe, AnalysisPreview, FindingsList, CautionsList],
  template: `
    @let l = lot();
    <div class="cols">
      <section>
        <h3>{{ l.title }}</h3>
        <dl class="bp-num">
          @if (l.lot; as s) { <dt>Hay</dt><dd>{{ forage[s.forageType] }}, cutting {{ s.cutting }}, harvested {{ s.harvestStartedOn | date: 'mediumDate' : 'UTC' }} – {{ s.harvestEndedOn | date: 'mediumDate' : 'UTC' }}</dd> }
          @if (l.quantity; as q) { <dt>Quantity</dt><dd>{{ q.baleCount }} × {{ bales[q.baleType] }} of {{ fixed(q.avgBaleWeightLb, 0) }} lb ≈ {{ fixed(q.totalTons, 1) }} tons</dd> }
          @if (l.price; as p) {
            <dt>Price</dt><dd>{{ p.priceCentsPerTon ?? 0 | money: 0 }} per ton @if (p.priceCentsPerBale) { ({{ p.priceCentsPerBale | money }} per bale) }</dd>
            <dt>Minimum order</dt><dd>{{ p.minOrderTons > 0 ? fixed(p.minOrderTons, 1) + ' tons' : 'None' }}</dd>
            <dt>Delivery</dt><dd>{{ p.freightCentsPerLoadedMile === null ? 'You do not deliver' : (p.freightCentsPerLoadedMile | money) + ' per loaded mile' }}@if (p.deliveryTerms) { — {{ p.deliveryTerms }} }</dd>
            <dt>Pickup</dt><dd>{{ p.pickupAllowed ? 'Buyers may collect at the farm' : 'No pickup' }}</dd>
          }
          @if (l.analysis; as a) {
            <dt>Lab</dt><dd>{{ a.labName }}, report of {{ a.reportDate | date: 'mediumDate' : 'UTC' }} — PDF {{ a.reportFile ? 'attached' : 'missing' }}</dd>
            <dt>Lab certification</dt><dd>{{ a.labCertified ? 'Certified for forage testing' : 'Not certified (buyers filtering for certified labs will not see this lot)' }}</dd>
          }
          <dt>Photos</dt><dd>{{ l.photos.length }}</dd>
        </dl>
        @if (l.samplingReport; as s) {
          <h3>Sampling</h3>
          <app-findings-list [findings]="s.findings" label="Sampling findings" [emptyText]="s.compliant ? 'Sampled to protocol.' : ''" />
        }
        @if (cautionInput(); as c) {
          <h3>What to watch as the grower</h3><app-cautions-list [lot]="c" audience="grower" />
          <details><summary>What buyers will be told</summary><app-cautions-list [lot]="c" /></details>
        }
      </section>
      <aside><app-analysis-preview [evaluation]="l.evaluation" /></aside>
    </div>
    @if (l.missing.length > 0) {
      <div class="bp-caution" role="note">Before submitting, add {{ l.missing.join(', ') }}.</div>
    }
    @if (saving.error()) { <div class="bp-error-box" role="alert">{{ saving.error() }}</div> }
    <div class="actions">
      @if (l.status === 'draft' || l.status === 'returned') {
        <button mat-flat-button type="button" (click)="submit()" [disabled]="saving.busy() || l.missing.length > 0">Submit for review</button>
        <span class="small">A reviewer checks the lab report against your values; you get an e-mail when it is listed.</span>
      } @else {
        <span>This lot is {{ l.status === 'in_review' ? 'with the reviewer' : 'already past review' }}; changes you save are kept.</span>
      }
    </div>
  `,
  styleUrls: ['./step-form.scss'],
  styles: `
    .cols { display: grid; grid-template-columns: minmax(0, 1fr) 300px; gap: 24px; }
    @media (max-width: 900px) { .cols { grid-template-columns: 1fr; } }
    dl { display: grid; grid-template-columns: auto 1fr; gap: 4px 12px; }
    dt { color: var(--bp-muted); } dd { margin: 0; }
    .small { font-size: 0.875rem; color: var(--bp-muted); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReviewStep {
  private readonly api = inject(SellingApi);
  readonly lot = input.required<EditableLot>();
  readonly submitted = output<EditableLot>();

  protected readonly saving = new StepSave();
  protected readonly forage = FORAGE_TYPE_LABELS;
  protected readonly bales = BALE_TYPE_LABELS;
  protected readonly fixed = inLocale(inject(LOCALE_ID)).fixed;
  protected readonly cautionInput = computed(() => cautionInputOf(this.lot()));

  protected async submit(): Promise<void> {
    const lot = await this.saving.run(this.api.act(this.lot().id, 'submit'));
    if (lot) this.submitted.emit(lot);
  }
}
