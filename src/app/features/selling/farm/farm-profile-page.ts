import { DOCUMENT } from '@angular/common';
import { ChangeDetectionStrategy, Component, inject, input, OnInit, signal } from '@angular/core';
import { FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { RouterLink } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import type { FarmProfile } from '@shared/contracts/selling';
import { FARM_TIME_ZONES } from '@shared/time/farm-time';
import { apiErrorMessage, apiFieldErrors } from '../../../core/api-error';
import { SellingApi } from '../selling-api';
import { Icon } from '../../../shared/ui/icon';

/** Farm profile (where hay is loaded, how far it goes) and payout account set-up. */
@Component({
  selector: 'app-farm-profile-page',
  imports: [ReactiveFormsModule, RouterLink, MatFormField, MatLabel, MatHint, MatSuffix, MatInput, MatButton, Icon],
  templateUrl: './farm-profile-page.html',
  styleUrl: './farm-profile-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FarmProfilePage implements OnInit {
  private readonly api = inject(SellingApi);
  private readonly document = inject(DOCUMENT);
  /** `returned` when the payment provider sends the grower back (query parameter). */
  readonly payouts = input<string>();

  protected readonly farm = signal<FarmProfile | null>(null);
  protected readonly message = signal('');
  protected readonly error = signal('');
  protected readonly fieldErrors = signal<Record<string, string>>({});
  protected readonly busy = signal(false);
  protected readonly form = inject(FormBuilder).nonNullable.group({
    name: ['', Validators.required],
    addressLine: ['', Validators.required],
    zip: ['', [Validators.required, Validators.pattern(/^\d{5}$/)]],
    deliveryRadiusMi: [100, [Validators.required, Validators.min(0), Validators.max(3000)]],
    loadingFacilities: [''],
    pickupHours: [''],
    description: [''],
    timeZone: [''],
  });
  protected readonly zones = FARM_TIME_ZONES;

  ngOnInit(): void {
    void this.load();
  }

  private async load(): Promise<void> {
    try {
      const { farm } = this.payouts() ? await firstValueFrom(this.api.refreshPayouts()).catch(() => firstValueFrom(this.api.myFarm())) : await firstValueFrom(this.api.myFarm());
      this.show(farm);
      if (this.payouts() === 'returned') this.message.set(farm?.payouts.state === 'ready' ? 'Payout account ready: you can be paid for orders.' : 'Payout set-up is not finished yet.');
    } catch (e) {
      this.error.set(apiErrorMessage(e));
    }
  }

  private show(farm: FarmProfile | null): void {
    this.farm.set(farm);
    if (farm) {
      const { name, addressLine, zip, deliveryRadiusMi, loadingFacilities, pickupHours, description, timeZone } = farm;
      this.form.reset({ name, addressLine, zip, deliveryRadiusMi, loadingFacilities, pickupHours, description, timeZone });
    }
  }

  protected async save(): Promise<void> {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    await this.run(async () => {
      const { farm } = await firstValueFrom(this.api.saveFarm({ ...this.form.getRawValue(), deliveryRadiusMi: Number(this.form.controls.deliveryRadiusMi.value), timeZone: this.form.controls.timeZone.value || undefined }));
      this.show(farm);
      this.message.set(`Saved. Hay is loaded at ${farm.city}, ${farm.state}.`);
    });
  }

  protected async setUpPayouts(): Promise<void> {
    await this.run(async () => {
      const { url } = await firstValueFrom(this.api.payoutLink());
      this.document.location.assign(url);
    });
  }

  private async run(work: () => Promise<void>): Promise<void> {
    this.busy.set(true);
    this.error.set('');
    this.message.set('');
    this.fieldErrors.set({});
    try {
      await work();
    } catch (e) {
      this.error.set(apiErrorMessage(e));
      this.fieldErrors.set(apiFieldErrors(e));
    } finally {
      this.busy.set(false);
    }
  }
}
