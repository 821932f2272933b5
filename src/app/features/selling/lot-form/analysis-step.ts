import { ChangeDetectionStrategy, Component, computed, DestroyRef, effect, inject, input, output, signal } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatCheckbox } from '@angular/material/checkbox';
import { MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatProgressBar } from '@angular/material/progress-bar';
import { MatRadioButton, MatRadioGroup } from '@angular/material/radio';
import { MatOption, MatSelect } from '@angular/material/select';
import { catchError, debounceTime, firstValueFrom, last, of, switchMap, tap } from 'rxjs';
import { readAnalysisCsv } from '@shared/contracts/analysis-csv';
import { lotDateIssues } from '@shared/contracts/lot-dates';
import type { EditableLot } from '@shared/contracts/selling';
import { ForageEvaluationRequestSchema, type ForageEvaluation, NITRATE_TEST_PROMPT, nitrateTestAdvised } from '@shared/forage';
import { ENTERED_FIELDS, type EnteredField } from '@shared/forage/analysis-fields';
import { VISUAL_MOULD_LABELS, VISUAL_MOULD_SCORES, type VisualMouldScore } from '@shared/forage/mould-scores';
import { apiErrorMessage } from '../../../core/api-error';
import { SellingApi } from '../selling-api';
import { AnalysisPreview } from './analysis-preview';
import { numberOrNull, StepSave } from './step-save';
import type { AnalysisMethod } from '@shared/contracts/enums';
import { Icon } from '../../../shared/ui/icon';

/** One input of the analysis step, from the analysis-field table. */
interface ValueInput {
  key: EnteredField;
  label: string;
  required: boolean;
  /** Beside the number: "%" for shares (the label says of what), the lab's unit otherwise. */
  suffix: string;
}
const inputOf = (f: (typeof ENTERED_FIELDS)[number]): ValueInput => ({ key: f.key, label: f.short, required: f.required, suffix: f.unit.startsWith('%') ? '%' : f.unit === 'index' ? '' : f.unit });

/** Lab values, in the table's order. */
export const VALUE_FIELDS: readonly ValueInput[] = ENTERED_FIELDS.filter((f) => f.group !== 'safety').map(inputOf);
/** Optional safety results, each in the unit labs print it in. */
export const SAFETY_FIELDS: readonly ValueInput[] = ENTERED_FIELDS.filter((f) => f.group === 'safety').map(inputOf);
type ValueField = EnteredField;
const NUMBER_FIELDS: readonly ValueField[] = ENTERED_FIELDS.map((f) => f.key);

/** Step 4: the lab's report — who, when, how — its values with a live preview of the engine's figures, and the PDF. */
@Component({
  selector: 'app-analysis-step',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatHint, MatSuffix, MatInput, MatSelect, MatOption, MatCheckbox, MatRadioGroup, MatRadioButton, MatButton, Icon, MatProgressBar, AnalysisPreview],
  templateUrl: './analysis-step.html',
  styleUrls: ['./step-form.scss', './analysis-step.scss'],
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AnalysisStep {
  private readonly api = inject(SellingApi);
  readonly lot = input.required<EditableLot>();
  readonly saved = output<EditableLot>();

  protected readonly fields = VALUE_FIELDS;
  protected readonly safetyFields = SAFETY_FIELDS;
  protected readonly mouldScores = VISUAL_MOULD_SCORES.map((value) => ({ value, label: VISUAL_MOULD_LABELS[value] }));
  /** Small-grain and sorghum-type hays, and hay the grower reports drought-stressed or heavily fertilised, get the nitrate prompt beside the nitrate field. */
  protected readonly nitratePrompt = computed(() => {
    const l = this.lot().lot;
    return nitrateTestAdvised({ forageType: l?.forageType ?? '', drought: l?.droughtStressed, heavyNitrogen: l?.heavyNitrogen }) ? NITRATE_TEST_PROMPT : null;
  });
  protected readonly templateUrl = this.api.templateUrl;
  protected readonly saving = new StepSave();
  protected readonly preview = signal<ForageEvaluation | null>(null);
  protected readonly previewNote = signal('Enter dry matter, CP, ADF and NDF to see the figures.');
  protected readonly csvErrors = signal<string[]>([]);
  protected readonly pdf = signal<File | null>(null);
  protected readonly pdfProgress = signal<number | null>(null);
  protected readonly pdfReading = signal<{ busy: boolean; summary: string; filled?: boolean } | null>(null);

  private readonly fb = inject(FormBuilder).nonNullable;
  protected readonly form = this.fb.group({
    labName: ['', Validators.required],
    // Ticked only by the grower who knows it: an unticked box is the honest default.
    labCertified: [false],
    reportNumber: [''],
    reportDate: ['', Validators.required],
    method: ['nirs' as AnalysisMethod],
    basis: ['dm' as 'dm' | 'asFed'],
    values: this.fb.group({
      ...(Object.fromEntries(NUMBER_FIELDS.map((f) => [f, '' as number | string])) as Record<ValueField, number | string>),
      visualMouldScore: '' as VisualMouldScore | '',
    }),
  });

  private readonly reportDate = toSignal(this.form.controls.reportDate.valueChanges, { initialValue: '' });
  /** The lot's date rules (shared with the server): the report is not dated before the sample. */
  protected readonly dateIssue = computed(() => {
    const [issue] = lotDateIssues({ sampledOn: this.lot().sampling?.sampledOn, reportDate: this.reportDate() }, new Date(), ['reportDate']);
    return issue?.message ?? null;
  });

  constructor() {
    effect(() => {
      const a = this.lot().analysis;
      if (!a) return;
      const { basis, ...values } = a.values;
      this.form.reset({ labName: a.labName, labCertified: a.labCertified, reportNumber: a.reportNumber, reportDate: a.reportDate, method: a.method, basis: basis as 'dm', values: { ...this.emptyValues(), ...values } });
    });
    this.form.valueChanges
      .pipe(
        debounceTime(350),
        switchMap(() => {
          const request = ForageEvaluationRequestSchema.safeParse(this.request());
          if (!request.success) {
            this.previewNote.set(request.error.issues[0]?.message ?? 'Check the values.');
            return of(null);
          }
          return this.api.evaluate(request.data).pipe(
            tap(() => this.previewNote.set('')),
            catchError((e) => {
              this.previewNote.set(apiErrorMessage(e));
              return of(null);
            }),
          );
        }),
        takeUntilDestroyed(inject(DestroyRef)),
      )
      .subscribe((evaluation) => this.preview.set(evaluation));
  }

  private emptyValues(): Record<ValueField, number | string> & { visualMouldScore: VisualMouldScore | '' } {
    return { ...(Object.fromEntries(NUMBER_FIELDS.map((f) => [f, ''])) as Record<ValueField, string>), visualMouldScore: '' };
  }

  /** The engine request for what is typed: empty optional values are left out. */
  private request(): Record<string, unknown> {
    const v = this.form.getRawValue();
    const values: Record<string, unknown> = { forageClass: this.lot().forageClass, basis: v.basis };
    for (const field of NUMBER_FIELDS) {
      const n = numberOrNull(v.values[field]);
      if (n !== null) values[field] = n;
    }
    if (v.values.visualMouldScore) values['visualMouldScore'] = v.values.visualMouldScore;
    return values;
  }

  protected async importCsv(event: Event): Promise<void> {
    const inputEl = event.target as HTMLInputElement;
    const file = inputEl.files?.[0];
    inputEl.value = '';
    if (!file) return;
    const result = readAnalysisCsv(await file.text());
    if (!result.ok) {
      this.csvErrors.set(result.errors);
      return;
    }
    this.csvErrors.set([]);
    const { basis, ...values } = result.values;
    this.form.patchValue({ basis: basis as 'dm', values: { ...this.emptyValues(), ...values } });
  }

  /** Keeps the PDF for upload on save, and fills in the values read from it for the grower to confirm. */
  protected async choosePdf(event: Event): Promise<void> {
    const inputEl = event.target as HTMLInputElement;
    const file = inputEl.files?.[0] ?? null;
    this.pdf.set(file);
    this.pdfReading.set(null);
    if (!file) return;
    this.pdfReading.set({ busy: true, summary: 'Reading the values from the PDF…' });
    try {
      const result = await firstValueFrom(this.api.readReport(file));
      if (result.values) {
        const { basis, ...values } = result.values;
        this.form.patchValue({ basis: basis as 'dm', values: { ...this.emptyValues(), ...values } });
        this.form.markAsDirty();
      }
      this.pdfReading.set({ busy: false, summary: result.summary, filled: result.values !== null });
    } catch (e) {
      this.pdfReading.set({ busy: false, summary: `The PDF could not be read: ${apiErrorMessage(e)}` });
    }
  }

  protected async save(): Promise<void> {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const v = this.form.getRawValue();
    const { forageClass: _fc, ...values } = this.request();
    const body = { labName: v.labName, labCertified: v.labCertified, reportNumber: v.reportNumber, reportDate: v.reportDate, method: v.method, values };
    let lot = await this.saving.run(this.api.saveStep(this.lot().id, 'analysis', body));
    if (!lot) return;
    const pdf = this.pdf();
    if (pdf) {
      this.pdfProgress.set(0);
      try {
        await firstValueFrom(this.api.uploadReport(lot.id, pdf).pipe(tap((e) => e.kind === 'progress' && this.pdfProgress.set(e.progress)), last()));
        this.pdf.set(null);
        lot = await firstValueFrom(this.api.lot(lot.id));
      } catch (e) {
        this.saving.error.set(`The values were saved, but the PDF was not: ${apiErrorMessage(e)}`);
        return;
      } finally {
        this.pdfProgress.set(null);
      }
    }
    this.saved.emit(lot);
  }
}
