import { TestBed } from '@angular/core/testing';
import { CompareSelection } from './compare-selection';

describe('CompareSelection', () => {
  beforeEach(() => sessionStorage.clear());

  it('toggles lots in and out and stops at four', () => {
    const selection = TestBed.inject(CompareSelection);
    [1, 2, 3, 4, 5].forEach((id) => selection.toggle(id));
    expect(selection.ids()).toEqual([1, 2, 3, 4]);
    expect(selection.full()).toBe(true);
    selection.toggle(2);
    expect(selection.ids()).toEqual([1, 3, 4]);
    expect(selection.has(3)).toBe(true);
  });

  it('restores the tab’s selection after the first render', () => {
    TestBed.inject(CompareSelection).toggle(9);
    TestBed.resetTestingModule();
    const again = TestBed.inject(CompareSelection);
    expect(again.ids()).toEqual([]);
    again.restore();
    expect(again.ids()).toEqual([9]);
  });
});
