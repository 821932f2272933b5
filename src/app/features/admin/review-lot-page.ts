import { ChangeDetectionStrategy, Component, computed, inject, input, LOCALE_ID, OnInit, signal } from '@angular/core';
import { FormControl, ReactiveFormsModule, Validators } from '@angular/forms';
import { DatePipe } from '@angular/common';
import { MatButton } from '@angular/material/button';
import { MatCheckbox } from '@angular/material/checkbox';
import { MatFormField, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { DomSanitizer } from '@angular/platform-browser';
import { RouterLink } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import { CORE_POSITION_LABELS } from '@shared/contracts/labels';
import type { PhotoView } from '@shared/contracts/lots';
import type { ReviewLotView } from '@shared/contracts/selling';
import { apiErrorMessage } from '../../core/api-error';
import { inLocale } from '../catalogue/format';
import { AnalysisPreview } from '../selling/lot-form/analysis-preview';
import { cautionInputOf, CautionsList } from '../selling/ui/cautions-list';
import { FindingsList } from '../selling/ui/findings-list';
import { STATUS_LABELS } from '../selling/ui/status-label';
import { ReviewApi } from './review-api';
import { Icon } from '../../shared/ui/icon';

/**
 * One submitted lot: the report PDF at a readable width beside each entered value and the value read
 * from the PDF (mismatches flagged, a tick per value), the photos, findings and cautions; approving or
 * returning asks for confirmation; the history says who did what, when.
 */
@Component({
  selector: 'app-review-lot-page',
  imports: [RouterLink, ReactiveFormsModule, MatButton, Icon, MatFormField, MatLabel, MatInput, MatCheckbox, AnalysisPreview, FindingsList, CautionsList, DatePipe],
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
  /** Which decision waits for confirmation. */
  protected readonly confirming = signal<'approve' | 'return' | null>(null);
  /** Values the admin has checked against the PDF, by field. */
  protected readonly ticked = signal<ReadonlySet<string>>(new Set());
  protected readonly mismatches = computed(() => this.view()?.comparison.filter((r) => r.status === 'mismatch') ?? []);
  protected readonly untickedCount = computed(() => (this.view()?.comparison.length ?? 0) - this.ticked().size);
  protected readonly reason = new FormControl('', { nonNullable: true, validators: [Validators.required, Validators.minLength(5)] });
  protected readonly statusLabels = STATUS_LABELS;
  protected readonly positions = CORE_POSITION_LABELS;
  protected readonly fixed = inLocale(inject(LOCALE_ID)).fixed;
  protected readonly cautionInput = computed(() => {
    const l = this.view()?.lot;
    return l ? cautionInputOf(l) : null;
  });
  protected readonly pdfUrl = computed(() => {
    const url = this.view()?.lot.analysis?.reportFile?.url;
    // Our own API, same origin: safe to frame.
    return url ? this.sanitizer.bypassSecurityTrustResourceUrl(url) : null;
  });

  ngOnInit(): void {
    void this.run(() => firstValueFrom(this.api.lot(Number(this.id()))));
  }

  /** Opens the confirmation; nothing is sent until the admin confirms. */
  protected ask(decision: 'approve' | 'return'): void {
    if (decision === 'return' && this.reason.invalid) {
      this.reason.markAsTouched();
      return;
    }
    this.confirming.set(decision);
  }

  protected async confirm(): Promise<void> {
    const decision = this.confirming();
    this.confirming.set(null);
    const id = Number(this.id());
    const revision = this.view()?.revision;
    if (decision === 'approve' && revision !== undefined) {
      await this.run(() => firstValueFrom(this.api.approve(id, revision)));
      // Refused (e.g. the grower changed the lot meanwhile): show the lot as it is now, keeping the reason.
      const refused = this.error();
      if (refused) {
        await this.run(() => firstValueFrom(this.api.lot(id)));
        this.error.set(refused);
      }
    }
    if (decision === 'return') await this.run(() => firstValueFrom(this.api.returnToGrower(id, this.reason.value)));
  }

  protected toggle(field: string): void {
    this.ticked.update((set) => {
      const next = new Set(set);
      if (next.has(field)) next.delete(field);
      else next.add(field);
      return next;
    });
  }

  protected photoUrl(photo: PhotoView): string {
    return photo.variants.find((v) => v.width === 800)?.url ?? photo.variants[0]?.url ?? '';
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
