import type Stripe from 'stripe';
import { formatCents } from '@shared/units/money';
import type { Env } from '../../env';
import { HttpError } from '../../middleware/http-error';
import type { OrderRow } from './order-transition';

/**
 * The order's side of the payment provider: one checkout session per order and refunds, every create
 * call with an idempotency key derived from the order, so a retried request never charges or refunds twice.
 */
export class OrderPayments {
  constructor(
    private readonly stripe: Stripe,
    private readonly env: Env,
  ) {}

  /** `describe`: the lots' names and the order's bales, tons and hay cost (added up over its lines). */
  async startCheckout(order: OrderRow, describe: { title: string; buyerEmail: string; bales: number; tons: number; goodsCents: number }): Promise<{ id: string; url: string }> {
    const breakdown = `${describe.bales} bales (${describe.tons.toFixed(2)} t), ${order.method}; hay ${formatCents(describe.goodsCents)}, freight ${formatCents(order.freightCents)}, fee ${formatCents(order.platformFeeCents)}`;
    const session = await this.call(() =>
      this.stripe.checkout.sessions.create(
        {
          mode: 'payment',
          line_items: [{ quantity: 1, price_data: { currency: order.currency, unit_amount: order.totalCents, product_data: { name: `Order ${order.id}: ${describe.title}`, description: breakdown } } }],
          success_url: `${this.env.PUBLIC_URL}/orders/${order.id}?paid=1`,
          cancel_url: `${this.env.PUBLIC_URL}/orders/${order.id}`,
          client_reference_id: String(order.id),
          customer_email: describe.buyerEmail,
          metadata: { orderId: String(order.id) },
          payment_intent_data: { metadata: { orderId: String(order.id) } },
        },
        { idempotencyKey: `order-${order.id}-checkout` },
      ),
    );
    if (!session.url) throw new HttpError(502, 'payment_provider', 'The payment provider gave no payment page; please try again.');
    return { id: session.id, url: session.url };
  }

  /** The session as the provider knows it now (for reconciling when a webhook is late or lost). */
  retrieve(sessionId: string): Promise<Stripe.Checkout.Session> {
    return this.call(() => this.stripe.checkout.sessions.retrieve(sessionId));
  }

  /**
   * Closes an open payment page so nobody can pay an order that no longer holds stock. Already closed is
   * fine (the session as it stands is returned); a session the provider does not know returns null.
   */
  async close(sessionId: string): Promise<Stripe.Checkout.Session | null> {
    try {
      return await this.stripe.checkout.sessions.expire(sessionId);
    } catch (err) {
      const e = err as { type?: string; code?: string };
      if (e.code === 'resource_missing') return null;
      if (e.type === 'StripeInvalidRequestError') return this.retrieve(sessionId);
      throw new HttpError(502, 'payment_provider', 'The payment provider could not be reached; please try again.');
    }
  }

  async refund(paymentIntentId: string, amountCents: number, idempotencyKey: string, metadata: Record<string, string>): Promise<Stripe.Refund> {
    return this.call(() => this.stripe.refunds.create({ payment_intent: paymentIntentId, amount: amountCents, metadata }, { idempotencyKey }));
  }

  verify(payload: Buffer | string, signature: string): Stripe.Event {
    try {
      return this.stripe.webhooks.constructEvent(payload, signature, this.env.STRIPE_WEBHOOK_SECRET);
    } catch {
      throw new HttpError(400, 'bad_signature', 'The webhook signature does not match.');
    }
  }

  private async call<T>(fn: () => Promise<T>): Promise<T> {
    try {
      return await fn();
    } catch (err) {
      if (err instanceof HttpError) throw err;
      throw new HttpError(502, 'payment_provider', 'The payment provider could not be reached; please try again.');
    }
  }
}
