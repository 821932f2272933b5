import { SIGNS_OF_USE, startOnFirstUse } from './wake-on-use';

describe('startOnFirstUse', () => {
  it.each(SIGNS_OF_USE)('starts at a %s, once, and stops listening', (type) => {
    const start = jest.fn();
    startOnFirstUse(window, start);
    expect(start).not.toHaveBeenCalled();
    window.dispatchEvent(new Event(type));
    expect(start).toHaveBeenCalledTimes(1);
    for (const other of SIGNS_OF_USE) window.dispatchEvent(new Event(other));
    expect(start).toHaveBeenCalledTimes(1);
  });

  it('hears a sign of use on anything in the page, even one that stops it from going further', () => {
    const start = jest.fn();
    startOnFirstUse(window, start);
    const button = document.body.appendChild(document.createElement('button'));
    button.addEventListener('pointerdown', (e) => e.stopPropagation());
    button.dispatchEvent(new Event('pointerdown', { bubbles: true }));
    expect(start).toHaveBeenCalledTimes(1);
    button.remove();
  });

  it('does nothing when told to stop waiting', () => {
    const start = jest.fn();
    startOnFirstUse(window, start)();
    window.dispatchEvent(new Event('keydown'));
    expect(start).not.toHaveBeenCalled();
  });
});
