import { COMPARE_STORAGE_KEY, tabHasComparedLots } from './compare-storage';

describe('tabHasComparedLots', () => {
  const storing = (value: string | null) => () => ({ getItem: (key: string) => (key === COMPARE_STORAGE_KEY ? value : null) });

  it('is true only for a list with lots in it', () => {
    expect(tabHasComparedLots(storing('[12,40]'))).toBe(true);
    expect(tabHasComparedLots(storing('[]'))).toBe(false);
    expect(tabHasComparedLots(storing(null))).toBe(false);
    expect(tabHasComparedLots(() => null)).toBe(false);
  });

  it('reads a damaged entry, or storage the browser will not open, as no lots', () => {
    expect(tabHasComparedLots(storing('{not json'))).toBe(false);
    expect(tabHasComparedLots(storing('{"a":1}'))).toBe(false);
    expect(
      tabHasComparedLots(() => {
        throw new DOMException('The operation is insecure.', 'SecurityError');
      }),
    ).toBe(false);
  });
});
