import { expect, test, type Page } from './support/test';
import { BUYER, signInAs } from './support/accounts';
import { lotsForTheList, putOnHayList } from './support/hay-list';

// A 390 px wide phone (a common current handset width in CSS pixels — common practice).
test.use({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
test.describe.configure({ timeout: 240_000 });

/** The page as it stands must not scroll sideways: the document is no wider than the screen. */
async function expectFits(page: Page, what: string): Promise<void> {
  await page.waitForLoadState('networkidle');
  const { scroll, client } = await page.evaluate(() => ({ scroll: document.documentElement.scrollWidth, client: document.documentElement.clientWidth }));
  expect(scroll, `${what} is ${scroll} px wide on a ${client} px screen`).toBeLessThanOrEqual(client);
}

test('on a 390 px phone the buy panel, a filled hay list, the held orders and the order pages fit the screen', async ({ page }) => {
  await signInAs(page, BUYER);
  const lots = await lotsForTheList(page, 2);
  await page.goto(`/hay/${lots[0]!.id}`);
  await expect(page.getByRole('region', { name: 'Buy a load' }).getByText('Total')).toBeVisible();
  await expectFits(page, 'the lot page with the buy panel');

  await putOnHayList(page, lots);
  await page.goto('/cart');
  await page.getByLabel('Delivered by each grower').check();
  await page.getByLabel('Delivery ZIP').fill('66502');
  await expect(page.getByRole('region', { name: `From ${lots[0]!.farmName}` }).getByText(/Order total/)).toBeVisible();
  await expectFits(page, 'the hay list');
  await page.getByLabel('Pickup at each farm').check();

  await page.getByRole('button', { name: 'Hold these bales and get the payment pages' }).click();
  const held = page.getByRole('region', { name: 'Your bales are held' });
  await expect(held).toBeVisible();
  await expectFits(page, 'the held orders');

  const orderLink = held.getByRole('link', { name: /^Order \d+$/ }).first();
  const orderPath = await orderLink.getAttribute('href');
  await page.goto(orderPath!);
  await expect(page.getByTestId('order-status')).toBeVisible();
  await expectFits(page, `the order page ${orderPath}`);
  await page.goto('/orders');
  await expect(page.getByRole('link', { name: /^Order \d+:/ }).first()).toBeVisible();
  await expectFits(page, 'the orders list');
});
