import { ChangeDetectionStrategy, Component, computed, inject, input, OnInit, signal, viewChild } from '@angular/core';
import { MatStep, MatStepper } from '@angular/material/stepper';
import { Router, RouterLink } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import type { EditableLot } from '@shared/contracts/selling';
import { apiErrorMessage } from '../../../core/api-error';
import { SellingApi } from '../selling-api';
import { STATUS_LABELS } from '../ui/status-label';
import { AnalysisStep } from './analysis-step';
import { LOT_FORM_STEPS } from './form-steps';
import { LotStep } from './lot-step';
import { PhotosStep } from './photos-step';
import { PriceStep } from './price-step';
import { QuantityStep } from './quantity-step';
import { ReviewStep } from './review-step';
import { SamplingStep } from './sampling-step';
import { Icon } from '../../../shared/ui/icon';

/**
 * The guided lot form: one step per part of the listing, each saved as a draft when the grower moves on,
 * so the form resumes where it was left (on any device).
 */
@Component({
  selector: 'app-lot-form-page',
  imports: [RouterLink, Icon, MatStepper, MatStep, LotStep, QuantityStep, SamplingStep, AnalysisStep, PhotosStep, PriceStep, ReviewStep],
  templateUrl: './lot-form-page.html',
  styleUrl: './lot-form-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LotFormPage implements OnInit {
  private readonly api = inject(SellingApi);
  private readonly router = inject(Router);
  /** Route parameter `:id`; absent for a new lot. */
  readonly id = input<string>();

  private readonly stepper = viewChild(MatStepper);
  protected readonly lot = signal<EditableLot | null>(null);
  protected readonly loadError = signal('');
  protected readonly loaded = signal(false);
  protected readonly statusLabels = STATUS_LABELS;
  protected readonly steps = LOT_FORM_STEPS;
  /** The open step (the stepper's own header is replaced by the step list above it). */
  protected readonly current = signal(0);
  protected readonly draftStep = computed(() => this.lot()?.draftStep ?? 0);
  protected readonly startIndex = signal(0);

  ngOnInit(): void {
    void this.load();
  }

  private async load(): Promise<void> {
    const id = Number(this.id());
    if (!id) {
      this.loaded.set(true);
      return;
    }
    try {
      const lot = await firstValueFrom(this.api.lot(id));
      this.lot.set(lot);
      // Resume at the first step not yet saved (the review step once all are).
      this.startIndex.set(Math.min(lot.draftStep, 6));
      this.current.set(Math.min(lot.draftStep, 6));
    } catch (e) {
      this.loadError.set(apiErrorMessage(e, 'This lot could not be loaded.'));
    }
    this.loaded.set(true);
  }

  /** A step saved: keep the server's copy and move on. */
  protected async stepSaved(lot: EditableLot): Promise<void> {
    const isNew = !this.lot();
    this.lot.set(lot);
    if (isNew) {
      await this.router.navigate(['/selling/lots', lot.id], { replaceUrl: true });
      return;
    }
    setTimeout(() => this.stepper()?.next());
  }

  protected submitted(lot: EditableLot): void {
    this.lot.set(lot);
    void this.router.navigate(['/selling'], { queryParams: { submitted: lot.id } });
  }

  protected done(step: number): boolean {
    return this.draftStep() >= step;
  }

  /** A step can be opened once every step before it is saved. */
  protected reachable(index: number): boolean {
    return index <= this.draftStep();
  }

  protected goTo(index: number): void {
    const stepper = this.stepper();
    if (!stepper || !this.reachable(index)) return;
    stepper.selectedIndex = index;
  }
}
