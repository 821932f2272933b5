import Stripe from 'stripe';

export interface WebhookConfig {
  /** Where events are POSTed (the app's webhook endpoint); none → events are only stored. */
  url?: string;
  secret: string;
  /** Waits before each retry after a failed delivery (no answer or not 2xx), as Stripe retries with back-off. */
  retryDelaysMs?: number[];
}

const signer = new Stripe('sk_test_fake_signer').webhooks;

/**
 * Delivers events to one endpoint, signed like Stripe (`Stripe-Signature: t=…,v1=…`), retrying failures
 * with back-off so an app that was down when the payment happened still hears about it.
 */
export function createWebhookSender(config: WebhookConfig) {
  const delays = config.retryDelaysMs ?? [1000, 5000, 30_000, 120_000, 600_000];
  const timers = new Set<NodeJS.Timeout>();
  const deliveries: { eventId: string; attempt: number; status: number | 'error' }[] = [];

  async function attempt(event: { id: string }, n: number): Promise<void> {
    if (!config.url) return;
    const payload = JSON.stringify(event);
    const header = signer.generateTestHeaderString({ payload, secret: config.secret });
    let status: number | 'error' = 'error';
    try {
      const res = await fetch(config.url, { method: 'POST', headers: { 'content-type': 'application/json', 'stripe-signature': header }, body: payload });
      status = res.status;
    } catch {
      status = 'error';
    }
    deliveries.push({ eventId: event.id, attempt: n + 1, status });
    if (typeof status === 'number' && status >= 200 && status < 300) return;
    const wait = delays[n];
    if (wait === undefined) return;
    const timer = setTimeout(() => {
      timers.delete(timer);
      void attempt(event, n + 1);
    }, wait);
    timers.add(timer);
  }

  return {
    send: (event: { id: string }) => attempt(event, 0),
    deliveries,
    stop: () => timers.forEach((t) => clearTimeout(t)),
  };
}
