import { expect, test } from '@playwright/test';
import { BUYER, signInAs } from './support/accounts';
import { lotsForTheList, putOnHayList } from './support/hay-list';

test.describe.configure({ timeout: 240_000 });

test('a buyer fills the hay list from two lot pages, changes a quantity, and checks out one order per lot with its own payment page', async ({ page }) => {
  await signInAs(page, BUYER);
  const lots = await lotsForTheList(page, 2);
  await putOnHayList(page, lots);

  await page.goto('/cart');
  for (const lot of lots) await expect(page.getByRole('region', { name: `From ${lot.farmName}` })).toBeVisible();
  const first = page.getByRole('article', { name: lots[0]!.title });
  const second = page.getByRole('article', { name: lots[1]!.title });
  await expect(first.getByText(/Order total/)).toBeVisible();

  // The quantity in bales: 150 bales shows as 150 bales in the figures.
  await first.getByLabel('Quantity').fill('150');
  await first.getByLabel('Quantity').blur();
  await expect(first.getByText(/^Hay \(150 bales/)).toBeVisible();
  // The same line in loads: the field now counts loads of the grower's truck, and the bales stay 150.
  await first.getByLabel('Counted in').selectOption('loads');
  const perLoad = Number(/a full load is (\d+) bales/.exec(await first.getByText(/a full load is/).innerText())![1]);
  await expect(first.getByLabel('Quantity')).toHaveValue(String(Math.round((150 / perLoad) * 100) / 100));
  await expect(first.getByText(/^Hay \(150 bales/)).toBeVisible();

  await page.getByRole('button', { name: 'Hold these bales and get the payment pages' }).click();
  const held = page.getByRole('region', { name: 'Your bales are held' });
  await expect(held).toBeVisible();
  await expect(held.getByRole('link', { name: /^Pay for / })).toHaveCount(2);
  // The list is emptied once the orders exist.
  await expect(second).toHaveCount(0);

  // Each order has its own payment page at the provider (the local fake): pay the first.
  await held.getByRole('link', { name: `Pay for ${lots[0]!.title}` }).click();
  await expect(page.getByRole('heading', { name: /^Pay \$/ })).toBeVisible();
  await page.getByLabel('Card number').fill('4242 4242 4242 4242');
  await page.getByRole('button', { name: /^Pay \$/ }).click();
  await expect(page).toHaveURL(/\/orders\/\d+\?paid=1/);
  await expect(page.getByTestId('order-status')).toHaveText('paid, date to agree');
});
