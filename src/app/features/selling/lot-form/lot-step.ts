import { ChangeDetectionStrategy, Component, computed, effect, inject, input, output } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatCheckbox } from '@angular/material/checkbox';
import { MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { FORAGE_TYPE_LABELS, STORAGE_LABELS } from '@shared/contracts/labels';
import type { ForageType } from '@shared/contracts/lots';
import { defaultLotTitle, FORAGE_CLASS_OF, type EditableLot } from '@shared/contracts/selling';
import { lotDateIssues, type LotDateField } from '@shared/contracts/lot-dates';
import { CautionsList } from '../ui/cautions-list';
import { SellingApi } from '../selling-api';
import { numberOrNull, StepSave } from './step-save';

/** Step 1: which hay this is — field, cutting, forage, harvest dates, storage and baling moisture. */
@Component({
  selector: 'app-lot-step',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatHint, MatSuffix, MatInput, MatSelect, MatOption, MatButton, MatCheckbox, CautionsList],
  template: `
    <form [formGroup]="form" (ngSubmit)="save()">
      <div class="grid">
        <mat-form-field appearance="outline"><mat-label>Field name</mat-label><input matInput formControlName="fieldName" required /></mat-form-field>
        <mat-form-field appearance="outline"><mat-label>Cutting</mat-label><input matInput type="number" min="1" max="8" formControlName="cutting" inputmode="numeric" /></mat-form-field>
        <mat-form-field appearance="outline">
          <mat-label>Forage type</mat-label>
          <mat-select formControlName="forageType">
            @for (f of forageTypes; track f[0]) { <mat-option [value]="f[0]">{{ f[1] }}</mat-option> }
          </mat-select>
        </mat-form-field>
        <mat-form-field appearance="outline"><mat-label>Mix (if any)</mat-label><input matInput formControlName="mixDescription" /><mat-hint>e.g. 70% alfalfa, 30% orchardgrass</mat-hint></mat-form-field>
        <mat-form-field appearance="outline"><mat-label>Harvest started</mat-label><input matInput type="date" formControlName="harvestStartedOn" />
          @if (dateIssue('harvestStartedOn'); as e) { <mat-hint class="err">{{ e }}</mat-hint> }</mat-form-field>
        <mat-form-field appearance="outline"><mat-label>Harvest ended</mat-label><input matInput type="date" formControlName="harvestEndedOn" />
          @if (dateIssue('harvestEndedOn') ?? saving.fieldErrors()['harvestEndedOn']; as e) { <mat-hint class="err">{{ e }}</mat-hint> }
        </mat-form-field>
        <mat-form-field appearance="outline">
          <mat-label>Storage</mat-label>
          <mat-select formControlName="storage">
            @for (s of storages; track s[0]) { <mat-option [value]="s[0]">{{ s[1] }}</mat-option> }
          </mat-select>
        </mat-form-field>
        <mat-form-field appearance="outline"><mat-label>Moisture at baling</mat-label><input matInput type="number" step="0.1" formControlName="moistureAtBalingPct" /><span matTextSuffix>%</span></mat-form-field>
        <fieldset class="wide growing">
          <legend>Growing conditions (optional)</legend>
          <mat-checkbox formControlName="droughtStressed">The crop was drought-stressed</mat-checkbox>
          <mat-checkbox formControlName="heavyNitrogen">The field had heavy nitrogen fertiliser or manure</mat-checkbox>
          <p class="hint">Either can raise nitrate in the hay; buyers are asked to look for a nitrate result.</p>
        </fieldset>
        <mat-form-field appearance="outline" class="wide"><mat-label>Title</mat-label><input matInput formControlName="title" [placeholder]="suggestedTitle()" /><mat-hint>Leave empty for “{{ suggestedTitle() }}”</mat-hint></mat-form-field>
        <mat-form-field appearance="outline" class="wide"><mat-label>Description for buyers</mat-label><textarea matInput rows="3" formControlName="description"></textarea></mat-form-field>
      </div>
      <h3>What to watch as the grower</h3>
      <app-cautions-list [lot]="cautionInput()" audience="grower" />
      @if (saving.error()) { <div class="bp-error-box" role="alert">{{ saving.error() }}</div> }
      <div class="actions">
        <button mat-flat-button type="submit" [disabled]="saving.busy()">Save and continue</button>
      </div>
    </form>
  `,
  styleUrl: './step-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LotStep {
  private readonly api = inject(SellingApi);
  readonly lot = input<EditableLot | null>(null);
  readonly saved = output<EditableLot>();

  protected readonly forageTypes = Object.entries(FORAGE_TYPE_LABELS);
  protected readonly storages = Object.entries(STORAGE_LABELS);
  protected readonly saving = new StepSave();
  protected readonly form = inject(FormBuilder).nonNullable.group({
    fieldName: ['', Validators.required],
    cutting: [1 as number | string, [Validators.required, Validators.min(1), Validators.max(8)]],
    forageType: ['alfalfa', Validators.required],
    mixDescription: [''],
    harvestStartedOn: ['', Validators.required],
    harvestEndedOn: ['', Validators.required],
    storage: ['barn', Validators.required],
    moistureAtBalingPct: ['' as number | string],
    droughtStressed: [false],
    heavyNitrogen: [false],
    title: [''],
    description: [''],
  });
  private readonly value = toSignal(this.form.valueChanges, { initialValue: this.form.getRawValue() });
  /** The lot's date rules (shared with the server), live for the dates typed and those saved in later steps. */
  private readonly dateIssues = computed(() => {
    const v = this.value();
    const l = this.lot();
    return lotDateIssues({ harvestStartedOn: v.harvestStartedOn, harvestEndedOn: v.harvestEndedOn, sampledOn: l?.sampling?.sampledOn, reportDate: l?.analysis?.reportDate }, new Date(), ['harvestStartedOn', 'harvestEndedOn']);
  });
  protected dateIssue(field: LotDateField): string | null {
    return this.dateIssues().find((i) => i.path === field)?.message ?? null;
  }
  protected readonly suggestedTitle = computed(() => {
    const v = this.value();
    return defaultLotTitle({ forageType: (v.forageType ?? 'alfalfa') as never, cutting: Number(v.cutting) || 1, fieldName: v.fieldName || 'field' });
  });
  protected readonly cautionInput = computed(() => {
    const v = this.value();
    return {
      forageClass: FORAGE_CLASS_OF[(v.forageType ?? 'alfalfa') as keyof typeof FORAGE_CLASS_OF],
      baleType: this.lot()?.quantity?.baleType ?? 'small_square_2_string',
      moistureAtBalingPct: numberOrNull(v.moistureAtBalingPct),
      storage: (v.storage ?? 'barn') as 'barn',
      nscFlag: this.lot()?.evaluation?.nscFlag ?? null,
      forageType: (v.forageType ?? null) as ForageType | null,
      nitrateTested: this.lot()?.analysis?.values['nitrateNo3PctDm'] !== undefined,
      droughtStressed: v.droughtStressed ?? false,
      heavyNitrogen: v.heavyNitrogen ?? false,
    };
  });

  constructor() {
    effect(() => {
      const l = this.lot()?.lot;
      if (l) this.form.reset({ ...l, moistureAtBalingPct: l.moistureAtBalingPct ?? '' }, { emitEvent: true });
    });
  }

  protected async save(): Promise<void> {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const v = this.form.getRawValue();
    const body = { ...v, cutting: Number(v.cutting), moistureAtBalingPct: numberOrNull(v.moistureAtBalingPct) };
    const id = this.lot()?.id;
    const lot = await this.saving.run(id ? this.api.saveStep(id, 'lot', body) : this.api.create(body));
    if (lot) this.saved.emit(lot);
  }
}
