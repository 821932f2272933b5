import { expect, type Page } from './test';
import type { OrderQuote, OrderView } from '@shared/contracts/orders';
import type { SellerLotRow } from '@shared/contracts/selling';
import { callApi } from './app-api';

/** The provider's test card that pays (Stripe's documented 4242 card; the local fake honours it). */
const PAYING_CARD = '4242 4242 4242 4242';

/**
 * A pickup order of one of the signed-in grower's listed lots, bought by the signed-in buyer at the lot's
 * smallest order and paid on the payment provider's page. Returns the order as the buyer sees it, `paid`.
 */
export async function paidPickupOrder(buyer: Page, grower: Page): Promise<OrderView> {
  const rows = await callApi<{ items: SellerLotRow[] } | SellerLotRow[]>(grower, 'GET', '/api/selling/lots');
  const listed = (Array.isArray(rows) ? rows : rows.items).filter((l) => l.status === 'listed');
  let chosen: { lotId: number; bales: number } | null = null;
  for (const lot of listed) {
    const quote = await callApi<OrderQuote>(buyer, 'GET', `/api/orders/quote?lotId=${lot.id}&bales=1&method=pickup`);
    const bales = Math.max(1, quote.minBales);
    if (quote.balesAvailable < bales) continue;
    const exact = await callApi<OrderQuote>(buyer, 'GET', `/api/orders/quote?lotId=${lot.id}&bales=${bales}&method=pickup`);
    if (exact.problem === null) {
      chosen = { lotId: lot.id, bales };
      break;
    }
  }
  expect(chosen, 'the demo grower has a listed lot a buyer can pick up').not.toBeNull();
  const { lotId, bales } = chosen!;
  const open = await callApi<{ days: { date: string }[]; pickupFromHour: number }>(buyer, 'GET', `/api/orders/lots/${lotId}/open-days`);
  const placed = await callApi<{ id: number; paymentUrl: string }>(buyer, 'POST', '/api/orders', { lotId, bales, method: 'pickup', window: { date: open.days[0]!.date, pickupHour: open.pickupFromHour } });

  // To the provider's page the way a buyer goes: from the order page's link.
  await buyer.goto(`/orders/${placed.id}`);
  await buyer.getByRole('link', { name: 'Go to the payment page' }).click();
  await expect(buyer).toHaveURL(placed.paymentUrl);
  await buyer.getByLabel('Card number').fill(PAYING_CARD);
  await buyer.getByRole('button', { name: /^Pay \$/ }).click();
  await expect(buyer).toHaveURL(new RegExp(`/orders/${placed.id}\\?paid=1`));
  // The payment is recorded when the provider's webhook arrives.
  await expect.poll(async () => (await callApi<OrderView>(buyer, 'GET', `/api/orders/${placed.id}`)).status, { timeout: 30_000 }).toBe('paid');
  return callApi<OrderView>(buyer, 'GET', `/api/orders/${placed.id}`);
}

/**
 * A paid pickup order (see paidPickupOrder) whose date the grower confirmed and whose load the grower handed
 * over. Returns the order as the buyer sees it, `delivered` and waiting for the buyer.
 */
export async function deliveredPickupOrder(buyer: Page, grower: Page): Promise<OrderView> {
  const paid = await paidPickupOrder(buyer, grower);
  await callApi(grower, 'POST', `/api/orders/${paid.id}/confirm-date`, {});
  const delivered = await callApi<OrderView>(grower, 'POST', `/api/orders/${paid.id}/hand-over`, {});
  expect(delivered.status).toBe('delivered');
  return callApi<OrderView>(buyer, 'GET', `/api/orders/${paid.id}`);
}
