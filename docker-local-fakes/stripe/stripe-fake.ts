import { randomBytes } from 'node:crypto';
import express, { type Request, type Response } from 'express';

/**
 * A local stand-in for the parts of the Stripe API Baleproof uses, so the real Stripe SDK can run
 * against it (host/port/protocol options). It keeps objects in memory and answers in Stripe's shapes,
 * including its error shape `{ error: { type, message, param } }`. It is not Stripe: no fraud checks,
 * no real money, no webhooks unless the app asks this fake to send them.
 */
export function createStripeFake() {
  const app = express();
  const store = new Map<string, Map<string, Record<string, unknown>>>();
  const table = (kind: string) => store.get(kind) ?? store.set(kind, new Map()).get(kind)!;
  const id = (prefix: string) => `${prefix}_${randomBytes(12).toString('hex')}`;
  const now = () => Math.floor(Date.now() / 1000);

  app.use(express.urlencoded({ extended: true }));
  app.use((req, res, next) => {
    // The onboarding page is visited by the grower's browser, which holds no API key.
    if (req.path === '/health' || req.path.startsWith('/fake/onboard/')) return next();
    const auth = req.get('authorization') ?? '';
    if (!auth.startsWith('Bearer sk_')) return fail(res, 401, 'invalid_request_error', 'Invalid API Key provided.');
    next();
  });

  const fail = (res: Response, status: number, type: string, message: string, param?: string) =>
    res.status(status).json({ error: { type, message, ...(param ? { param } : {}) } });

  const requireInt = (req: Request, res: Response, field: string): number | null => {
    const value = Number(req.body[field]);
    if (!Number.isInteger(value) || value < 0) {
      fail(res, 400, 'invalid_request_error', `Invalid integer: ${req.body[field]}`, field);
      return null;
    }
    return value;
  };

  app.get('/health', (_req, res) => res.json({ status: 'ok', fake: 'stripe' }));

  // Connected accounts (growers' payout accounts) and onboarding links.
  app.post('/v1/accounts', (req, res) => {
    const account = {
      id: id('acct'),
      object: 'account',
      type: req.body.type ?? 'express',
      email: req.body.email ?? null,
      country: req.body.country ?? 'US',
      charges_enabled: false,
      payouts_enabled: false,
      details_submitted: false,
      metadata: req.body.metadata ?? {},
      created: now(),
    };
    table('accounts').set(account.id, account);
    res.json(account);
  });
  app.get('/v1/accounts/:id', (req, res) => {
    const account = table('accounts').get(req.params.id);
    if (!account) return fail(res, 404, 'invalid_request_error', `No such account: '${req.params.id}'`, 'id');
    res.json(account);
  });
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
    Object.assign(account, { charges_enabled: true, payouts_enabled: true, details_submitted: true });
    res.redirect(String(req.query['return_url'] ?? '/'));
  });

  // Payments.
  app.post('/v1/payment_intents', (req, res) => {
    const amount = requireInt(req, res, 'amount');
    if (amount === null) return;
    if (amount < 50) return fail(res, 400, 'invalid_request_error', 'Amount must be at least $0.50 usd', 'amount');
    const intent = {
      id: id('pi'),
      object: 'payment_intent',
      amount,
      amount_received: 0,
      currency: req.body.currency ?? 'usd',
      status: 'requires_payment_method',
      client_secret: `${id('pi')}_secret_${randomBytes(8).toString('hex')}`,
      metadata: req.body.metadata ?? {},
      transfer_group: req.body.transfer_group ?? null,
      created: now(),
    };
    table('payment_intents').set(intent.id, intent);
    res.json(intent);
  });
  app.get('/v1/payment_intents/:id', (req, res) => {
    const intent = table('payment_intents').get(req.params.id);
    if (!intent) return fail(res, 404, 'invalid_request_error', `No such payment_intent: '${req.params.id}'`, 'intent');
    res.json(intent);
  });
  app.post('/v1/payment_intents/:id/confirm', (req, res) => {
    const intent = table('payment_intents').get(req.params.id);
    if (!intent) return fail(res, 404, 'invalid_request_error', `No such payment_intent: '${req.params.id}'`, 'intent');
    // Stripe's documented test card numbers decide the outcome.
    const method = String(req.body.payment_method ?? 'pm_card_visa');
    if (method === 'pm_card_chargeDeclined') {
      return fail(res, 402, 'card_error', 'Your card was declined.', 'payment_method');
    }
    Object.assign(intent, { status: 'succeeded', amount_received: intent['amount'], payment_method: method });
    res.json(intent);
  });

  app.post('/v1/refunds', (req, res) => {
    const intent = table('payment_intents').get(String(req.body.payment_intent));
    if (!intent) return fail(res, 400, 'invalid_request_error', `No such payment_intent: '${req.body.payment_intent}'`, 'payment_intent');
    const amount = req.body.amount === undefined ? Number(intent['amount_received']) : Number(req.body.amount);
    const refunded = [...table('refunds').values()].filter((r) => r['payment_intent'] === intent['id']).reduce((s, r) => s + Number(r['amount']), 0);
    if (!Number.isInteger(amount) || amount <= 0 || amount + refunded > Number(intent['amount_received'])) {
      return fail(res, 400, 'invalid_request_error', 'Refund amount is greater than the unrefunded amount of the charge.', 'amount');
    }
    const refund = { id: id('re'), object: 'refund', amount, payment_intent: intent['id'], status: 'succeeded', metadata: req.body.metadata ?? {}, created: now() };
    table('refunds').set(refund.id, refund);
    res.json(refund);
  });

  app.post('/v1/transfers', (req, res) => {
    const amount = requireInt(req, res, 'amount');
    if (amount === null) return;
    const destination = table('accounts').get(String(req.body.destination));
    if (!destination) return fail(res, 400, 'invalid_request_error', `No such destination: '${req.body.destination}'`, 'destination');
    if (!destination['payouts_enabled']) return fail(res, 400, 'invalid_request_error', 'The destination account has not finished onboarding.', 'destination');
    const transfer = { id: id('tr'), object: 'transfer', amount, currency: req.body.currency ?? 'usd', destination: destination['id'], metadata: req.body.metadata ?? {}, transfer_group: req.body.transfer_group ?? null, created: now() };
    table('transfers').set(transfer.id, transfer);
    res.json(transfer);
  });

  app.use((req, res) => fail(res, 404, 'invalid_request_error', `Unrecognized request URL (${req.method}: ${req.path}). The local Stripe fake does not implement it.`));
  return app;
}
