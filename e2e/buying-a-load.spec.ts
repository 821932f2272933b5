import { expect, freshPage, test } from './support/test';
import type { SellerLotRow } from '@shared/contracts/selling';
import { makeJpeg } from '../tests/support/upload-fixtures';
import { waitForMail } from './support/mail-catcher';
import { BUYER, GROWER, signInAs as signIn } from './support/accounts';

test.describe.configure({ timeout: 300_000 });

test('a buyer buys a load on the lot page and pays on the payment page; the grower confirms the date and hands it over with a scale ticket; the buyer accepts', async ({ browser }) => {
  const growerPage = await freshPage(browser);
  await signIn(growerPage, GROWER);
  const lots = (await (await growerPage.request.get('/api/selling/lots')).json()) as { items?: SellerLotRow[] } | SellerLotRow[];
  const rows = Array.isArray(lots) ? lots : (lots.items ?? []);
  const candidates = rows.filter((l) => l.status === 'listed');
  let lotId: number | null = null;
  for (const row of candidates) {
    const detail = await (await growerPage.request.get(`/api/lots/${row.id}`)).json();
    if (detail.pickupAllowed && detail.balesAvailable > 0) {
      lotId = row.id;
      break;
    }
  }
  expect(lotId, 'the demo grower has a listed lot sold for pickup').not.toBeNull();

  // The buyer chooses a load on the lot page: the figures show before paying.
  const buyerPage = await freshPage(browser);
  await signIn(buyerPage, BUYER);
  await buyerPage.goto(`/hay/${lotId}`);
  const panel = buyerPage.getByRole('region', { name: 'Buy a load' });
  await expect(panel).toBeVisible();
  await panel.getByLabel('Pickup at the farm').check();
  await expect(panel.getByText('Total')).toBeVisible();
  const day = panel.getByLabel('Pickup day');
  const firstDay = await day.locator('option').nth(1).getAttribute('value');
  await day.selectOption(firstDay!);
  await panel.getByRole('button', { name: 'Hold these bales and pay' }).click();

  // The payment provider's page (the local fake): Stripe's test card 4242… pays.
  await expect(buyerPage.getByRole('heading', { name: /^Pay \$/ })).toBeVisible();
  await buyerPage.getByLabel('Card number').fill('4242 4242 4242 4242');
  await buyerPage.getByRole('button', { name: /^Pay \$/ }).click();
  await expect(buyerPage).toHaveURL(/\/orders\/\d+\?paid=1/);
  const orderId = Number(/\/orders\/(\d+)/.exec(buyerPage.url())![1]);
  await expect(buyerPage.getByTestId('order-status')).toHaveText('paid, date to agree');

  // The grower sees it among incoming orders, confirms the date and hands the load over with a scale ticket.
  await growerPage.goto('/orders');
  await growerPage.getByRole('link', { name: new RegExp(`^Order ${orderId}:`) }).click();
  await growerPage.getByRole('button', { name: 'Confirm this date' }).click();
  await expect(growerPage.getByTestId('order-status')).toHaveText('date agreed');
  const detail = await (await growerPage.request.get(`/api/orders/${orderId}`)).json();
  await growerPage.getByLabel('Weighed tons (scale ticket)').fill(String(detail.tons));
  await growerPage.getByLabel('Scale-ticket photo').setInputFiles({ name: 'ticket.jpg', mimeType: 'image/jpeg', buffer: await makeJpeg(640, 480) });
  await growerPage.getByRole('button', { name: 'Mark picked up' }).click();
  await expect(growerPage.getByTestId('order-status')).toHaveText('delivered, waiting for the buyer');

  // The buyer accepts the load; the order is complete and its receipt printable.
  await buyerPage.goto(`/orders/${orderId}`);
  await buyerPage.getByRole('button', { name: 'Accept the load' }).click();
  await expect(buyerPage.getByTestId('order-status')).toHaveText('complete');
  await expect(buyerPage.getByRole('heading', { name: 'Receipt' })).toBeVisible();

  // Both e-mails went out through the queue and the mail catcher caught them.
  const paid = await waitForMail(BUYER.email, new RegExp(`Order ${orderId} paid`));
  expect(paid.text).toContain('bales');
  await waitForMail(GROWER.email, new RegExp(`New order ${orderId}:`));
  await waitForMail(BUYER.email, new RegExp(`Receipt for order ${orderId}`));
});

test('a visitor sees the figures but is asked to sign in to buy, and to read the lab report', async ({ page }) => {
  const found = await (await page.request.get('/api/lots')).json();
  await page.goto(`/hay/${found.items[0].id}`);
  const panel = page.getByRole('region', { name: 'Buy a load' });
  await expect(panel.getByRole('link', { name: 'Sign in as a buyer' })).toBeVisible();
});
