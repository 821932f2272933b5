import { draftProgress, LOT_FORM_STEPS } from './form-steps';

describe('draftProgress', () => {
  it('counts against every step of the form, sending included', () => {
    expect(LOT_FORM_STEPS).toHaveLength(7);
    expect(draftProgress(0)).toBe('0 of 7 steps done · next: Field and harvest');
    expect(draftProgress(6)).toBe('6 of 7 steps done · next: Check and send');
  });
});
