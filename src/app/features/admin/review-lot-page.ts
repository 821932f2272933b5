import { ChangeDetectionStrategy, Component, computed, inject, input, OnInit, signal } from '@angular/core';
import { FormControl, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatFormField, MatLabel } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { DomSanitizer } from '@angular/platform-browser';
import { RouterLink } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import { CORE_POSITION_LABELS } from '@shared/contracts/labels';
import type { ReviewLotView } from '@shared/contracts/selling';
import { apiErrorMessage } from '../../core/api-error';
import { fixed } from '../catalogue/format';
import { AnalysisPreview } from '../selling/lot-form/analysis-preview';
import { VALUE_FIELDS } from '../selling/lot-form/analysis-step';
import { CautionsList } from '../selling/ui/cautions-list';
import { FindingsList } from '../selling/ui/findings-list';
import { STATUS_LABELS } from '../selling/ui/status-label';
import { ReviewApi } from './review-api';

/** One submitted lot: the report PDF beside the entered values and the engine's findings; approve or return. */
@Component({
  selector: 'app-review-lot-page',
  imports: [RouterLink, ReactiveFormsModule, MatButton, MatIcon, MatFormField, MatLabel, MatInput, AnalysisPreview, FindingsList, CautionsList],
  templateUrl: './review-lot-page.html',
  styleUrl: './review-lot-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReviewLotPage implements OnInit {
  private readonly api = inject(ReviewApi);
  private readonly sanitizer = inject(DomSanitizer);
  /** Route parameter `:id`. */
  readonly id = input.required<string>();

  protected readonly view = signal<ReviewLotView | null>(null);
  protected readonly error = signal('');
  protected readonly busy = signal(false);
  protected readonly reason = new FormControl('', { nonNullable: true, validators: [Validators.required, Validators.minLength(5)] });
  protected readonly statusLabels = STATUS_LABELS;
  protected readonly positions = CORE_POSITION_LABELS;
  protected readonly fixed = fixed;
  protected readonly fields = VALUE_FIELDS;
  protected readonly cautionInput = computed(() => {
    const l = this.view()?.lot;
    if (!l?.lot || !l.quantity) return null;
    return { forageClass: l.forageClass, baleType: l.quantity.baleType, moistureAtBalingPct: l.lot.moistureAtBalingPct, storage: l.lot.storage, nscFlag: l.evaluation?.nscFlag ?? null };
  });
  protected readonly pdfUrl = computed(() => {
    const url = this.view()?.lot.analysis?.reportFile?.url;
    // Our own API, same origin: safe to frame.
    return url ? this.sanitizer.bypassSecurityTrustResourceUrl(url) : null;
  });

  ngOnInit(): void {
    void this.run(() => firstValueFrom(this.api.lot(Number(this.id()))));
  }

  protected approve(): Promise<void> {
    return this.run(() => firstValueFrom(this.api.approve(Number(this.id()))));
  }

  protected returnToGrower(): Promise<void> {
    if (this.reason.invalid) {
      this.reason.markAsTouched();
      return Promise.resolve();
    }
    return this.run(() => firstValueFrom(this.api.returnToGrower(Number(this.id()), this.reason.value)));
  }

  protected value(field: string): string {
    const v = this.view()?.lot.analysis?.values[field];
    return v === undefined ? '—' : String(v);
  }

  private async run(work: () => Promise<ReviewLotView>): Promise<void> {
    this.busy.set(true);
    this.error.set('');
    try {
      this.view.set(await work());
    } catch (e) {
      this.error.set(apiErrorMessage(e));
    } finally {
      this.busy.set(false);
    }
  }
}
