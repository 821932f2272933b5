import { type Actor, checkTransition, eventsFor, type Lifecycle } from './state-machine';

/**
 * Where an order is in its life. The stock of an order is held while it is `awaiting_payment` (until
 * `reservedUntil`), sold from `paid` on, and back on the lot after `cancelled` or `expired`.
 */
export const ORDER_STATUSES = [
  'awaiting_payment', // reserved; the buyer is on the payment page
  'paid', // money received; a delivery or pickup date is to be agreed
  'scheduled', // the grower confirmed the date
  'delivered', // the grower marked it delivered or picked up; the buyer has N days to accept or report a problem
  'completed', // accepted by the buyer, or the acceptance period ran out
  'claimed', // the buyer reported a problem; an admin settles it
  'refunded', // all money went back to the buyer
  'cancelled', // cancelled or declined before payment; stock released
  'expired', // the reservation ran out before payment; stock released
] as const;
export type OrderStatus = (typeof ORDER_STATUSES)[number];

export const ORDER_EVENTS = ['pay', 'cancel', 'decline', 'expire', 'schedule', 'reschedule', 'deliver', 'accept', 'report_problem', 'settle_claim', 'refund'] as const;
export type OrderEvent = (typeof ORDER_EVENTS)[number];

export const ORDER_LIFECYCLE: Lifecycle<OrderStatus, OrderEvent> = {
  states: ORDER_STATUSES,
  transitions: {
    // Payment is reported by the payment provider's webhook only, never by a person.
    pay: { from: ['awaiting_payment'], to: 'paid', by: ['system'] },
    cancel: { from: ['awaiting_payment'], to: 'cancelled', by: ['buyer', 'admin'] },
    decline: { from: ['awaiting_payment'], to: 'cancelled', by: ['system'] },
    expire: { from: ['awaiting_payment'], to: 'expired', by: ['system'] },
    // Scheduled once both agree: the grower confirming the buyer's date, or the buyer agreeing to the grower's.
    schedule: { from: ['paid'], to: 'scheduled', by: ['grower', 'admin', 'buyer'] },
    // Either side moving an agreed date puts it back to be agreed.
    reschedule: { from: ['scheduled'], to: 'paid', by: ['buyer', 'grower', 'admin'] },
    deliver: { from: ['scheduled'], to: 'delivered', by: ['grower', 'admin'] },
    // After the acceptance period the system accepts for a buyer who said nothing.
    accept: { from: ['delivered'], to: 'completed', by: ['buyer', 'system'] },
    report_problem: { from: ['delivered'], to: 'claimed', by: ['buyer'] },
    settle_claim: { from: ['claimed'], to: 'completed', by: ['admin'] },
    refund: { from: ['paid', 'scheduled', 'claimed'], to: 'refunded', by: ['admin'] },
  },
};

const STATUS_WORDS: Record<OrderStatus, string> = {
  awaiting_payment: 'waiting for payment',
  paid: 'paid, date to agree',
  scheduled: 'date agreed',
  delivered: 'delivered, waiting for the buyer',
  completed: 'complete',
  claimed: 'problem reported',
  refunded: 'refunded',
  cancelled: 'cancelled',
  expired: 'expired unpaid',
};

/** Plain words for a status, for pages and e-mails. */
export function orderStatusLabel(status: OrderStatus): string {
  return STATUS_WORDS[status];
}

export function checkOrderTransition(from: OrderStatus, event: OrderEvent, actor: Actor) {
  return checkTransition(ORDER_LIFECYCLE, from, event, actor, (s) => STATUS_WORDS[s]);
}

export function orderEventsFor(from: OrderStatus, actor: Actor): OrderEvent[] {
  return eventsFor(ORDER_LIFECYCLE, from, actor);
}

/** Statuses in which the order's bales are held or sold (not available to others). */
export const ORDER_HOLDS_STOCK: readonly OrderStatus[] = ['awaiting_payment', 'paid', 'scheduled', 'delivered', 'completed', 'claimed'];

/** Minutes stock stays reserved for a buyer who has started paying. */
export const RESERVATION_MINUTES = 30;
