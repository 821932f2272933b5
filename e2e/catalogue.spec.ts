import { expect, test } from './support/test';

test.describe('catalogue', () => {
  test('the server-rendered HTML of the catalogue already lists demo lots', async ({ request }) => {
    // A plain HTTP request runs no JavaScript: whatever is in the body was rendered on the server.
    const res = await request.get('/hay?q=North%20Pivot');
    expect(res.status()).toBe(200);
    const html = await res.text();
    expect(html).toContain('Alfalfa, 2nd cutting — North Pivot');
    expect(html).toContain('Larkspur Bend Farm');
    // The first page of the unfiltered catalogue is in the HTML as well, with the total the API reports
    // (earlier journeys add lots, so the total is read, not assumed).
    const { total } = (await (await request.get('/api/lots')).json()) as { total: number };
    expect(total).toBeGreaterThan(0);
    const first = await (await request.get('/hay')).text();
    expect(first).toMatch(new RegExp(`<strong[^>]*>${total}</strong> lots?\\b`));
  });

  test('the browser reuses the data the server rendered instead of fetching it again', async ({ page }) => {
    const lotCalls: string[] = [];
    page.on('request', (r) => {
      if (new URL(r.url()).pathname.startsWith('/api/lots')) lotCalls.push(r.url());
    });
    await page.goto('/hay?q=North%20Pivot');
    const title = 'Alfalfa, 2nd cutting — North Pivot';
    await expect(page.getByRole('link', { name: title })).toBeVisible();
    // The app is live in the browser: the compare toggle only changes once its JavaScript runs.
    const toggle = page.getByRole('button', { name: `Compare ${title}` });
    await expect(toggle).toHaveAttribute('aria-pressed', 'false');
    await toggle.click();
    await expect(toggle).toHaveAttribute('aria-pressed', 'true');
    await page.waitForLoadState('networkidle');
    expect(lotCalls).toEqual([]);

    // Control: a new query is not in the server's data, so the live app asks the API for it.
    await page.getByLabel('RFV from').fill('100');
    await page.getByRole('button', { name: 'Show hay' }).click();
    await expect(page).toHaveURL(/rfvMin=100/);
    await expect.poll(() => lotCalls.filter((u) => new URL(u).searchParams.get('rfvMin') === '100').length).toBeGreaterThan(0);
  });

  test('an unknown address answers 404 with a helpful page', async ({ request, page }) => {
    expect((await request.get('/no-such-page')).status()).toBe(404);
    // A lot that does not exist (or is not public) answers 404 as well, with its own message.
    expect((await request.get('/hay/999999')).status()).toBe(404);
    expect(await (await request.get('/hay/999999')).text()).toContain('Lot not found');
    await page.goto('/no-such-page');
    await expect(page.getByRole('heading', { name: 'Page not found' })).toBeVisible();
  });

  test('a lot page shows its analysis and photos', async ({ page, request }) => {
    const title = 'Alfalfa, 2nd cutting — North Pivot';
    // The oracle: what the API holds for this lot (nutrients on a dry-matter basis).
    const [found] = ((await (await request.get('/api/lots?q=North%20Pivot')).json()) as { items: { id: number; title: string }[] }).items.filter((i) => i.title === title);
    const lot = (await (await request.get(`/api/lots/${found!.id}`)).json()) as {
      priceCentsPerTon: number;
      analysis: { dryMatterPct: number; crudeProteinPct: number; adfPct: number; ndfPct: number };
    };
    const { dryMatterPct: dm, crudeProteinPct: cp, adfPct: adf, ndfPct: ndf } = lot.analysis;

    await page.goto('/hay?q=North%20Pivot');
    await page.getByRole('link', { name: title }).click();
    await expect(page.getByRole('heading', { level: 1, name: title })).toBeVisible();
    await expect(page.getByRole('heading', { name: 'Lab analysis' })).toBeVisible();
    // Each nutrient on a DM basis and as fed (DM value × dry-matter fraction; common practice), one decimal.
    const cells = (abbr: string) => page.getByRole('row', { name: new RegExp(`\\(${abbr}\\)`) }).getByRole('cell');
    for (const [abbr, value] of [['CP', cp], ['ADF', adf], ['NDF', ndf]] as const) {
      await expect(cells(abbr)).toHaveText([`${value.toFixed(1)}%`, `${((value * dm) / 100).toFixed(1)}%`]);
    }
    // RFV by Rohweder et al. (1978): DDM = 88.9 − 0.779·ADF, DMI = 120/NDF, RFV = DDM·DMI/1.29.
    const rfv = ((88.9 - 0.779 * adf) * (120 / ndf)) / 1.29;
    await expect(page.getByRole('term').filter({ hasText: /^\s*RFV/ })).toHaveText(new RegExp(`RFV\\s*${Math.round(rfv)}\\b`));
    await expect(page.getByText(new RegExp(`\\$${(lot.priceCentsPerTon / 100).toFixed(0)}\\s+per ton as-fed`))).toBeVisible();

    const photo = page.locator('figure img').first();
    await expect(photo).toHaveAttribute('src', /\.webp$/);
    const src = await photo.getAttribute('src');
    const image = await page.request.get(src!);
    expect(image.headers()['content-type']).toBe('image/webp');
  });
});
