import { ChangeDetectionStrategy, Component, computed, effect, inject, input, output } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { CORE_POSITION_LABELS } from '@shared/contracts/labels';
import { lotDateIssues } from '@shared/contracts/lot-dates';
import { SamplingStepSchema, type EditableLot } from '@shared/contracts/selling';
import { samplingVerdictOf } from '@shared/forage/sampling-verdict';
import { FindingsList } from '../ui/findings-list';
import { SellingApi } from '../selling-api';
import { numberOrNull, StepSave } from './step-save';

/** Step 3: how the lab sample was taken, checked against the sampling protocol as the grower types. */
@Component({
  selector: 'app-sampling-step',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatHint, MatSuffix, MatInput, MatSelect, MatOption, MatButton, FindingsList],
  template: `
    <form [formGroup]="form" (ngSubmit)="save()">
      <p class="hint">The protocol: at least 20 cores, one from each of 20 bales chosen at random, with a sharp probe of at least 3/8 in internal diameter reaching 12–18 in deep.</p>
      <div class="grid">
        <mat-form-field appearance="outline"><mat-label>Sample date</mat-label><input matInput type="date" formControlName="sampledOn" />
          @if (dateIssue(); as e) { <mat-hint class="err">{{ e }}</mat-hint> }</mat-form-field>
        <mat-form-field appearance="outline"><mat-label>Cores taken</mat-label><input matInput type="number" inputmode="numeric" formControlName="coresTaken" /></mat-form-field>
        <mat-form-field appearance="outline"><mat-label>Bales sampled</mat-label><input matInput type="number" inputmode="numeric" formControlName="balesSampled" /></mat-form-field>
        <mat-form-field appearance="outline"><mat-label>Probe inside diameter</mat-label><input matInput type="number" step="0.0625" formControlName="probeDiameterIn" /><span matTextSuffix>in</span><mat-hint>3/8 in = 0.375</mat-hint></mat-form-field>
        <mat-form-field appearance="outline"><mat-label>Probe length</mat-label><input matInput type="number" formControlName="probeLengthIn" /><span matTextSuffix>in</span></mat-form-field>
        <mat-form-field appearance="outline">
          <mat-label>Where the cores were taken</mat-label>
          <mat-select formControlName="corePosition">
            @for (c of positions; track c[0]) { <mat-option [value]="c[0]">{{ c[1] }}</mat-option> }
          </mat-select>
        </mat-form-field>
        <mat-form-field appearance="outline"><mat-label>Who sampled</mat-label><input matInput formControlName="sampledBy" /><mat-hint>Person or company</mat-hint></mat-form-field>
      </div>
      <h3>Protocol check</h3>
      @if (check(); as c) {
        <p [class]="c.compliant ? 'ok' : 'bad'">{{ c.compliant ? 'Sampled to protocol.' : 'Not to protocol: buyers will see this lot as not sampled to protocol.' }}</p>
        <app-findings-list [findings]="c.findings" label="Sampling findings" />
      } @else {
        <p>Fill in the sampling details to check them against the protocol.</p>
      }
      @if (saving.error()) { <div class="bp-error-box" role="alert">{{ saving.error() }}</div> }
      <div class="actions"><button mat-flat-button type="submit" [disabled]="saving.busy()">Save and continue</button></div>
    </form>
  `,
  styleUrls: ['./step-form.scss'],
  styles: `.ok { color: var(--bp-ok); font-weight: 600; } .bad { color: var(--bp-error); font-weight: 600; } .hint { color: var(--mat-sys-on-surface-variant); }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SamplingStep {
  private readonly api = inject(SellingApi);
  readonly lot = input.required<EditableLot>();
  readonly saved = output<EditableLot>();

  protected readonly positions = Object.entries(CORE_POSITION_LABELS);
  protected readonly saving = new StepSave();
  protected readonly form = inject(FormBuilder).nonNullable.group({
    sampledOn: ['', Validators.required],
    coresTaken: [20 as number | string, Validators.required],
    balesSampled: [20 as number | string, Validators.required],
    probeDiameterIn: [0.5 as number | string, Validators.required],
    probeLengthIn: [18 as number | string, Validators.required],
    corePosition: ['butt-end-centre', Validators.required],
    sampledBy: ['', Validators.required],
  });
  private readonly value = toSignal(this.form.valueChanges, { initialValue: this.form.getRawValue() });

  /** The lot's date rules (shared with the server): on or after the harvest start, not after the report date. */
  protected readonly dateIssue = computed(() => {
    const l = this.lot();
    const [issue] = lotDateIssues({ harvestStartedOn: l.lot?.harvestStartedOn, sampledOn: this.value().sampledOn, reportDate: l.analysis?.reportDate }, new Date(), ['sampledOn']);
    return issue?.message ?? null;
  });

  /** The engine's sampling check, live, for what is typed so far. */
  protected readonly check = computed(() => {
    const parsed = SamplingStepSchema.safeParse(this.body(this.value()));
    const lot = this.lot();
    if (!parsed.success || !lot.lot || !lot.quantity) return null;
    return samplingVerdictOf({ ...lot.lot, ...lot.quantity }, parsed.data, new Date());
  });

  constructor() {
    effect(() => {
      const s = this.lot().sampling;
      if (s) this.form.reset(s);
    });
  }

  private body(v: Partial<ReturnType<typeof this.form.getRawValue>>) {
    return {
      sampledOn: v.sampledOn,
      coresTaken: numberOrNull(v.coresTaken),
      balesSampled: numberOrNull(v.balesSampled),
      probeDiameterIn: numberOrNull(v.probeDiameterIn),
      probeLengthIn: numberOrNull(v.probeLengthIn),
      corePosition: v.corePosition,
      sampledBy: v.sampledBy,
    };
  }

  protected async save(): Promise<void> {
    const lot = await this.saving.run(this.api.saveStep(this.lot().id, 'sampling', this.body(this.form.getRawValue())));
    if (lot) this.saved.emit(lot);
  }
}
