import type { Actor } from './state-machine';
import { checkDeliveryTransition, DELIVERY_EVENTS, DELIVERY_STATUSES, deliveryEventsFor, type DeliveryEvent, type DeliveryStatus } from './delivery-lifecycle';

/** Issue 10 §5 as rows: the buyer asks, the grower confirms or offers another date, then hands the load over. */
const ALLOWED: ReadonlyArray<[DeliveryStatus, DeliveryEvent, Actor, DeliveryStatus]> = [
  ['proposed', 'confirm', 'grower', 'confirmed'],
  ['proposed', 'confirm', 'admin', 'confirmed'],
  ['proposed', 'offer_other_date', 'grower', 'rescheduled'],
  ['proposed', 'offer_other_date', 'admin', 'rescheduled'],
  ['confirmed', 'offer_other_date', 'grower', 'rescheduled'],
  ['confirmed', 'offer_other_date', 'admin', 'rescheduled'],
  ['missed', 'offer_other_date', 'grower', 'rescheduled'],
  ['missed', 'offer_other_date', 'admin', 'rescheduled'],
  ['rescheduled', 'agree', 'buyer', 'confirmed'],
  ['rescheduled', 'ask_other_date', 'buyer', 'proposed'],
  ['missed', 'ask_other_date', 'buyer', 'proposed'],
  ['confirmed', 'load', 'grower', 'in_transit'],
  ['confirmed', 'hand_over', 'grower', 'done'],
  ['confirmed', 'hand_over', 'admin', 'done'],
  ['in_transit', 'hand_over', 'grower', 'done'],
  ['in_transit', 'hand_over', 'admin', 'done'],
  ['confirmed', 'miss', 'grower', 'missed'],
  ['confirmed', 'miss', 'admin', 'missed'],
  ['confirmed', 'miss', 'system', 'missed'],
  ['in_transit', 'miss', 'grower', 'missed'],
  ['in_transit', 'miss', 'admin', 'missed'],
  ['in_transit', 'miss', 'system', 'missed'],
];
const ACTORS: Actor[] = ['buyer', 'grower', 'admin', 'system'];

describe('delivery life-cycle', () => {
  it.each(ALLOWED)('allows %s --%s by %s--> %s', (from, event, actor, to) => {
    expect(checkDeliveryTransition(from, event, actor)).toEqual({ ok: true, to });
  });

  it('refuses every other combination of state, event and person', () => {
    let refused = 0;
    for (const from of DELIVERY_STATUSES)
      for (const event of DELIVERY_EVENTS)
        for (const actor of ACTORS) {
          if (ALLOWED.some(([f, e, a]) => f === from && e === event && a === actor)) continue;
          expect({ from, event, actor, ok: checkDeliveryTransition(from, event, actor).ok }).toEqual({ from, event, actor, ok: false });
          refused++;
        }
    expect(refused).toBe(DELIVERY_STATUSES.length * DELIVERY_EVENTS.length * ACTORS.length - ALLOWED.length);
  });

  it('a handed-over load is final; the buyer never marks a load delivered', () => {
    for (const actor of ACTORS) expect(deliveryEventsFor('done', actor)).toEqual([]);
    for (const from of DELIVERY_STATUSES) expect(deliveryEventsFor(from, 'buyer')).not.toContain('hand_over');
  });
});
