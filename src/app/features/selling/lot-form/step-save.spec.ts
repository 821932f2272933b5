import { HttpErrorResponse } from '@angular/common/http';
import { of, throwError } from 'rxjs';
import type { EditableLot } from '@shared/contracts/selling';
import { numberOrNull, StepSave, toCents, toDollars } from './step-save';

describe('StepSave', () => {
  it('returns the saved lot and clears the busy flag', async () => {
    const saving = new StepSave();
    const lot = { id: 7 } as EditableLot;
    expect(await saving.run(of(lot))).toBe(lot);
    expect(saving.busy()).toBe(false);
    expect(saving.error()).toBe('');
  });

  it('keeps the API message and its field messages when a save is refused', async () => {
    const saving = new StepSave();
    const refused = new HttpErrorResponse({
      status: 400,
      error: { error: { code: 'analysis_inconsistent', message: 'NDF must be higher than ADF.', details: [{ path: 'values.adfPct', message: 'NDF must be higher than ADF.' }] } },
    });
    expect(await saving.run(throwError(() => refused))).toBeNull();
    expect(saving.error()).toBe('NDF must be higher than ADF.');
    expect(saving.fieldErrors()).toEqual({ 'values.adfPct': 'NDF must be higher than ADF.' });
  });
});

describe('form number helpers', () => {
  it('treats an empty field as no value, not zero', () => {
    expect(numberOrNull('')).toBeNull();
    expect(numberOrNull('0')).toBe(0);
    expect(numberOrNull('abc')).toBeNull();
  });

  it('turns typed dollars into whole cents without float drift', () => {
    expect(toCents('3.50')).toBe(350);
    expect(toCents(2.675)).toBe(268);
    expect(toCents(0.1 + 0.2)).toBe(30);
    expect(toDollars(26500)).toBe(265);
    expect(toDollars(null)).toBeNull();
  });
});
