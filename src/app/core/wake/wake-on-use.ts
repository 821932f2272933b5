/**
 * The first signs that a visitor is using the page: a touch, click or pen, a pointer moving over it, a key,
 * focus moving into it, or a scroll. Any one of them starts the app.
 */
export const SIGNS_OF_USE = ['pointerdown', 'pointermove', 'touchstart', 'keydown', 'focusin', 'wheel', 'scroll'] as const;

/**
 * Calls `start` once, at the first sign of use on the page (SIGNS_OF_USE, heard on the window before
 * anything on the page can stop them), and stops listening. Plain DOM, so it runs before the app starts.
 * Returns the function that stops waiting without starting.
 */
export function startOnFirstUse(target: Pick<Window, 'addEventListener' | 'removeEventListener'>, start: () => void): () => void {
  const options: AddEventListenerOptions = { capture: true, passive: true };
  const stop = () => {
    for (const type of SIGNS_OF_USE) target.removeEventListener(type, wake, options);
  };
  function wake() {
    stop();
    start();
  }
  for (const type of SIGNS_OF_USE) target.addEventListener(type, wake, options);
  return stop;
}
