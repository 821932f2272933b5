import { expect, test, type Page } from './support/test';
import { ADMIN, BUYER, GROWER, listedLotIds, signInAs } from './support/accounts';
import { demoOrderWithMessage } from './support/demo-order';

// A 390 px wide phone (a common current handset width in CSS pixels — common practice).
test.use({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });

/** The page must not scroll sideways: the document is no wider than the screen. */
async function expectNoSidewaysScroll(page: Page, path: string): Promise<void> {
  await page.goto(path);
  await page.waitForLoadState('networkidle');
  const { scroll, client } = await page.evaluate(() => ({ scroll: document.documentElement.scrollWidth, client: document.documentElement.clientWidth }));
  expect(scroll, `${path} is ${scroll} px wide on a ${client} px screen`).toBeLessThanOrEqual(client);
}

test.describe('on a 390 px phone', () => {
  test('no buyer page scrolls sideways, and the top bar keeps sign-in on screen', async ({ page }) => {
    const [a, b] = await listedLotIds(page, 2);
    for (const path of ['/', '/hay', `/hay/${a}`, `/hay/compare?ids=${a},${b}`, '/planner', '/cart']) await expectNoSidewaysScroll(page, path);

    const signIn = page.getByRole('banner').getByRole('link', { name: 'Sign in', exact: true });
    await expect(signIn).toBeInViewport({ ratio: 1 });
    // Every main link has a name a screen reader can say.
    for (const link of await page.getByRole('navigation', { name: 'Main' }).getByRole('link').all()) {
      expect((await link.getAttribute('aria-label'))?.trim() || (await link.innerText()).trim()).not.toBe('');
    }
  });

  test('the catalogue filters fold away until asked for', async ({ page }) => {
    await page.goto('/hay');
    await expect(page.getByLabel('RFV from')).toBeHidden();
    // The first lot is on the first screen, not below some 17 fields.
    await expect(page.getByRole('list', { name: 'Hay lots' }).getByRole('heading', { level: 3 }).first()).toBeInViewport();
    await page.getByRole('button', { name: 'Filters' }).click();
    await expect(page.getByLabel('RFV from')).toBeVisible();
    await page.getByLabel('RFV from').fill('130');
    await expect(page).toHaveURL(/rfvMin=130/);
    await page.getByRole('button', { name: 'Hide filters' }).click();
    await expect(page.getByLabel('RFV from')).toBeHidden();
  });

  test('the planner’s lot picker opens on screen and a lot can be tapped', async ({ page }) => {
    await page.goto('/planner');
    await page.getByRole('combobox', { name: 'Choose a lot' }).click();
    const option = page.getByRole('option').nth(1);
    await expect(option).toBeInViewport();
    const chosen = (await option.innerText()).trim();
    await option.tap();
    await expect(page.getByRole('combobox', { name: 'Choose a lot' })).toContainText(chosen.split(' — ')[0]!);
  });

  test('the lot form and a grower’s pages fit the screen', async ({ page }) => {
    await signInAs(page, GROWER);
    for (const path of ['/selling', '/selling/lots/new']) await expectNoSidewaysScroll(page, path);
    await expect(page.getByRole('button', { name: /Account menu/ })).toBeInViewport({ ratio: 1 });
  });

  test('a buyer’s orders, an order with its messages and the inbox fit the screen', async ({ page, browser }) => {
    test.setTimeout(180_000);
    const { orderId, threadId } = await demoOrderWithMessage(browser);
    await signInAs(page, BUYER);
    for (const path of ['/orders', `/orders/${orderId}`, '/messages', `/messages/${threadId}`]) await expectNoSidewaysScroll(page, path);
  });

  test('a grower’s incoming orders, an order, the delivery calendar and the inbox fit the screen', async ({ page, browser }) => {
    test.setTimeout(180_000);
    const { orderId, threadId } = await demoOrderWithMessage(browser);
    await signInAs(page, GROWER);
    for (const path of ['/orders', `/orders/${orderId}`, '/selling/calendar', '/messages', `/messages/${threadId}`]) await expectNoSidewaysScroll(page, path);
  });

  test('the admin’s claim screen and an order fit the screen', async ({ page, browser }) => {
    test.setTimeout(180_000);
    const { orderId } = await demoOrderWithMessage(browser);
    await signInAs(page, ADMIN);
    for (const path of ['/admin/claims', `/orders/${orderId}`]) await expectNoSidewaysScroll(page, path);
  });
});
