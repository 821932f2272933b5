import { signal } from '@angular/core';
import { firstValueFrom, type Observable } from 'rxjs';
import type { EditableLot } from '@shared/contracts/selling';
import { apiErrorMessage, apiFieldErrors } from '../../../core/api-error';

/** Saving state of one step: busy flag, the API's message and its field-level messages. */
export class StepSave {
  readonly busy = signal(false);
  readonly error = signal('');
  readonly fieldErrors = signal<Record<string, string>>({});

  async run(request: Observable<EditableLot>): Promise<EditableLot | null> {
    this.busy.set(true);
    this.error.set('');
    this.fieldErrors.set({});
    try {
      return await firstValueFrom(request);
    } catch (e) {
      this.error.set(apiErrorMessage(e));
      this.fieldErrors.set(apiFieldErrors(e));
      return null;
    } finally {
      this.busy.set(false);
    }
  }
}

/** A number input's value, or null when left empty. */
export const numberOrNull = (v: unknown): number | null => (v === '' || v === null || v === undefined || Number.isNaN(Number(v)) ? null : Number(v));
/** Dollars typed by a person → integer cents. */
export const toCents = (dollars: unknown): number | null => {
  const n = numberOrNull(dollars);
  return n === null ? null : Math.round(n * 100);
};
export const toDollars = (cents: number | null | undefined): number | null => (cents === null || cents === undefined ? null : cents / 100);
