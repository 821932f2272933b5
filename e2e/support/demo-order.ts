import type { Browser } from '@playwright/test';
import type { OrderThread } from '@shared/contracts/messages';
import { BUYER, GROWER, signInAs } from './accounts';
import { callApi } from './app-api';
import { paidPickupOrder } from './orders';
import { freshPage } from './test';

export interface DemoOrder {
  orderId: number;
  /** The order's conversation, holding one message from the buyer. */
  threadId: number;
}

let made: Promise<DemoOrder> | undefined;

/**
 * A paid pickup order between the demo buyer and the demo grower with one message on it, for journeys that
 * only look at order pages: made once per test worker (on first use) and shared after that.
 */
export function demoOrderWithMessage(browser: Browser): Promise<DemoOrder> {
  made ??= (async () => {
    const [buyer, grower] = [await freshPage(browser), await freshPage(browser)];
    await signInAs(buyer, BUYER);
    await signInAs(grower, GROWER);
    const order = await paidPickupOrder(buyer, grower);
    const posted = await callApi<OrderThread>(buyer, 'POST', `/api/messages/orders/${order.id}`, { body: 'Can a truck with a 24 ft trailer turn in the yard?' });
    await Promise.all([buyer.context().close(), grower.context().close()]);
    return { orderId: order.id, threadId: posted.thread!.id };
  })();
  return made;
}
