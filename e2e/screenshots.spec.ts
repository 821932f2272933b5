import { mkdirSync, writeFileSync } from 'node:fs';
import sharp from 'sharp';
import { expect, test } from './support/test';
import { listedLotIds } from './support/accounts';

/**
 * The pictures in the README, taken from the running app with the demo data: the catalogue, a lot page and the
 * herd planner, each at 1366 px and on a 390 px phone. `SCREENSHOTS=1` writes them into docs/screenshots/
 * (squeezed to a 256-colour palette so each stays small); otherwise they go to test-results/.
 */
const dir = process.env['SCREENSHOTS'] === '1' ? 'docs/screenshots' : 'test-results/screenshots';
const SIZES = [
  { suffix: 'desktop-1366', viewport: { width: 1366, height: 900 } },
  { suffix: 'phone-390', viewport: { width: 390, height: 844 } },
] as const;
const PAGES = [
  { name: 'catalogue', path: async () => '/hay', ready: 'Hay lots' },
  // A lot of the demo scenario (the lowest id), not one an earlier journey of the same run listed.
  { name: 'lot', path: async (ids: number[]) => `/hay/${Math.min(...ids)}`, ready: 'Lab analysis' },
  { name: 'planner', path: async () => '/planner', ready: 'What the herd needs (NRC 2007)' },
] as const;

for (const shot of PAGES) {
  for (const size of SIZES) {
    test(`screenshot ${shot.name}-${size.suffix}`, async ({ page }) => {
      await page.setViewportSize(size.viewport);
      const ids = await listedLotIds(page, 100);
      await page.goto(await shot.path(ids));
      await page.waitForLoadState('networkidle');
      if (shot.name === 'catalogue') await expect(page.getByRole('list', { name: shot.ready }).getByRole('listitem').first()).toBeVisible();
      else await expect(page.getByRole('heading', { name: shot.ready })).toBeVisible();
      // The planner's answer, not its form: the results heading at the top of the picture.
      if (shot.name === 'planner') {
        // Below the sticky top bar (about 150 px high on a phone).
        await page.getByRole('heading', { name: shot.ready }).evaluate((el) => window.scrollTo(0, el.getBoundingClientRect().top + window.scrollY - 160));
      }
      const png = await page.screenshot({ fullPage: false });
      mkdirSync(dir, { recursive: true });
      const small = await sharp(png).png({ palette: true, colours: 256, compressionLevel: 9, effort: 10 }).toBuffer();
      writeFileSync(`${dir}/${shot.name}-${size.suffix}.png`, small);
      expect(small.byteLength).toBeLessThan(250_000);
    });
  }
}
