import type Stripe from 'stripe';
import type { StripeFakeServer, TestApi } from './test-api';

/** Pays (or fails to pay) on the Stripe fake's hosted page with a test card. */
export const payOnPage = (url: string, card: string) =>
  fetch(url, { method: 'POST', redirect: 'manual', headers: { 'content-type': 'application/x-www-form-urlencoded' }, body: `card=${card}` });

/** Posts one event to the API's webhook, signed as Stripe signs them. */
export async function postWebhookEvent(event: Stripe.Event, api: TestApi) {
  const payload = JSON.stringify(event);
  const signature = api.deps.stripe.webhooks.generateTestHeaderString({ payload, secret: api.deps.env.STRIPE_WEBHOOK_SECRET });
  return api.agent().raw.post('/payments/webhook').set('content-type', 'application/json').set('stripe-signature', signature).send(payload);
}

/** Delivers the fake's events for an order to the API's webhook, in the order they happened. */
export async function deliverOrderEvents(stripe: StripeFakeServer, orderId: number, api: TestApi) {
  const events = stripe.fake.events().filter((e) => (e['data'] as { object: { metadata?: Record<string, string> } }).object.metadata?.['orderId'] === String(orderId));
  const answers = [];
  for (const event of events) answers.push(await postWebhookEvent(event as unknown as Stripe.Event, api));
  return answers;
}
