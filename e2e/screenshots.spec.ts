import { test } from './support/test';

/**
 * The two pictures in the README, taken from the running app: the catalogue at 1366 px and at 390 px.
 * `SCREENSHOTS=1 npm test` writes them into docs/screenshots/; otherwise they go to test-results/.
 */
const dir = process.env['SCREENSHOTS'] === '1' ? 'docs/screenshots' : 'test-results/screenshots';

for (const shot of [
  { name: 'catalogue-desktop-1366.png', viewport: { width: 1366, height: 900 } },
  { name: 'catalogue-phone-390.png', viewport: { width: 390, height: 844 } },
]) {
  test(`screenshot ${shot.name}`, async ({ page }) => {
    await page.setViewportSize(shot.viewport);
    await page.goto('/hay');
    await page.waitForLoadState('networkidle');
    await page.screenshot({ path: `${dir}/${shot.name}`, fullPage: false });
  });
}
