import { eq } from 'drizzle-orm';
import type Stripe from 'stripe';
import type { Db } from '../../db/client';
import { paymentEvents } from '../../db/schema';
import type { OrdersService } from './orders.service';

/**
 * Applies verified payment-provider events to orders. Each event id is recorded after it has been
 * applied; an event seen before is skipped, and every step it triggers is itself safe to repeat, so a
 * crash between applying and recording cannot double anything either.
 */
export class PaymentEventsService {
  constructor(
    private readonly db: Db,
    private readonly orders: OrdersService,
  ) {}

  async apply(event: Stripe.Event): Promise<'applied' | 'duplicate' | 'ignored'> {
    const [seen] = await this.db.select({ id: paymentEvents.id }).from(paymentEvents).where(eq(paymentEvents.id, event.id));
    if (seen) return 'duplicate';
    const orderId = orderIdOf(event);
    if (orderId === null) return 'ignored';
    switch (event.type) {
      case 'checkout.session.completed':
      case 'checkout.session.async_payment_succeeded': {
        const session = event.data.object;
        if (session.payment_status === 'paid') await this.orders.markPaid(orderId, session.payment_intent as string | null);
        break;
      }
      case 'checkout.session.expired':
        await this.orders.reconcileById(orderId);
        break;
      case 'payment_intent.payment_failed':
        await this.orders.decline(orderId);
        break;
      default:
        break;
    }
    await this.db.insert(paymentEvents).values({ id: event.id, type: event.type, orderId }).onConflictDoNothing();
    return 'applied';
  }
}

function orderIdOf(event: Stripe.Event): number | null {
  const object = event.data.object as { metadata?: Record<string, string> | null };
  const id = Number(object.metadata?.['orderId']);
  return Number.isInteger(id) && id > 0 ? id : null;
}
