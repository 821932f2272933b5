import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import { createServer } from 'node:http';
import Stripe from 'stripe';
import fixtures from '../docker-local-fakes/stripe/reference/stripe-fixtures.json';
import { createStripeFake, TEST_CARD_DECLINED, TEST_CARD_OK } from '../docker-local-fakes/stripe/stripe-fake';

/**
 * The local Stripe fake against Stripe's own example objects (reference/stripe-fixtures.json, from
 * Stripe's public OpenAPI repository): every top-level field of the example is present with the same
 * JSON type. A field the example shows as null may hold anything; a field Stripe's API reference documents
 * as nullable may be null in the fake while the example happens to fill it (listed below, from the
 * reference pages of each object).
 */
const NULLABLE: Record<string, string[]> = {
  payment_intent: ['canceled_at', 'last_payment_error', 'next_action', 'processing', 'shipping', 'transfer_data', 'payment_method_configuration_details'],
  'checkout.session': ['payment_intent', 'url', 'success_url', 'cancel_url'],
  account: ['email'],
  charge: ['balance_transaction', 'shipping', 'transfer_data', 'source', 'failure_code', 'failure_message'],
};
const resources = (fixtures as { resources: Record<string, Record<string, unknown>> }).resources;

const jsonType = (v: unknown) => (v === null ? 'null' : Array.isArray(v) ? 'array' : typeof v);

function shapeProblems(kind: string, actual: Record<string, unknown>): string[] {
  const example = resources[kind]!;
  const problems: string[] = [];
  for (const [field, value] of Object.entries(example)) {
    if (!(field in actual)) problems.push(`${kind}.${field} missing`);
    else if (value !== null && jsonType(actual[field]) !== jsonType(value) && !(actual[field] === null && NULLABLE[kind]?.includes(field))) {
      problems.push(`${kind}.${field}: ${jsonType(actual[field])}, Stripe's example has ${jsonType(value)}`);
    }
  }
  return problems;
}

describe('Stripe fake contract (Stripe example objects, openapi fixtures3.json)', () => {
  let server: Server;
  let hook: Server;
  let stripe: Stripe;
  let base: string;
  const received: { body: string; signature: string }[] = [];
  let failFirst = 0;

  beforeAll(async () => {
    hook = createServer((req, res) => {
      let body = '';
      req.on('data', (c) => (body += c));
      req.on('end', () => {
        if (failFirst > 0) {
          failFirst--;
          res.statusCode = 503;
          return res.end();
        }
        received.push({ body, signature: String(req.headers['stripe-signature']) });
        res.end('{}');
      });
    });
    await new Promise<void>((r) => hook.listen(0, '127.0.0.1', r));
    const fake = createStripeFake({ webhook: { url: `http://127.0.0.1:${(hook.address() as AddressInfo).port}/hook`, secret: 'whsec_contract', retryDelaysMs: [20, 20, 20] } });
    server = await new Promise<Server>((r) => {
      const s = fake.listen(0, '127.0.0.1', () => r(s));
    });
    const port = (server.address() as AddressInfo).port;
    base = `http://127.0.0.1:${port}`;
    stripe = new Stripe('sk_test_contract', { host: '127.0.0.1', port, protocol: 'http', maxNetworkRetries: 0, telemetry: false });
  });
  afterAll(async () => {
    await new Promise((r) => server.close(r));
    await new Promise((r) => hook.close(r));
  });

  const newSession = (amount: number, key?: string) =>
    stripe.checkout.sessions.create(
      {
        mode: 'payment',
        line_items: [{ quantity: 1, price_data: { currency: 'usd', unit_amount: amount, product_data: { name: 'Test hay' } } }],
        success_url: 'http://127.0.0.1/ok?s={CHECKOUT_SESSION_ID}',
        cancel_url: 'http://127.0.0.1/back',
        metadata: { orderId: '7' },
        payment_intent_data: { metadata: { orderId: '7' } },
      },
      key ? { idempotencyKey: key } : undefined,
    );
  const pay = (url: string, card: string) => fetch(url, { method: 'POST', redirect: 'manual', headers: { 'content-type': 'application/x-www-form-urlencoded' }, body: `card=${card}` });
  const waitFor = async (test: () => boolean) => {
    for (let i = 0; i < 100 && !test(); i++) await new Promise((r) => setTimeout(r, 20));
  };

  it('answers a checkout session, its payment intent, charge, refund, transfer, balance and event in Stripe\'s shapes', async () => {
    const session = await newSession(120_000);
    expect(shapeProblems('checkout.session', session as never)).toEqual([]);
    const paid = await pay(session.url!, TEST_CARD_OK);
    expect(paid.status).toBe(303);
    expect(paid.headers.get('location')).toBe(`http://127.0.0.1/ok?s=${session.id}`);

    const after = await stripe.checkout.sessions.retrieve(session.id);
    expect(after).toMatchObject({ status: 'complete', payment_status: 'paid', amount_total: 120_000 });
    const intent = await stripe.paymentIntents.retrieve(after.payment_intent as string);
    expect(shapeProblems('payment_intent', intent as never)).toEqual([]);
    expect(intent).toMatchObject({ status: 'succeeded', amount_received: 120_000, metadata: { orderId: '7' } });
    const charge = await stripe.charges.retrieve(intent.latest_charge as string);
    expect(shapeProblems('charge', charge as never)).toEqual([]);

    const refund = await stripe.refunds.create({ payment_intent: intent.id, amount: 20_000 }, { idempotencyKey: 'contract-refund' });
    expect(shapeProblems('refund', refund as never)).toEqual([]);

    const account = await stripe.accounts.create({ type: 'express', country: 'US' });
    expect(shapeProblems('account', account as never)).toEqual([]);
    await fetch(`${base}/fake/onboard/${account.id}?return_url=/`, { redirect: 'manual' });
    const transfer = await stripe.transfers.create({ amount: 50_000, currency: 'usd', destination: account.id });
    expect(shapeProblems('transfer', transfer as never)).toEqual([]);

    const balance = await stripe.balance.retrieve();
    expect(shapeProblems('balance', balance as never)).toEqual([]);
    // Received $1,200, refunded $200, sent $500 to the grower: $500 left.
    expect(balance.available[0]!.amount).toBe(50_000);

    await waitFor(() => received.length >= 3);
    const event = JSON.parse(received.find((r) => r.body.includes('checkout.session.completed'))!.body);
    expect(shapeProblems('event', event)).toEqual([]);
  });

  it('signs webhooks so stripe.webhooks.constructEvent accepts them, and retries a failed delivery', async () => {
    received.length = 0;
    failFirst = 2;
    const session = await newSession(5_000);
    await pay(session.url!, TEST_CARD_OK);
    await waitFor(() => received.some((r) => r.body.includes('checkout.session.completed')));
    const delivery = received.find((r) => r.body.includes('checkout.session.completed'))!;
    const event = stripe.webhooks.constructEvent(delivery.body, delivery.signature, 'whsec_contract');
    expect(event.type).toBe('checkout.session.completed');
    expect(() => stripe.webhooks.constructEvent(delivery.body, delivery.signature, 'whsec_other')).toThrow();
  });

  it('declines Stripe\'s test card 4000 0000 0000 0002 and leaves the session open', async () => {
    const session = await newSession(5_000);
    const declined = await pay(session.url!, TEST_CARD_DECLINED);
    expect(declined.status).toBe(402);
    expect(await declined.text()).toContain('Your card was declined.');
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('open');
    const expired = await stripe.checkout.sessions.expire(session.id);
    expect(expired.status).toBe('expired');
    expect((await pay(session.url!, TEST_CARD_OK)).status).toBe(410);
  });

  it('replays the first answer for a repeated Idempotency-Key, as Stripe does', async () => {
    const a = await newSession(7_700, 'contract-session-key');
    const b = await newSession(7_700, 'contract-session-key');
    expect(b.id).toBe(a.id);
  });

  it('answers errors in Stripe\'s error shape', async () => {
    await expect(stripe.checkout.sessions.retrieve('cs_test_missing')).rejects.toMatchObject({ type: 'StripeInvalidRequestError', statusCode: 404 });
  });
});
