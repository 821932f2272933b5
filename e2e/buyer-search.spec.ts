import { expect, test, type APIRequestContext, type Locator } from './support/test';
import type { ComparedLot } from '@shared/contracts/compare';

/** Titles the API lists for a catalogue query (the oracle for what the page should show). */
async function apiTitles(request: APIRequestContext, query: string): Promise<string[]> {
  const res = await request.get(`/api/lots?${query}`);
  expect(res.ok()).toBe(true);
  return ((await res.json()) as { items: { title: string }[] }).items.map((i) => i.title);
}

test.describe('buyers find and choose hay', () => {
  test('filters by RFV, protein and distance from a ZIP; the URL carries them and its server-rendered HTML lists only matching lots', async ({ page, request }) => {
    await page.goto('/hay');
    await page.getByLabel('RFV from').fill('120');
    await page.getByLabel(/^(CP|Crude protein) from/).fill('15');
    await page.getByLabel('Your ZIP').fill('66502');
    await page.getByLabel('Within miles').fill('100');
    await page.getByRole('button', { name: 'Show hay' }).click();

    await expect(page).toHaveURL(/rfvMin=120/);
    const url = new URL(page.url());
    expect(Object.fromEntries(url.searchParams)).toMatchObject({ rfvMin: '120', cpMin: '15', zip: '66502', radiusMi: '100' });

    const matching = await apiTitles(request, 'rfvMin=120&cpMin=15&zip=66502&radiusMi=100&pageSize=100');
    const everything = await apiTitles(request, 'pageSize=100');
    expect(matching.length).toBeGreaterThan(0);
    expect(matching.length).toBeLessThan(everything.length);
    await expect(page.getByText(new RegExp(`^\\s*${matching.length} lots near Manhattan, KS 66502`))).toBeVisible();
    await expect(page.getByRole('list', { name: 'Hay lots' }).getByRole('listitem')).toHaveCount(matching.length);

    // A plain HTTP request runs no JavaScript: the lots in its body were filtered and rendered on the server.
    const html = await (await request.get(url.pathname + url.search)).text();
    for (const title of matching) expect(html).toContain(title);
    for (const title of everything.filter((t) => !matching.includes(t))) expect(html).not.toContain(title);

    // Back restores the unfiltered catalogue from the URL.
    await page.goBack();
    await expect(page).toHaveURL(/\/hay$/);
    await expect(page.getByLabel('RFV from')).toHaveValue('');
  });

  // The filters' form is plain HTML named like the URL's filters: a browser that never runs the page's scripts
  // (blocked, failed to load, or not arrived yet on a slow line) still searches with it.
  test('without scripts the filters still search, and the page sent back shows what was chosen', async ({ browser, baseURL, request }) => {
    const context = await browser.newContext({ javaScriptEnabled: false, baseURL });
    const page = await context.newPage();
    await page.goto('/hay');
    await page.getByLabel('RFV from').fill('120');
    await page.getByLabel('Forage', { exact: true }).selectOption({ label: 'Alfalfa' });
    await page.getByLabel('Sampled to protocol only').check();
    await page.getByRole('combobox', { name: 'Sort by' }).selectOption({ label: 'Price per ton' });
    await page.getByRole('button', { name: 'Show hay' }).click();

    await expect(page).toHaveURL(/rfvMin=120/);
    const matching = await apiTitles(request, 'rfvMin=120&forageType=alfalfa&compliantOnly=true&sort=price');
    expect(matching.length).toBeGreaterThan(0);
    const cards = page.getByRole('list', { name: 'Hay lots' }).getByRole('heading', { level: 3 });
    expect(await cards.allTextContents()).toEqual(matching.map((t) => expect.stringContaining(t)));
    await expect(page.getByLabel('RFV from')).toHaveValue('120');
    await expect(page.getByLabel('Forage', { exact: true })).toHaveValue('alfalfa');
    await expect(page.getByLabel('Sampled to protocol only')).toBeChecked();
    await expect(page.getByRole('combobox', { name: 'Sort by' })).toHaveValue('price');
    await context.close();
  });

  test('a list choice and a tick made before the filters wake are kept and searched', async ({ page }) => {
    await page.goto('/hay');
    await page.getByLabel('Forage', { exact: true }).selectOption({ label: 'Alfalfa' });
    await page.getByLabel('Nitrate tested').check();
    await expect(page).toHaveURL(/forageType=alfalfa/);
    await expect(page).toHaveURL(/nitrateTestedOnly=true/);
    await expect(page.getByLabel('Forage', { exact: true })).toHaveValue('alfalfa');
    await expect(page.getByLabel('Nitrate tested')).toBeChecked();
  });

  test('an empty result says so and offers to drop one filter at a time', async ({ page }) => {
    await page.goto('/hay?rfvMin=390&forageType=alfalfa');
    await expect(page.getByRole('heading', { name: 'No lots match' })).toBeVisible();
    await page.getByRole('button', { name: 'Remove RFV from (390)' }).click();
    await expect(page).toHaveURL(/\/hay\?forageType=alfalfa$/);
    await expect(page.getByRole('list', { name: 'Hay lots' }).getByRole('listitem').first()).toBeVisible();
  });

  test('sorts by price and pages through the results with a stable total', async ({ page, request }) => {
    await page.goto('/hay');
    await page.getByRole('combobox', { name: 'Sort by' }).selectOption({ label: 'Price per ton' });
    await expect(page).toHaveURL(/sort=price/);

    const byPrice = await apiTitles(request, 'sort=price&pageSize=100');
    const cards = page.getByRole('list', { name: 'Hay lots' }).getByRole('heading', { level: 3 });
    await expect(cards).toHaveCount(12);
    expect(await cards.allTextContents()).toEqual(byPrice.slice(0, 12).map((t) => ` ${t} `.trim()).map((t) => expect.stringContaining(t)));
    await expect(page.getByText(`${byPrice.length} lots`)).toBeVisible();

    await page.getByRole('button', { name: 'Later lots ›' }).click();
    await expect(page).toHaveURL(/page=2/);
    await expect(cards.first()).toHaveText(byPrice[12]!);
    await expect(page.getByText(`${byPrice.length} lots`)).toBeVisible();
    const html = await (await request.get(new URL(page.url()).pathname + new URL(page.url()).search)).text();
    expect(html).toContain(byPrice[12]!);
    expect(html).not.toContain(byPrice[0]!);
  });

  test('a comparison of two lots shows nutrients on a DM basis and the delivered cost per pound of protein', async ({ page, request }) => {
    await page.goto('/hay?zip=66502&sort=rfv');
    const [first, second] = await apiTitles(request, 'zip=66502&sort=rfv&pageSize=2');
    await page.getByRole('button', { name: `Compare ${first}` }).click();
    await page.getByRole('button', { name: `Compare ${second}` }).click();
    await expect(page.getByRole('button', { name: `Compare ${first}` })).toHaveAttribute('aria-pressed', 'true');
    await page.getByRole('link', { name: 'Compare 2 lots' }).click();

    await expect(page).toHaveURL(/\/hay\/compare\?ids=\d+(%2C|,)\d+&zip=66502/);
    await expect(page.getByRole('heading', { level: 1, name: 'Compare hay' })).toBeVisible();
    await expect(page.getByRole('columnheader', { name: new RegExp(first!) })).toBeVisible();
    // The oracle: the compare API's figures for the same lots and ZIP, column by column.
    const ids = new URL(page.url()).searchParams.get('ids')!;
    const comparison = (await (await request.get(`/api/lots/compare?ids=${ids}&zip=66502`)).json()) as { items: ComparedLot[] };
    expect(comparison.items.map((l) => l.title)).toEqual([first, second]);
    const headers = page.getByRole('columnheader');
    await expect(headers.filter({ hasText: first! })).toHaveCount(1);
    await expect(headers.filter({ hasText: second! })).toHaveCount(1);
    const cells = (label: RegExp) => page.getByRole('row', { name: label }).getByRole('cell');
    const usd = (cents: number, digits: number) => `$${(cents / 100).toLocaleString('en-US', { minimumFractionDigits: digits, maximumFractionDigits: digits })}`;
    const exactly = (text: string) => new RegExp(`^\\s*${text.replace(/[$.()×]/g, '\\$&')}(\\s*lowest)?\\s*$`);
    await expect(cells(/Cost per lb of crude protein/)).toHaveText(comparison.items.map((l) => exactly(usd(l.pricing.perLbCrudeProteinCents!, 2))));
    await expect(cells(/Cost per ton of dry matter/)).toHaveText(comparison.items.map((l) => exactly(usd(l.pricing.perDmTonCents, 0))));
    await expect(cells(/Price per ton delivered/)).toHaveText(comparison.items.map((l) => exactly(usd(l.pricing.perTonCents, 0))));
    await expect(cells(/^Freight/)).toHaveText(
      comparison.items.map((l) => exactly(`${usd(l.pricing.freightCents, 0)} (${l.pricing.loads} load${l.pricing.loads === 1 ? '' : 's'} × ${Math.round(l.distanceMi!)} mi × ${usd(l.freightCentsPerLoadedMile!, 2)} per loaded mile)`)),
    );
    await expect(cells(/Crude protein \(CP\)/)).toHaveText(comparison.items.map((l) => exactly(`${l.nutrients.crudeProteinPct.toFixed(1)}%`)));
    await expect(cells(/^RFV/)).toHaveText(comparison.items.map((l) => exactly(l.nutrients.rfv.toFixed(0))));
    // And the API's protein cost is the delivered cost over the pounds of protein bought (common practice):
    // total ÷ (tons × 2,000 lb × DM fraction × CP fraction), to the cent.
    for (const l of comparison.items) {
      const lbProtein = l.pricing.tons * 2000 * (l.nutrients.dryMatterPct / 100) * (l.nutrients.crudeProteinPct / 100);
      expect(Math.abs(l.pricing.perLbCrudeProteinCents! - l.pricing.totalCents / lbProtein)).toBeLessThanOrEqual(1);
    }
    await expect(page.getByRole('region', { name: 'More is better' }).getByRole('img', { name: /^Crude protein/ })).toBeVisible();
    await expect(page.getByRole('complementary', { name: 'Caution' })).toContainText('veterinarian or an equine nutritionist');

    // The comparison is server-rendered too.
    const html = await (await request.get(new URL(page.url()).pathname + new URL(page.url()).search)).text();
    expect(html).toContain('Cost per lb of crude protein');
    expect(html).toContain(first!);
  });

  test('a visitor plans a herd, gets the cheapest delivered mix and puts it on the hay list', async ({ page }) => {
    await page.goto('/hay');
    await page.getByRole('link', { name: /herd planner/i }).first().click();
    await expect(page.getByRole('heading', { level: 1, name: 'Herd planner' })).toBeVisible();
    await expect(page.getByText(/NRC \(2007\)/).first()).toBeVisible();
    await page.getByRole('spinbutton', { name: 'Horses' }).fill('4');
    await page.getByLabel('Days to cover').fill('180');
    // 4 × 1,100 lb at maintenance: 4 × 499.0 kg × 0.0333 = 66.5 Mcal a day (NRC 2007).
    await expect(page.getByRole('row', { name: /Herd, per day/ })).toContainText('66.5 Mcal');

    await page.getByLabel('Deliver to ZIP').fill('66044');
    await page.getByRole('button', { name: 'Find the cheapest mix' }).click();
    await expect(page.getByText(/^Buy [\d.,]+ t of hay from/)).toBeVisible({ timeout: 20_000 });
    // The plan's lines as the planner shows them: lot, tons, bales, hay and freight.
    const planTable = page.getByRole('table').filter({ has: page.getByRole('columnheader', { name: 'Delivered' }) });
    const planned = await tableLines(planTable, { tons: 0, bales: 1, hay: 3, freight: 4 });
    expect(planned.length).toBeGreaterThan(0);
    await page.getByRole('button', { name: 'Put this plan on my hay list' }).click();
    await page.getByRole('link', { name: 'Open your hay list' }).click();

    await expect(page.getByRole('heading', { level: 1, name: 'Your hay list' })).toBeVisible();
    // Lot by lot, the hay list holds exactly the planned mix: the same lots and the same bales, each priced
    // again from the live lot at the same hay cost the plan stated (the plan prices the whole bales it recommends,
    // as the order quote does); it survives a reload (kept in the browser).
    const amount = (text: string | null | undefined) => Number((text ?? '').replace(/[^\d.]/g, ''));
    const expectPlannedLines = async () => {
      await expect(page.getByRole('article')).toHaveCount(planned.length);
      for (const line of planned) {
        const article = page.getByRole('article', { name: line.lot });
        await expect(article.getByRole('spinbutton', { name: 'Quantity' })).toHaveValue(String(amount(line.bales)));
        await expect(article.getByRole('term').first()).toContainText(`Hay (${amount(line.bales)} bales`);
        await expect(article.getByRole('definition').first()).toHaveText(line.hay!);
      }
    };
    await expectPlannedLines();
    await page.reload();
    await expectPlannedLines();
  });
});

/** The body rows of a table of lots: the lot's link text and the named cells (by index), in page order. */
async function tableLines(table: Locator, columns: { tons: number; bales: number; hay: number; freight: number }) {
  const rows = table.locator('tbody').getByRole('row');
  const lines = [];
  for (const row of await rows.all()) {
    const cells = (await row.getByRole('cell').allTextContents()).map((c) => c.trim());
    lines.push({
      lot: (await row.getByRole('rowheader').getByRole('link').textContent())!.trim(),
      tons: cells[columns.tons],
      bales: cells[columns.bales],
      hay: cells[columns.hay],
      freight: cells[columns.freight],
    });
  }
  return lines;
}
