import { expect, test } from '@playwright/test';

test.describe('catalogue', () => {
  test('the server-rendered HTML of the catalogue already lists demo lots', async ({ request }) => {
    // A plain HTTP request runs no JavaScript: whatever is in the body was rendered on the server.
    const res = await request.get('/hay?q=North%20Pivot');
    expect(res.status()).toBe(200);
    const html = await res.text();
    expect(html).toContain('Alfalfa, 2nd cutting — North Pivot');
    expect(html).toContain('Larkspur Bend Farm');
    // The first page of the unfiltered catalogue is in the HTML as well, with its total.
    const first = await (await request.get('/hay')).text();
    expect(first).toMatch(/<strong[^>]*>2\d<\/strong> lots/);
  });

  test('the browser reuses the data the server rendered instead of fetching it again', async ({ page }) => {
    const lotCalls: string[] = [];
    page.on('request', (r) => {
      if (new URL(r.url()).pathname.startsWith('/api/lots')) lotCalls.push(r.url());
    });
    await page.goto('/hay?q=North%20Pivot');
    await expect(page.getByRole('link', { name: 'Alfalfa, 2nd cutting — North Pivot' })).toBeVisible();
    await page.waitForLoadState('networkidle');
    expect(lotCalls).toEqual([]);
  });

  test('an unknown address answers 404 with a helpful page', async ({ request, page }) => {
    expect((await request.get('/no-such-page')).status()).toBe(404);
    // A lot that does not exist (or is not public) answers 404 as well, with its own message.
    expect((await request.get('/hay/999999')).status()).toBe(404);
    expect(await (await request.get('/hay/999999')).text()).toContain('Lot not found');
    await page.goto('/no-such-page');
    await expect(page.getByRole('heading', { name: 'Page not found' })).toBeVisible();
  });

  test('a lot page shows its analysis and photos', async ({ page }) => {
    await page.goto('/hay?q=North%20Pivot');
    await page.getByRole('link', { name: 'Alfalfa, 2nd cutting — North Pivot' }).click();
    await expect(page.getByRole('heading', { level: 1, name: 'Alfalfa, 2nd cutting — North Pivot' })).toBeVisible();
    await expect(page.getByRole('heading', { name: 'Lab analysis' })).toBeVisible();
    await expect(page.getByRole('rowheader', { name: 'Crude protein (CP)' })).toBeVisible();
    const photo = page.locator('figure img').first();
    await expect(photo).toHaveAttribute('src', /\.webp$/);
    const src = await photo.getAttribute('src');
    const image = await page.request.get(src!);
    expect(image.headers()['content-type']).toBe('image/webp');
  });
});
