import AxeBuilder from '@axe-core/playwright';
import { expect, test, type Page } from '@playwright/test';
import { ADMIN, GROWER, listedLotIds, signInAs } from './support/accounts';

/**
 * axe-core as an outside judge of every main page: no violation rated serious or critical (WCAG 2.1 A/AA rules).
 * Run at desktop and phone widths, since the phone top bar is laid out differently.
 */
async function expectNoSeriousViolations(page: Page, path: string): Promise<void> {
  await page.goto(path);
  await page.waitForLoadState('networkidle');
  const result = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
  const serious = result.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.id} (${v.impact}): ${v.help} — ${v.nodes.map((n) => n.target.join(' ')).slice(0, 3).join(' | ')}`);
  expect(serious, `${path}`).toEqual([]);
}

for (const viewport of [{ width: 1366, height: 900 }, { width: 390, height: 844 }]) {
  test.describe(`axe-core at ${viewport.width} px`, () => {
    test.use({ viewport });

    test('visitor pages', async ({ page }) => {
      const [a, b] = await listedLotIds(page, 2);
      for (const path of ['/', '/hay', `/hay/${a}`, `/hay/compare?ids=${a},${b}`, '/planner', '/cart', '/sign-in', '/sign-up']) {
        await expectNoSeriousViolations(page, path);
      }
    });

    test('grower pages', async ({ page }) => {
      await signInAs(page, GROWER);
      for (const path of ['/selling', '/selling/lots/new', '/selling/farm']) await expectNoSeriousViolations(page, path);
    });

    test('review desk', async ({ page }) => {
      await signInAs(page, ADMIN);
      await expectNoSeriousViolations(page, '/admin');
    });
  });
}
