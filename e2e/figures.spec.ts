import { expect, test } from './support/test';
import { listedLotIds } from './support/accounts';

test.describe('figures people would rather see than read', () => {
  test('the map draws the lower 48 states offline, the lots as points and the buyer’s radius', async ({ page }) => {
    const external: string[] = [];
    page.on('request', (r) => {
      if (!r.url().startsWith('http://127.0.0.1')) external.push(r.url());
    });
    await page.goto('/hay?zip=66502&radiusMi=150');
    await page.getByRole('button', { name: 'Show these lots on a map' }).click();
    const map = page.getByRole('img', { name: /Map of the lower 48 states with \d+ lots and a 150 mile circle around Manhattan, KS 66502/ });
    await expect(map).toBeVisible();
    // 48 states and the District of Columbia (US Census state FIPS list, less AK, HI and the territories).
    await expect(map.locator('path.state')).toHaveCount(49);
    await expect(map.locator('path.radius')).toHaveCount(1);
    const shown = await page.getByRole('list', { name: 'Hay lots' }).getByRole('listitem').count();
    await expect(map.locator('circle.lot')).toHaveCount(shown);
    expect(external).toEqual([]);
  });

  test('the lot page shows the NSC gauge with the 10–12% band, RFV and RFQ on a scale, and the analysis against the grade bands', async ({ page }) => {
    const listed = (await (await page.request.get('/api/lots?pageSize=50')).json()) as { items: { id: number; nscPct: number | null }[] };
    const id = listed.items.find((l) => l.nscPct !== null)!.id;
    const html = await (await page.request.get(`/hay/${id}`)).text();
    // Drawn on the server: the figures are in the HTML before any script runs.
    expect(html).toContain('advised limit 10–12%');
    expect(html).toContain('Against the USDA grade bands');
    await page.goto(`/hay/${id}`);
    await expect(page.getByRole('img', { name: /^RFV \d+, RFQ \d+ on a scale/ })).toBeVisible();
    await expect(page.getByRole('img', { name: /^RFV [\d.]+: / })).toBeVisible();
    await expect(page.getByText('Against the USDA grade bands')).toBeVisible();
  });

  test('the compare sheet keeps more-is-better and less-is-better measures apart', async ({ page }) => {
    const [a, b] = await listedLotIds(page, 2);
    await page.goto(`/hay/compare?ids=${a},${b}`);
    const more = page.getByRole('region', { name: 'More is better' });
    const less = page.getByRole('region', { name: 'Less is better' });
    await expect(more.getByRole('img', { name: /^Crude protein/ })).toBeVisible();
    await expect(more.getByRole('img', { name: /^NDF/ })).toHaveCount(0);
    await expect(less.getByRole('img', { name: /^NDF/ })).toBeVisible();
    await expect(less.getByRole('img', { name: /^Crude protein/ })).toHaveCount(0);
  });
});
