import { expect, test, whenInteractive, type Browser, type BrowserContextOptions, type Page } from './support/test';
import { BUYER } from './support/accounts';

// The catalogue's server page is whole for reading, so its app starts only at the visitor's first sign of use
// (shared/contracts/page-wake.ts), with its code fetched ahead while the browser is idle. These journeys open
// their pages in contexts of their own, without the harness's sign of use and wait (e2e/support/test.ts).

async function pageOfItsOwn(browser: Browser, baseURL: string | undefined, options: BrowserContextOptions = {}): Promise<Page> {
  return (await browser.newContext({ baseURL, ...options })).newPage();
}

const interactive = (page: Page) => page.locator('html[data-interactive]');

test('the catalogue reads without its app running; the first sign of use starts it, with its code already fetched', async ({ browser, baseURL }) => {
  const page = await pageOfItsOwn(browser, baseURL);
  await page.goto('/hay');
  await page.waitForLoadState('networkidle');
  await expect(page.getByRole('list', { name: 'Hay lots' }).getByRole('heading', { level: 3 }).first()).toBeVisible();
  await expect(interactive(page)).toHaveCount(0);

  const firstUse = await page.evaluate(() => performance.now());
  await page.mouse.move(20, 20);
  await expect(interactive(page)).toBeAttached();
  const scripts = await page.evaluate(
    (since) =>
      performance
        .getEntriesByType('resource')
        .filter((e) => e.startTime >= since && new URL(e.name).pathname.endsWith('.js'))
        .map((e) => ({ file: new URL(e.name).pathname, bytesOverTheNetwork: (e as PerformanceResourceTiming).transferSize })),
    firstUse,
  );
  // The app did load its modules on the first use, and every one came from the browser's cache.
  expect(scripts.length).toBeGreaterThan(0);
  expect(scripts.filter((s) => s.bytesOverTheNetwork > 0)).toEqual([]);
  await page.context().close();
});

test('a search saved before the app runs is saved, with its name and filters', async ({ browser, baseURL }) => {
  const page = await pageOfItsOwn(browser, baseURL);
  await page.goto('/sign-in');
  await whenInteractive(page);
  await page.getByLabel('E-mail').fill(BUYER.email);
  await page.getByLabel('Password').fill(BUYER.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).not.toHaveURL(/\/sign-in/);

  const field = `Larch Bend ${Date.now().toString(36)}`;
  await page.goto(`/hay?q=${encodeURIComponent(field)}`);
  await expect(interactive(page)).toHaveCount(0);
  // The app's code is held back until the press, so the press always comes before the app runs.
  let pressed = () => {};
  const afterThePress = new Promise<void>((resolve) => (pressed = resolve));
  await page.route(/\/chunk-[\w-]+\.js$/, async (route) => {
    await afterThePress;
    await route.continue();
  });
  await page.getByLabel('Name this search').fill(`Hay from ${field}`);
  await page.getByRole('button', { name: 'Save and alert me' }).click();
  await expect(interactive(page)).toHaveCount(0);
  pressed();
  await expect(page.getByRole('status').filter({ hasText: `Saved “Hay from ${field}”` })).toBeVisible();
  expect(new URL(page.url()).searchParams.get('q')).toBe(field);
  expect(new URL(page.url()).searchParams.has('name')).toBe(false);

  const { items: saved } = (await (await page.request.get('/api/saved-searches')).json()) as { items: { name: string; query: Record<string, string> }[] };
  expect(saved.find((s) => s.name === `Hay from ${field}`)?.query).toEqual({ q: field });
  await page.context().close();
});

test('on a phone, the first touch on "Filters" opens them once the app runs', async ({ browser, baseURL }) => {
  // A 390 px wide phone (a common current handset width in CSS pixels — common practice).
  const page = await pageOfItsOwn(browser, baseURL, { viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
  await page.goto('/hay');
  await expect(interactive(page)).toHaveCount(0);
  await page.getByRole('button', { name: 'Filters' }).tap();
  await expect(page.getByLabel('RFV from')).toBeVisible();
  await expect(interactive(page)).toBeAttached();
  await page.context().close();
});
