import { ChangeDetectionStrategy, Component, computed, effect, inject, input, LOCALE_ID, output } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { BALE_TYPE_LABELS } from '@shared/contracts/labels';
import { deriveQuantity, type EditableLot } from '@shared/contracts/selling';
import { inLocale } from '../../catalogue/format';
import { SellingApi } from '../selling-api';
import { numberOrNull, StepSave } from './step-save';

/** Typical weights to prefill (domain brief §11; always better replaced by the grower's scale ticket). */
const TYPICAL_WEIGHT_LB: Record<string, number> = {
  small_square_2_string: 60,
  small_square_3_string: 110,
  large_square_3x3x8: 900,
  large_square_3x4x8: 1200,
  large_square_4x4x8: 1800,
  round_4x4: 500,
  round_4x5: 1000,
  round_5x5: 1300,
  round_5x6: 1900,
};

/** Step 2: bale type and how much hay — any two of bale count, bale weight and total tons. */
@Component({
  selector: 'app-quantity-step',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatHint, MatSuffix, MatInput, MatSelect, MatOption, MatButton],
  template: `
    <form [formGroup]="form" (ngSubmit)="save()">
      <div class="grid">
        <mat-form-field appearance="outline">
          <mat-label>Bale type</mat-label>
          <mat-select formControlName="baleType" (selectionChange)="suggestWeight()">
            @for (b of baleTypes; track b[0]) { <mat-option [value]="b[0]">{{ b[1] }}</mat-option> }
          </mat-select>
        </mat-form-field>
        <mat-form-field appearance="outline"><mat-label>Bale count</mat-label><input matInput type="number" inputmode="numeric" formControlName="baleCount" /></mat-form-field>
        <mat-form-field appearance="outline"><mat-label>Average bale weight</mat-label><input matInput type="number" formControlName="avgBaleWeightLb" /><span matTextSuffix>lb</span><mat-hint>From a scale ticket if you have one</mat-hint></mat-form-field>
        <mat-form-field appearance="outline"><mat-label>Total</mat-label><input matInput type="number" step="0.01" formControlName="totalTons" /><span matTextSuffix>tons</span><mat-hint>Or leave one of the three empty</mat-hint></mat-form-field>
        @if (lot().quantity) {
          <mat-form-field appearance="outline"><mat-label>Bales still for sale</mat-label><input matInput type="number" inputmode="numeric" formControlName="balesAvailable" /></mat-form-field>
        }
      </div>
      <p class="derived bp-num" aria-live="polite">
        @if (derived(); as d) {
          {{ d.baleCount }} bales × {{ fixed(d.avgBaleWeightLb, 0) }} lb = <strong>{{ fixed(d.totalTons, 2) }} tons</strong> as fed
          @if (d.totalTons > 200) { — over 200 tons is more than one lab sample should represent; consider splitting the lot. }
        } @else { Give two of the three figures and the third is worked out. }
      </p>
      @if (saving.error()) { <div class="bp-error-box" role="alert">{{ saving.error() }}</div> }
      <div class="actions"><button mat-flat-button type="submit" [disabled]="saving.busy()">Save and continue</button></div>
    </form>
  `,
  styleUrl: './step-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class QuantityStep {
  private readonly api = inject(SellingApi);
  readonly lot = input.required<EditableLot>();
  readonly saved = output<EditableLot>();

  protected readonly baleTypes = Object.entries(BALE_TYPE_LABELS);
  protected readonly fixed = inLocale(inject(LOCALE_ID)).fixed;
  protected readonly saving = new StepSave();
  protected readonly form = inject(FormBuilder).nonNullable.group({
    baleType: ['small_square_2_string', Validators.required],
    baleCount: ['' as number | string],
    avgBaleWeightLb: [60 as number | string],
    totalTons: ['' as number | string],
    balesAvailable: ['' as number | string],
  });
  private readonly value = toSignal(this.form.valueChanges, { initialValue: this.form.getRawValue() });
  protected readonly derived = computed(() => {
    const v = this.value();
    const d = deriveQuantity({ baleCount: numberOrNull(v.baleCount), avgBaleWeightLb: numberOrNull(v.avgBaleWeightLb), totalTons: numberOrNull(v.totalTons) });
    return d && Number.isFinite(d.totalTons) && d.baleCount > 0 ? d : null;
  });

  constructor() {
    effect(() => {
      const q = this.lot().quantity;
      if (q) this.form.reset({ baleType: q.baleType, baleCount: q.baleCount, avgBaleWeightLb: q.avgBaleWeightLb, totalTons: '', balesAvailable: q.balesAvailable });
    });
  }

  protected suggestWeight(): void {
    const typical = TYPICAL_WEIGHT_LB[this.form.controls.baleType.value];
    if (typical && !this.lot().quantity) this.form.controls.avgBaleWeightLb.setValue(typical);
  }

  protected async save(): Promise<void> {
    const v = this.form.getRawValue();
    const body = {
      baleType: v.baleType,
      baleCount: numberOrNull(v.baleCount),
      avgBaleWeightLb: numberOrNull(v.avgBaleWeightLb),
      totalTons: numberOrNull(v.totalTons),
      balesAvailable: this.lot().quantity ? numberOrNull(v.balesAvailable) : null,
    };
    const lot = await this.saving.run(this.api.saveStep(this.lot().id, 'quantity', body));
    if (lot) this.saved.emit(lot);
  }
}
