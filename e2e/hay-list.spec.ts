import { expect, test } from './support/test';
import { BUYER, signInAs } from './support/accounts';
import { lotsFromTwoGrowers, putOnHayList } from './support/hay-list';

test.describe.configure({ timeout: 240_000 });

test('a buyer fills the hay list with two lots of one grower and one of another, changes a quantity, and checks out one order per grower with its own payment page', async ({ page }) => {
  await signInAs(page, BUYER);
  const lots = await lotsFromTwoGrowers(page);
  const [a1, a2, b] = lots;
  await putOnHayList(page, lots);

  await page.goto('/cart');
  const growerA = page.getByRole('region', { name: `From ${a1.farmName}` });
  const growerB = page.getByRole('region', { name: `From ${b.farmName}` });
  await expect(growerA.getByRole('article')).toHaveCount(2);
  await expect(growerB.getByRole('article')).toHaveCount(1);
  await expect(growerA.getByText('These lots make one order: one payment, one trip.')).toBeVisible();
  const first = page.getByRole('article', { name: a1.title });
  await expect(growerA.getByText(/Order total/)).toBeVisible();

  // The quantity in bales: 150 bales shows as 150 bales in the figures.
  await first.getByLabel('Quantity').fill('150');
  await first.getByLabel('Quantity').blur();
  await expect(first.getByText(/^Hay \(150 bales/)).toBeVisible();
  // The same line in loads: the field now counts loads of the grower's truck, and the bales stay 150.
  await first.getByLabel('Counted in').selectOption('loads');
  const perLoad = Number(/a full load is (\d+) bales/.exec(await first.getByText(/a full load is/).innerText())![1]);
  await expect(first.getByLabel('Quantity')).toHaveValue(String(Math.round((150 / perLoad) * 100) / 100));
  await expect(first.getByText(/^Hay \(150 bales/)).toBeVisible();
  // The grower's order adds both lines' hay: one set of order figures (freight, fee, total) for the two lots.
  const cents = (text: string) => Math.round(Number(text.replace(/[^\d.]/g, '')) * 100);
  const hayOf = async (title: string) => cents(await page.getByRole('article', { name: title }).getByRole('definition').first().innerText());
  await expect(growerA.locator('.order-figures')).toHaveCount(1);
  await expect.poll(async () => cents(await growerA.locator('.order-figures dd').first().innerText()) - (await hayOf(a1.title)) - (await hayOf(a2.title))).toBe(0);

  await page.getByRole('button', { name: 'Hold these bales and get the payment pages' }).click();
  const held = page.getByRole('region', { name: 'Your bales are held' });
  await expect(held).toBeVisible();
  // Two growers, two orders, two payment pages (not three: one per grower, not per lot).
  await expect(held.getByRole('link', { name: /^Pay / })).toHaveCount(2);
  await expect(held.getByText(`150 bales of ${a1.title}`)).toBeVisible();
  // The list is emptied once the orders exist.
  await expect(page.getByRole('article')).toHaveCount(0);

  // The two-lot order has one payment page at the provider (the local fake): pay it.
  await held.getByRole('link', { name: `Pay ${a1.farmName}` }).click();
  await expect(page.getByRole('heading', { name: /^Pay \$/ })).toBeVisible();
  await page.getByLabel('Card number').fill('4242 4242 4242 4242');
  await page.getByRole('button', { name: /^Pay \$/ }).click();
  await expect(page).toHaveURL(/\/orders\/\d+\?paid=1/);
  await expect(page.getByTestId('order-status')).toHaveText('paid, date to agree');
  // The order page and its receipt show both lots of the grower.
  await expect(page.getByRole('heading', { level: 1 })).toContainText(`${a1.title} + ${a2.title}`);
  await expect(page.getByTestId('order-line')).toHaveCount(2);
  await expect(page.getByTestId('order-line').first()).toContainText('150 bales');
});
