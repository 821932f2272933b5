import type { Actor } from './state-machine';
import { checkOrderTransition, ORDER_EVENTS, ORDER_HOLDS_STOCK, ORDER_STATUSES, orderEventsFor, type OrderEvent, type OrderStatus } from './order-lifecycle';

/**
 * The rules of issue 10 written out as (state, event, actor) rows: everything listed is allowed,
 * every other combination of state × event × actor is refused.
 */
const ALLOWED: ReadonlyArray<[OrderStatus, OrderEvent, Actor, OrderStatus]> = [
  // Only the payment provider (through its webhook) marks an order paid.
  ['awaiting_payment', 'pay', 'system', 'paid'],
  // An unpaid order can be cancelled by its buyer (or an admin); a declined card or a lapsed reservation ends it.
  ['awaiting_payment', 'cancel', 'buyer', 'cancelled'],
  ['awaiting_payment', 'cancel', 'admin', 'cancelled'],
  ['awaiting_payment', 'decline', 'system', 'cancelled'],
  ['awaiting_payment', 'expire', 'system', 'expired'],
  // The grower confirms a date, then marks the load delivered or picked up.
  ['paid', 'schedule', 'grower', 'scheduled'],
  ['paid', 'schedule', 'admin', 'scheduled'],
  ['paid', 'schedule', 'buyer', 'scheduled'],
  // Moving an agreed date means agreeing again.
  ['scheduled', 'reschedule', 'buyer', 'paid'],
  ['scheduled', 'reschedule', 'grower', 'paid'],
  ['scheduled', 'reschedule', 'admin', 'paid'],
  ['scheduled', 'deliver', 'grower', 'delivered'],
  ['scheduled', 'deliver', 'admin', 'delivered'],
  // The buyer accepts or reports a problem; silence accepts after the set number of days.
  ['delivered', 'accept', 'buyer', 'completed'],
  ['delivered', 'accept', 'system', 'completed'],
  ['delivered', 'report_problem', 'buyer', 'claimed'],
  // Claims and refunds are the admin's.
  ['claimed', 'settle_claim', 'admin', 'completed'],
  ['paid', 'refund', 'admin', 'refunded'],
  ['scheduled', 'refund', 'admin', 'refunded'],
  ['claimed', 'refund', 'admin', 'refunded'],
];
const ACTORS: Actor[] = ['buyer', 'grower', 'admin', 'system'];

describe('order life-cycle', () => {
  it.each(ALLOWED)('allows %s --%s by %s--> %s', (from, event, actor, to) => {
    expect(checkOrderTransition(from, event, actor)).toEqual({ ok: true, to });
  });

  const forbidden = ORDER_STATUSES.flatMap((from) =>
    ORDER_EVENTS.flatMap((event) =>
      ACTORS.filter((actor) => !ALLOWED.some(([f, e, a]) => f === from && e === event && a === actor)).map((actor) => [from, event, actor] as const),
    ),
  );

  it(`refuses the other ${ORDER_STATUSES.length * ORDER_EVENTS.length * ACTORS.length - ALLOWED.length} combinations`, () => {
    for (const [from, event, actor] of forbidden) {
      const result = checkOrderTransition(from, event, actor);
      expect({ from, event, actor, ok: result.ok }).toEqual({ from, event, actor, ok: false });
    }
  });

  it('says why: a wrong state reads in words, a wrong person is "not allowed"', () => {
    expect(checkOrderTransition('paid', 'cancel', 'buyer')).toEqual({ ok: false, reason: 'wrong_state', message: 'This cannot be done while it is paid, date to agree.' });
    expect(checkOrderTransition('awaiting_payment', 'pay', 'buyer')).toMatchObject({ ok: false, reason: 'not_allowed' });
  });

  it('offers each person only the actions that work', () => {
    expect(orderEventsFor('awaiting_payment', 'buyer')).toEqual(['cancel']);
    expect(orderEventsFor('delivered', 'buyer').sort()).toEqual(['accept', 'report_problem']);
    expect(orderEventsFor('paid', 'grower')).toEqual(['schedule']);
    expect(orderEventsFor('scheduled', 'grower').sort()).toEqual(['deliver', 'reschedule']);
    expect(orderEventsFor('completed', 'admin')).toEqual([]);
  });

  it('ends in completed, refunded, cancelled or expired: nothing leaves those states', () => {
    for (const end of ['completed', 'refunded', 'cancelled', 'expired'] as const) {
      for (const actor of ACTORS) expect(orderEventsFor(end, actor)).toEqual([]);
    }
  });

  it('holds stock in every state but cancelled, expired and refunded', () => {
    expect(ORDER_STATUSES.filter((s) => !ORDER_HOLDS_STOCK.includes(s)).sort()).toEqual(['cancelled', 'expired', 'refunded']);
  });
});
