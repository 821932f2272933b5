import express, { type NextFunction, type Request, type Response } from 'express';
import {
  accountObject,
  balanceObject,
  chargeObject,
  checkoutSessionObject,
  eventObject,
  fakeId,
  paymentIntentObject,
  refundObject,
  transferObject,
} from './fake-objects';
import { closedPage, paymentPage } from './hosted-page';
import { createWebhookSender, type WebhookConfig } from './webhook-sender';

/** Stripe's documented test cards: this one pays, this one is declined. */
export const TEST_CARD_OK = '4242424242424242';
export const TEST_CARD_DECLINED = '4000000000000002';

export interface StripeFakeOptions {
  webhook?: WebhookConfig;
  /** The fake's clock, seconds since the epoch (tests may fix it). */
  nowSeconds?: () => number;
}

type Obj = Record<string, unknown>;

/**
 * A local stand-in for the parts of the Stripe API Baleproof uses, so the real Stripe SDK can run
 * against it (host/port/protocol options). It keeps objects in memory and answers in Stripe's shapes
 * (held to Stripe's example objects by the contract test), including its error shape
 * `{ error: { type, message, param } }` and `Idempotency-Key` replay. Checkout sessions get a small
 * hosted payment page; payments, declines and expiries are sent to the app as signed webhooks with retries.
 * It is not Stripe: no fraud checks, no real money.
 */
export function createStripeFake(options: StripeFakeOptions = {}) {
  const app = express();
  const store = new Map<string, Map<string, Obj>>();
  const table = (kind: string) => store.get(kind) ?? store.set(kind, new Map()).get(kind)!;
  const now = options.nowSeconds ?? (() => Math.floor(Date.now() / 1000));
  const webhooks = createWebhookSender(options.webhook ?? { secret: 'whsec_local_fake_secret' });
  const replies = new Map<string, { status: number; body: unknown }>();

  const emit = (type: string, object: Obj) => {
    const event = eventObject({ id: fakeId('evt'), created: now(), type, object: structuredClone(object) });
    table('events').set(String(event['id']), event);
    void webhooks.send(event as { id: string });
  };

  app.use(express.urlencoded({ extended: true }));
  app.use((req, res, next) => {
    // The onboarding and payment pages are visited by a browser, which holds no API key.
    if (req.path === '/health' || req.path.startsWith('/fake/')) return next();
    const auth = req.get('authorization') ?? '';
    if (!auth.startsWith('Bearer sk_')) return fail(res, 401, 'invalid_request_error', 'Invalid API Key provided.');
    next();
  });
  // Idempotency-Key: a retried POST with the same key gets the first answer back, as with Stripe.
  app.use((req: Request, res: Response, next: NextFunction) => {
    const key = req.get('idempotency-key');
    if (req.method !== 'POST' || !key) return next();
    const cacheKey = `${req.path} ${key}`;
    const earlier = replies.get(cacheKey);
    if (earlier) return res.status(earlier.status).set('idempotent-replayed', 'true').json(earlier.body);
    const json = res.json.bind(res);
    res.json = (body: unknown) => {
      if (res.statusCode < 500) replies.set(cacheKey, { status: res.statusCode, body });
      return json(body);
    };
    next();
  });

  const fail = (res: Response, status: number, type: string, message: string, param?: string, code?: string) =>
    res.status(status).json({ error: { type, message, ...(param ? { param } : {}), ...(code ? { code } : {}) } });

  const requireInt = (req: Request, res: Response, field: string): number | null => {
    const value = Number(req.body[field]);
    if (!Number.isInteger(value) || value < 0) {
      fail(res, 400, 'invalid_request_error', `Invalid integer: ${req.body[field]}`, field);
      return null;
    }
    return value;
  };
  const get = (kind: string, label: string) => (req: Request, res: Response) => {
    const found = table(kind).get(String(req.params['id']));
    if (!found) return fail(res, 404, 'invalid_request_error', `No such ${label}: '${req.params['id']}'`, 'id', 'resource_missing');
    res.json(found);
  };

  app.get('/health', (_req, res) => res.json({ status: 'ok', fake: 'stripe' }));

  // Connected accounts (growers' payout accounts) and onboarding links.
  app.post('/v1/accounts', (req, res) => {
    const account = accountObject({ id: fakeId('acct'), created: now(), type: req.body.type ?? 'express', email: req.body.email ?? null, country: req.body.country ?? 'US', metadata: req.body.metadata ?? {} });
    table('accounts').set(String(account['id']), account);
    res.json(account);
  });
  app.get('/v1/accounts/:id', get('accounts', 'account'));
  app.post('/v1/account_links', (req, res) => {
    const account = table('accounts').get(String(req.body.account));
    if (!account) return fail(res, 400, 'invalid_request_error', `No such account: '${req.body.account}'`, 'account');
    if (!req.body.return_url || !req.body.refresh_url) return fail(res, 400, 'invalid_request_error', 'Missing required param: return_url.', 'return_url');
    // The fake completes onboarding at once: following the link marks the account ready.
    const url = `${req.protocol}://${req.get('host')}/fake/onboard/${account['id']}?return_url=${encodeURIComponent(req.body.return_url)}`;
    res.json({ object: 'account_link', url, created: now(), expires_at: now() + 300 });
  });
  app.get('/fake/onboard/:id', (req, res) => {
    const account = table('accounts').get(req.params.id);
    if (!account) return res.status(404).send('No such account');
    Object.assign(account, { charges_enabled: true, payouts_enabled: true, details_submitted: true, capabilities: { card_payments: 'active', transfers: 'active' } });
    res.redirect(String(req.query['return_url'] ?? '/'));
  });

  // Checkout sessions and the hosted payment page.
  app.post('/v1/checkout/sessions', (req, res) => {
    const items = (req.body.line_items ?? []) as { price_data?: { unit_amount?: string; product_data?: { name?: string } }; quantity?: string }[];
    if (req.body.mode !== 'payment') return fail(res, 400, 'invalid_request_error', 'The fake supports mode=payment only.', 'mode');
    if (!req.body.success_url) return fail(res, 400, 'invalid_request_error', 'Missing required param: success_url.', 'success_url');
    const amounts = items.map((i) => Number(i.price_data?.unit_amount) * Number(i.quantity ?? 1));
    if (items.length === 0 || amounts.some((a) => !Number.isInteger(a) || a < 50)) {
      return fail(res, 400, 'invalid_request_error', 'Each line item needs price_data[unit_amount] of at least 50 cents and an integer quantity.', 'line_items');
    }
    const total = amounts.reduce((s, a) => s + a, 0);
    const id = `cs_test_${fakeId('x').slice(2)}`;
    const created = now();
    const expiresAt = req.body.expires_at ? Number(req.body.expires_at) : created + 24 * 3600;
    if (!Number.isInteger(expiresAt) || expiresAt < created + 30 * 60 - 5 || expiresAt > created + 24 * 3600) {
      return fail(res, 400, 'invalid_request_error', 'expires_at must be between 30 minutes and 24 hours from now.', 'expires_at');
    }
    const session = checkoutSessionObject({
      id,
      created,
      url: `${req.protocol}://${req.get('host')}/fake/pay/${id}`,
      amount_subtotal: total,
      amount_total: total,
      currency: req.body.currency ?? 'usd',
      success_url: String(req.body.success_url),
      cancel_url: req.body.cancel_url ?? null,
      client_reference_id: req.body.client_reference_id ?? null,
      customer_email: req.body.customer_email ?? null,
      expires_at: expiresAt,
      metadata: req.body.metadata ?? {},
    });
    table('checkout_sessions').set(id, session);
    table('session_details').set(id, {
      description: items.map((i) => i.price_data?.product_data?.name ?? 'Item').join(', '),
      intentMetadata: (req.body.payment_intent_data?.metadata ?? {}) as Obj,
    });
    res.json(session);
  });
  app.get('/v1/checkout/sessions/:id', get('checkout_sessions', 'checkout session'));
  app.post('/v1/checkout/sessions/:id/expire', (req, res) => {
    const session = table('checkout_sessions').get(req.params.id);
    if (!session) return fail(res, 404, 'invalid_request_error', `No such checkout session: '${req.params.id}'`, 'id', 'resource_missing');
    if (session['status'] !== 'open') return fail(res, 400, 'invalid_request_error', `Only open sessions can be expired; this one is ${session['status']}.`);
    Object.assign(session, { status: 'expired', url: null });
    emit('checkout.session.expired', session);
    res.json(session);
  });

  const openSession = (id: string, res: Response): Obj | null => {
    const session = table('checkout_sessions').get(id);
    if (!session) {
      res.status(404).send(closedPage('No such payment.', null));
      return null;
    }
    if (session['status'] === 'open' && Number(session['expires_at']) <= now()) {
      Object.assign(session, { status: 'expired', url: null });
      emit('checkout.session.expired', session);
    }
    if (session['status'] !== 'open') {
      res.status(410).send(closedPage(session['status'] === 'complete' ? 'This has already been paid.' : 'This payment page has expired or was closed.', session['cancel_url'] as string | null));
      return null;
    }
    return session;
  };

  app.get('/fake/pay/:id', (req, res) => {
    const session = openSession(req.params.id, res);
    if (!session) return;
    const details = table('session_details').get(req.params.id)!;
    res.type('html').send(paymentPage({ sessionId: req.params.id, description: String(details['description']), amount: Number(session['amount_total']), cancelUrl: session['cancel_url'] as string | null }));
  });

  app.post('/fake/pay/:id', (req, res) => {
    const session = openSession(req.params.id, res);
    if (!session) return;
    const details = table('session_details').get(req.params.id)!;
    const card = String(req.body.card ?? '').replace(/\D/g, '');
    const amount = Number(session['amount_total']);
    const paid = card === TEST_CARD_OK;
    const intentId = String(session['payment_intent'] ?? fakeId('pi'));
    const charge = chargeObject({ id: fakeId('ch'), created: now(), amount, last4: card.slice(-4), paid, payment_intent: intentId, metadata: details['intentMetadata'], description: String(details['description']) });
    table('charges').set(String(charge['id']), charge);
    const intent =
      table('payment_intents').get(intentId) ??
      paymentIntentObject({ id: intentId, created: now(), amount, metadata: details['intentMetadata'] as Obj });
    table('payment_intents').set(intentId, intent);
    session['payment_intent'] = intentId;
    if (!paid) {
      Object.assign(intent, {
        status: 'requires_payment_method',
        latest_charge: charge['id'],
        last_payment_error: { type: 'card_error', code: 'card_declined', decline_code: 'generic_decline', message: 'Your card was declined.', charge: charge['id'] },
      });
      emit('payment_intent.payment_failed', intent);
      return res
        .status(402)
        .type('html')
        .send(paymentPage({ sessionId: req.params.id, description: String(details['description']), amount, error: 'Your card was declined.', cancelUrl: session['cancel_url'] as string | null }));
    }
    Object.assign(intent, { status: 'succeeded', amount_received: amount, latest_charge: charge['id'], last_payment_error: null, payment_method: charge['payment_method'] });
    Object.assign(session, { status: 'complete', payment_status: 'paid', url: null });
    emit('payment_intent.succeeded', intent);
    emit('checkout.session.completed', session);
    res.redirect(303, String(session['success_url']).replace('{CHECKOUT_SESSION_ID}', req.params.id));
  });

  // Payment intents (direct API use).
  app.post('/v1/payment_intents', (req, res) => {
    const amount = requireInt(req, res, 'amount');
    if (amount === null) return;
    if (amount < 50) return fail(res, 400, 'invalid_request_error', 'Amount must be at least $0.50 usd', 'amount');
    const intent = paymentIntentObject({ id: fakeId('pi'), created: now(), amount, currency: req.body.currency ?? 'usd', metadata: req.body.metadata ?? {}, transfer_group: req.body.transfer_group ?? null });
    table('payment_intents').set(String(intent['id']), intent);
    res.json(intent);
  });
  app.get('/v1/payment_intents/:id', get('payment_intents', 'payment_intent'));
  app.post('/v1/payment_intents/:id/confirm', (req, res) => {
    const intent = table('payment_intents').get(req.params.id);
    if (!intent) return fail(res, 404, 'invalid_request_error', `No such payment_intent: '${req.params.id}'`, 'intent');
    const method = String(req.body.payment_method ?? 'pm_card_visa');
    const paid = method !== 'pm_card_chargeDeclined';
    const charge = chargeObject({ id: fakeId('ch'), created: now(), amount: Number(intent['amount']), last4: paid ? '4242' : '0002', paid, payment_intent: intent['id'], description: String(intent['description'] ?? 'Payment') });
    table('charges').set(String(charge['id']), charge);
    if (!paid) {
      Object.assign(intent, { latest_charge: charge['id'], last_payment_error: { type: 'card_error', code: 'card_declined', message: 'Your card was declined.' } });
      emit('payment_intent.payment_failed', intent);
      return fail(res, 402, 'card_error', 'Your card was declined.', 'payment_method', 'card_declined');
    }
    Object.assign(intent, { status: 'succeeded', amount_received: intent['amount'], payment_method: method, latest_charge: charge['id'] });
    emit('payment_intent.succeeded', intent);
    res.json(intent);
  });
  app.get('/v1/charges/:id', get('charges', 'charge'));

  app.post('/v1/refunds', (req, res) => {
    const intent = table('payment_intents').get(String(req.body.payment_intent));
    if (!intent) return fail(res, 400, 'invalid_request_error', `No such payment_intent: '${req.body.payment_intent}'`, 'payment_intent');
    const charge = table('charges').get(String(intent['latest_charge']));
    const amount = req.body.amount === undefined ? Number(intent['amount_received']) : Number(req.body.amount);
    const refunded = [...table('refunds').values()].filter((r) => r['payment_intent'] === intent['id']).reduce((s, r) => s + Number(r['amount']), 0);
    if (!charge || !Number.isInteger(amount) || amount <= 0 || amount + refunded > Number(intent['amount_received'])) {
      return fail(res, 400, 'invalid_request_error', 'Refund amount is greater than the unrefunded amount of the charge.', 'amount');
    }
    const refund = refundObject({ id: fakeId('re'), created: now(), amount, charge: String(charge['id']), payment_intent: intent['id'], metadata: req.body.metadata ?? {}, reason: req.body.reason ?? null });
    table('refunds').set(String(refund['id']), refund);
    Object.assign(charge, { amount_refunded: refunded + amount, refunded: refunded + amount === Number(charge['amount']) });
    emit('charge.refunded', charge);
    res.json(refund);
  });
  app.get('/v1/refunds/:id', get('refunds', 'refund'));

  app.post('/v1/transfers', (req, res) => {
    const amount = requireInt(req, res, 'amount');
    if (amount === null) return;
    const destination = table('accounts').get(String(req.body.destination));
    if (!destination) return fail(res, 400, 'invalid_request_error', `No such destination: '${req.body.destination}'`, 'destination');
    if (!destination['payouts_enabled']) return fail(res, 400, 'invalid_request_error', 'The destination account has not finished onboarding.', 'destination');
    if (amount > available()) return fail(res, 400, 'invalid_request_error', 'You have insufficient available funds in your Stripe account.', 'amount', 'balance_insufficient');
    const transfer = transferObject({ id: fakeId('tr'), created: now(), amount, currency: req.body.currency ?? 'usd', destination: String(destination['id']), metadata: req.body.metadata ?? {}, transfer_group: req.body.transfer_group ?? null });
    table('transfers').set(String(transfer['id']), transfer);
    res.json(transfer);
  });
  app.get('/v1/transfers/:id', get('transfers', 'transfer'));

  // The platform's balance: card payments received, less refunds and transfers to growers (settled at once here).
  const sum = (kind: string, pick: (o: Obj) => number) => [...table(kind).values()].reduce((s, o) => s + pick(o), 0);
  const available = () =>
    sum('charges', (c) => (c['paid'] ? Number(c['amount']) : 0)) - sum('refunds', (r) => Number(r['amount'])) - sum('transfers', (t) => Number(t['amount']));
  app.get('/v1/balance', (_req, res) => res.json(balanceObject(available(), 0)));

  app.get('/v1/events/:id', get('events', 'event'));

  app.use((req, res) => fail(res, 404, 'invalid_request_error', `Unrecognized request URL (${req.method}: ${req.path}). The local Stripe fake does not implement it.`));
  return Object.assign(app, { webhookDeliveries: webhooks.deliveries, stopWebhooks: webhooks.stop, events: () => [...table('events').values()] });
}
