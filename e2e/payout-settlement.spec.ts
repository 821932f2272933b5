import { expect, test, type Page } from './support/test';
import type { OrderView } from '@shared/contracts/orders';
import { threeRoles, usd } from './support/accounts';
import { callApi, csrfToken } from './support/app-api';
import { deliveredPickupOrder } from './support/orders';
import { platformBalanceCents, stripeGet } from './support/stripe-fake';

test.describe.configure({ timeout: 300_000 });

test('the admin settles a payout batch for a grower with a completed order: one transfer, paid once, in the grower’s history', async ({ browser }) => {
  const { grower, buyer, admin } = await threeRoles(browser);

  // The grower finishes payout set-up on the farm page (the provider's onboarding, here the local fake).
  await payoutsReady(grower);

  // A load bought, handed over and accepted: the order is complete and due to the grower.
  const delivered = await deliveredPickupOrder(buyer, grower);
  const order = await callApi<OrderView>(buyer, 'POST', `/api/orders/${delivered.id}/accept`, {});
  expect(order.status).toBe('completed');
  // The grower is owed hay and freight; the platform fee was the buyer's and stays with the platform (issue 11).
  const owedForOrder = order.goodsCents + order.freightCents - order.refundedCents;

  await admin.goto('/admin/payouts');
  const due = admin.getByRole('region', { name: `Due to ${order.farm.name}` });
  const row = due.getByRole('row').filter({ has: admin.getByRole('cell', { name: String(order.id), exact: true }) });
  await expect(row.getByRole('cell').last()).toHaveText(usd(owedForOrder));
  await due.getByRole('checkbox', { name: `Include ${order.farm.name}` }).check();
  await admin.getByRole('button', { name: /^Prepare a batch for 1 grower/ }).click();

  const confirm = admin.getByRole('alertdialog');
  await expect(confirm.getByRole('heading')).toHaveText(/^Send \$[\d,.]+ to 1 grower\?$/);
  const batchTotal = dollarsIn(await confirm.getByRole('heading').textContent());
  expect(batchTotal).toBeGreaterThanOrEqual(owedForOrder);
  const balanceBefore = await platformBalanceCents();
  await confirm.getByRole('button', { name: 'Send payouts' }).click();

  // The batch shows one sent payout with the provider's transfer.
  const batch = admin.getByRole('region', { name: /^Batch \d+$/ }).first();
  await expect(batch).toContainText('settled');
  const payoutRow = batch.getByRole('row').filter({ hasText: order.farm.name });
  await expect(payoutRow).toContainText('sent');
  await expect(payoutRow).toContainText(usd(batchTotal));
  const transferId = (await payoutRow.getByRole('cell').nth(3).textContent())!.trim();
  expect(transferId).toMatch(/^tr_/);

  // The provider made exactly that transfer, and the platform's balance fell by exactly the batch.
  const transfer = await stripeGet<{ amount: number; currency: string; destination: string }>(`/v1/transfers/${transferId}`);
  expect([transfer.amount, transfer.currency]).toEqual([batchTotal, 'usd']);
  expect(balanceBefore - (await platformBalanceCents())).toBe(batchTotal);

  // Sending the same batch again (a retried request, a second tab) pays nobody twice.
  const batchId = Number(/\d+/.exec((await batch.getAttribute('aria-label'))!)![0]);
  const again = await admin.request.post(`/api/admin/payouts/batches/${batchId}/settle`, { headers: { 'X-XSRF-TOKEN': await csrfToken(admin) } });
  expect(again.status()).toBeLessThan(500);
  expect(balanceBefore - (await platformBalanceCents())).toBe(batchTotal);
  await admin.reload();
  await expect(admin.getByRole('region', { name: `Due to ${order.farm.name}` })).toHaveCount(0);

  // The grower sees the payout, naming the order, in the dashboard's history.
  await grower.goto('/selling');
  const history = grower.getByRole('table', { name: 'Payout history' });
  const paid = history.getByRole('row').filter({ hasText: `#${order.id}` });
  await expect(paid).toHaveCount(1);
  await expect(paid).toContainText('sent');
  await expect(paid).toContainText(usd(batchTotal));
});

async function payoutsReady(grower: Page): Promise<void> {
  await grower.goto('/selling/farm');
  const section = grower.getByRole('region', { name: 'Payouts' });
  const setUp = section.getByRole('button', { name: 'Set up payouts' });
  const ready = section.getByText('Your payout account is ready.');
  await expect(setUp.or(ready)).toBeVisible();
  if (await setUp.isVisible()) {
    await setUp.click();
    await expect(grower).toHaveURL(/\/selling\/farm\?payouts=returned/);
  }
  await expect(ready).toBeVisible();
}

function dollarsIn(text: string | null): number {
  const match = /\$([\d,]+)\.(\d{2})/.exec(text ?? '');
  if (!match) throw new Error(`no dollar amount in “${text}”`);
  return Number(match[1]!.replace(/,/g, '')) * 100 + Number(match[2]);
}
