import type { Page } from '@playwright/test';

/**
 * Adds up, from the page's first paint, the layout shifts the browser reports (Layout Instability API, W3C)
 * that no input caused. Call before `goto`; read the sum with `layoutShiftSoFar`.
 */
export async function watchLayoutShifts(page: Page): Promise<void> {
  await page.addInitScript(() => {
    const w = window as unknown as { shifted: number };
    w.shifted = 0;
    new PerformanceObserver((list) => {
      for (const entry of list.getEntries() as unknown as { value: number; hadRecentInput: boolean }[]) if (!entry.hadRecentInput) w.shifted += entry.value;
    }).observe({ type: 'layout-shift', buffered: true });
  });
}

export function layoutShiftSoFar(page: Page): Promise<number> {
  return page.evaluate(() => (window as unknown as { shifted: number }).shifted);
}
