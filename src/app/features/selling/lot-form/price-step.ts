import { ChangeDetectionStrategy, Component, computed, effect, inject, input, LOCALE_ID, output } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { FormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatCheckbox } from '@angular/material/checkbox';
import { MatFormField, MatHint, MatLabel, MatPrefix, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatRadioButton, MatRadioGroup } from '@angular/material/radio';
import type { EditableLot } from '@shared/contracts/selling';
import { pricePerTonFromBaleCents } from '@shared/pricing/price-per-ton';
import { inLocale } from '../../catalogue/format';
import { SellingApi } from '../selling-api';
import { numberOrNull, StepSave, toCents, toDollars } from './step-save';

/** Step 6: price (per ton or per bale), minimum order, delivery and pickup. */
@Component({
  selector: 'app-price-step',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatHint, MatPrefix, MatSuffix, MatInput, MatRadioGroup, MatRadioButton, MatCheckbox, MatButton],
  template: `
    <form [formGroup]="form" (ngSubmit)="save()">
      <mat-radio-group formControlName="pricingUnit" aria-label="Price per" class="unit">
        <mat-radio-button value="ton">Price per ton</mat-radio-button>
        <mat-radio-button value="bale">Price per bale</mat-radio-button>
      </mat-radio-group>
      <div class="grid">
        @if (value().pricingUnit === 'ton') {
          <mat-form-field appearance="outline"><mat-label>Price per ton (as fed)</mat-label><span matTextPrefix>$&nbsp;</span><input matInput type="number" step="0.01" formControlName="pricePerTon" /></mat-form-field>
        } @else {
          <mat-form-field appearance="outline"><mat-label>Price per bale</mat-label><span matTextPrefix>$&nbsp;</span><input matInput type="number" step="0.01" formControlName="pricePerBale" />
            <mat-hint class="bp-num">= {{ perTonFromBale() }} per ton at {{ lot().quantity?.avgBaleWeightLb }} lb a bale</mat-hint></mat-form-field>
        }
        <mat-form-field appearance="outline"><mat-label>Minimum order</mat-label><input matInput type="number" step="0.5" formControlName="minOrderTons" /><span matTextSuffix>tons</span></mat-form-field>
        <mat-form-field appearance="outline"><mat-label>Freight per loaded mile</mat-label><span matTextPrefix>$&nbsp;</span><input matInput type="number" step="0.01" formControlName="freightPerMile" /><mat-hint>Leave empty if you do not deliver</mat-hint></mat-form-field>
        <mat-form-field appearance="outline" class="wide"><mat-label>Delivery terms</mat-label><textarea matInput rows="2" formControlName="deliveryTerms"></textarea><mat-hint>Truck type, loading, how far you go, scale tickets…</mat-hint></mat-form-field>
      </div>
      <mat-checkbox formControlName="pickupAllowed">Buyers may pick up at the farm</mat-checkbox>
      <p class="small">Loads must respect legal truck weights; buyers arrange their own permits for pickup.</p>
      @if (saving.error()) { <div class="bp-error-box" role="alert">{{ saving.error() }}</div> }
      <div class="actions"><button mat-flat-button type="submit" [disabled]="saving.busy()">Save and continue</button></div>
    </form>
  `,
  styleUrls: ['./step-form.scss'],
  styles: `.unit { display: flex; gap: 16px; margin-bottom: 12px; } .small { font-size: 0.875rem; color: var(--mat-sys-on-surface-variant); }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PriceStep {
  private readonly api = inject(SellingApi);
  private readonly dollars = inLocale(inject(LOCALE_ID)).dollars;
  readonly lot = input.required<EditableLot>();
  readonly saved = output<EditableLot>();

  protected readonly saving = new StepSave();
  protected readonly form = inject(FormBuilder).nonNullable.group({
    pricingUnit: ['ton' as 'ton' | 'bale'],
    pricePerTon: ['' as number | string],
    pricePerBale: ['' as number | string],
    minOrderTons: [0 as number | string],
    freightPerMile: ['' as number | string],
    deliveryTerms: [''],
    pickupAllowed: [true],
  });
  protected readonly value = toSignal(this.form.valueChanges, { initialValue: this.form.getRawValue() });
  protected readonly perTonFromBale = computed(() => {
    const cents = toCents(this.value().pricePerBale);
    const weight = this.lot().quantity?.avgBaleWeightLb;
    return cents && weight ? this.dollars(pricePerTonFromBaleCents(cents, weight), 2) : '—';
  });

  constructor() {
    effect(() => {
      const p = this.lot().price;
      if (!p) return;
      this.form.reset({
        pricingUnit: p.pricingUnit,
        pricePerTon: toDollars(p.priceCentsPerTon) ?? '',
        pricePerBale: toDollars(p.priceCentsPerBale) ?? '',
        minOrderTons: p.minOrderTons,
        freightPerMile: toDollars(p.freightCentsPerLoadedMile) ?? '',
        deliveryTerms: p.deliveryTerms,
        pickupAllowed: p.pickupAllowed,
      });
    });
  }

  protected async save(): Promise<void> {
    const v = this.form.getRawValue();
    const body = {
      pricingUnit: v.pricingUnit,
      priceCentsPerTon: v.pricingUnit === 'ton' ? toCents(v.pricePerTon) : null,
      priceCentsPerBale: v.pricingUnit === 'bale' ? toCents(v.pricePerBale) : null,
      minOrderTons: numberOrNull(v.minOrderTons) ?? 0,
      freightCentsPerLoadedMile: toCents(v.freightPerMile),
      deliveryTerms: v.deliveryTerms,
      pickupAllowed: v.pickupAllowed,
    };
    const lot = await this.saving.run(this.api.saveStep(this.lot().id, 'price', body));
    if (lot) this.saved.emit(lot);
  }
}
